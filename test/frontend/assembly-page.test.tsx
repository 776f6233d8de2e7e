import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { formatTagCode } from '@shared/tags/tag-code';
import { buildMe, SITES } from './support/fixtures';
import { buildAssembly, buildEvent, CAUTIONS, checkResult, CONSTRUCTION, SOURCE, stockAssembly } from './support/assembly-fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const technician = buildMe({ role: 'technician' });
const engineer = buildMe({ role: 'reliability_engineer', name: 'Tobias Renwick', allSites: true, sites: SITES });

const refusedBend = checkResult({
  check: 'bend-radius',
  outcome: 'fail',
  sentence: 'The hose is routed through a 100 mm bend, tighter than its 150 mm minimum bend radius.',
  source: [SOURCE],
});

function overriddenAssembly() {
  return buildAssembly({
    checkOutcome: 'warn',
    overridden: true,
    checkResults: [
      checkResult({ check: 'allowable-pressure', sentence: 'Allowable 20.0 bar covers the 7.0 bar this position can see.', overridable: false }),
      refusedBend,
      checkResult({ check: 'medium-compatibility', outcome: 'warn', sentence: 'The position’s medium is not recorded, so compatibility cannot be checked.' }),
    ],
    overrides: [
      { id: 'o1', checkCode: 'bend-radius', reason: 'Routing to be changed at the next shutdown; guard fitted', reviewOn: '2027-01-15', actorName: 'Tobias Renwick', createdAt: '2026-03-01T08:10:00.000Z' },
    ],
    abilities: { proofTest: false, install: false, tagOut: true, remove: true, replace: true, returnToStock: false, scrap: false, override: true },
  });
}

function assemblyApi(assembly = overriddenAssembly(), events = defaultEvents(assembly.id)) {
  return new MockApi()
    .on(`GET /api/assemblies/${assembly.id}`, json({ data: assembly, cautions: CAUTIONS }))
    .on(`GET /api/assemblies/${assembly.id}/events`, json({ data: events }))
    .on(`GET /api/sites/${assembly.siteId}`, json({ data: { id: assembly.siteId, code: 'PIT1', name: 'North pit', timeZone: 'Europe/London', currency: 'GBP', defaultUnits: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' }, archivedAt: null, abilities: { update: false } } }))
    .on(`GET /api/constructions/${CONSTRUCTION.id}`, json({ data: CONSTRUCTION }));
}

function defaultEvents(assemblyId: string) {
  void assemblyId;
  return [
    buildEvent({ kind: 'override', note: 'Routing to be changed at the next shutdown; guard fitted', data: { checks: ['bend-radius'], reviewOn: '2027-01-15' }, actorName: 'Tobias Renwick' }),
    buildEvent({ kind: 'install', positionCode: 'DR03-AIR', workOrder: 'WO-44120', hourMeterHours: 1250, note: 'Fitted after the rig service', data: { checkOutcome: 'fail' } }),
    buildEvent({
      kind: 'proof_test',
      occurredAt: '2026-01-11T12:00:00.000Z',
      recordedAt: '2026-01-11T15:00:00.000Z',
      data: { medium: 'water', result: 'pass', tester: 'Hose shop', holdSeconds: 60, heldPressureKpa: 4000, requiredPressureKpa: 4000 },
      voidedBy: { eventId: 'v1', reason: 'Gauge was out of calibration on that day', at: '2026-01-12T09:00:00.000Z' },
    }),
    buildEvent({ kind: 'build', occurredAt: '2026-01-10T12:00:00.000Z', recordedAt: '2026-01-10T13:00:00.000Z' }),
  ];
}

async function open(assembly = overriddenAssembly(), me = technician, api = assemblyApi(assembly)) {
  const view = renderApp(`/assemblies/${assembly.id}`, { me, api });
  await screen.findByRole('heading', { level: 1, name: formatTagCode(assembly.number) }, { timeout: 5000 });
  return { ...view, assembly };
}

describe('assembly page', { timeout: 15_000 }, () => {
  it('shows each selection check with its outcome, sentence and source', async () => {
    await open();
    const checks = screen.getByRole('region', { name: 'Selection checks' });
    const bend = within(checks).getByText(refusedBend.sentence).closest('li')!;
    expect(within(bend).getByText('Fail')).toBeTruthy();
    expect(within(bend).getByText('Bend radius')).toBeTruthy();
    expect(within(bend).getByText('Overridden')).toBeTruthy();
    expect(within(bend).getByText(SOURCE.title)).toBeTruthy();
    expect(within(checks).getByText('1 fail, 1 warning, 1 pass')).toBeTruthy();
  });

  it('shows the override with its reason, who gave it and the review date', async () => {
    await open();
    const override = screen.getByRole('region', { name: 'Override in force' });
    expect(within(override).getByText('“Routing to be changed at the next shutdown; guard fitted”')).toBeTruthy();
    expect(within(override).getByText(/Accepted by Tobias Renwick/)).toBeTruthy();
    expect(within(override).getByText(/review by/).textContent).toContain('2027');
  });

  it('shows the history as a timeline, with a voided proof test struck through beside the reason', async () => {
    await open();
    const history = await screen.findByRole('list', { name: 'History' });
    const items = within(history).getAllByRole('listitem');
    expect(items.map((li) => li.querySelector('h3')?.textContent)).toEqual(['Checks overridden', 'Installed', 'Proof test', 'Built']);
    expect(within(items[1]!).getByText(/work order WO-44120 · hour meter 1,250 h/)).toBeTruthy();
    expect(within(items[1]!).getByText('Fitted after the rig service')).toBeTruthy();
    const proof = items[2]!;
    expect(within(proof).getByText('Voided')).toBeTruthy();
    expect(within(proof).getByText('Proof test').className).toContain('line-through');
    expect(within(proof).getByText(/Gauge was out of calibration/)).toBeTruthy();
  });

  it('offers only the actions the server allows: none to a viewer', async () => {
    const assembly = buildAssembly({ abilities: { proofTest: false, install: false, tagOut: false, remove: false, replace: false, returnToStock: false, scrap: false, override: false } });
    await open(assembly, buildMe({ role: 'viewer' }));
    expect(screen.queryByRole('group', { name: 'Actions' })).toBeNull();
    expect(screen.getByText('You can see this assembly but not change it.')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Replace' })).toBeNull();
  });

  it('links Replace to the step-by-step replacement', async () => {
    const { assembly } = await open();
    expect(screen.getByRole('link', { name: 'Replace' }).getAttribute('href')).toBe(`/assemblies/${assembly.id}/replace`);
  });

  it('validates the tag-out form as you type, and shows the cautions before the confirm button', async () => {
    await open();
    fireEvent.click(within(screen.getByRole('group', { name: 'Actions' })).getByRole('button', { name: 'Tag out' }));
    const sheet = await screen.findByRole('dialog', { name: 'Tag out' });
    const why = within(sheet).getByLabelText('Why it is tagged out');
    fireEvent.change(why, { target: { value: 'a' } });
    expect(await within(sheet).findByText('Say why it is tagged out')).toBeTruthy();
    fireEvent.change(why, { target: { value: 'Cover worn through near end B' } });
    await waitFor(() => expect(within(sheet).queryByText('Say why it is tagged out')).toBeNull());

    const cautions = within(sheet).getByRole('region', { name: 'Cautions' });
    expect(within(cautions).getByText(CAUTIONS[0]!)).toBeTruthy();
    expect(cautions.textContent).toMatch(/local codes/);
    expect(cautions.textContent).toMatch(/competent person/);
    const confirm = within(sheet).getByRole('button', { name: 'Tag out' });
    expect(cautions.compareDocumentPosition(confirm) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('puts a server field error on its field: the required pressure of a proof test', async () => {
    const assembly = stockAssembly({ status: 'built', proofTest: null, abilities: { proofTest: true, install: false, tagOut: false, remove: false, replace: false, returnToStock: false, scrap: true, override: false } });
    const api = assemblyApi(assembly, []).on(`GET /api/constructions/${CONSTRUCTION.id}`, json({ data: { ...CONSTRUCTION, burstPressureKpa: null } }));
    api.on(`POST /api/assemblies/${assembly.id}/proof-tests`, apiError(400, 'invalid_input', 'The construction has no burst pressure: enter the required test pressure', 'requiredPressure'));
    await open(assembly, technician, api);
    fireEvent.click(within(screen.getByRole('group', { name: 'Actions' })).getByRole('button', { name: 'Proof test' }));
    const sheet = await screen.findByRole('dialog', { name: 'Record a proof test' });
    expect(within(sheet).getByText(/never air or gas/i)).toBeTruthy();
    fireEvent.change(within(sheet).getByLabelText('Pressure held'), { target: { value: '40' } });
    fireEvent.change(within(sheet).getByLabelText('Held for'), { target: { value: '60' } });
    fireEvent.click(within(sheet).getByLabelText('Passed'));
    fireEvent.click(within(sheet).getByRole('button', { name: 'Save proof test' }));

    const field = await within(sheet).findByLabelText('Required test pressure');
    await waitFor(() => expect(field.getAttribute('aria-invalid')).toBe('true'));
    const errorId = field.getAttribute('aria-describedby')!.split(' ').find((id) => id.endsWith('-error'))!;
    expect(document.getElementById(errorId)?.textContent).toBe('The construction has no burst pressure: enter the required test pressure');
    const body = api.last('POST', `/api/assemblies/${assembly.id}/proof-tests`)!.body as Record<string, unknown>;
    expect(body).toMatchObject({ medium: 'water', heldPressure: { value: 40, unit: 'bar' }, holdSeconds: 60, result: 'pass', requiredPressure: null });
    expect(body.idempotencyKey).toMatch(/^[A-Za-z0-9_-]{8,100}$/);
  });

  it('shows the default required pressure of a proof test: half the burst pressure', async () => {
    const assembly = stockAssembly({ status: 'built', proofTest: null, abilities: { proofTest: true, install: false, tagOut: false, remove: false, replace: false, returnToStock: false, scrap: true, override: false } });
    await open(assembly);
    fireEvent.click(within(screen.getByRole('group', { name: 'Actions' })).getByRole('button', { name: 'Proof test' }));
    const sheet = await screen.findByRole('dialog', { name: 'Record a proof test' });
    expect(await within(sheet).findByText('40.0 bar')).toBeTruthy();
    expect(within(sheet).getByText(/half the burst pressure of 80.0 bar/)).toBeTruthy();
  });

  it('lets an engineer void a proof test with a reason; the void goes to the events route', async () => {
    const assembly = overriddenAssembly();
    const events = [buildEvent({ kind: 'proof_test', data: { medium: 'water', result: 'pass', tester: 'Hose shop', holdSeconds: 60, heldPressureKpa: 4000, requiredPressureKpa: 4000 } })];
    const api = assemblyApi(assembly, events).on(`POST /api/events/${events[0]!.id}/void`, json({ data: assembly }));
    await open(assembly, engineer, api);
    fireEvent.click(await screen.findByRole('button', { name: 'Void this proof test…' }));
    const sheet = await screen.findByRole('dialog', { name: 'Void this proof test?' });
    fireEvent.change(within(sheet).getByLabelText('Why it is wrong'), { target: { value: 'Recorded against the wrong assembly' } });
    fireEvent.click(within(sheet).getByRole('button', { name: 'Void it' }));
    await waitFor(() => expect(api.calls('POST', `/api/events/${events[0]!.id}/void`)).toHaveLength(1));
    expect(api.last('POST', `/api/events/${events[0]!.id}/void`)!.body).toMatchObject({ reason: 'Recorded against the wrong assembly' });
  });

  it('offers no void to a technician', async () => {
    const assembly = overriddenAssembly();
    await open(assembly, technician);
    await screen.findByRole('list', { name: 'History' });
    expect(screen.queryByRole('button', { name: /Void this/ })).toBeNull();
  });

  it('says so when the assembly is not found', async () => {
    const api = new MockApi().on('GET /api/assemblies/00000000-0000-4000-8000-000000000000', apiError(404, 'not_found', 'Assembly not found'));
    renderApp('/assemblies/00000000-0000-4000-8000-000000000000', { me: technician, api });
    expect(await screen.findByRole('heading', { level: 1, name: 'Assembly not found' }, { timeout: 5000 })).toBeTruthy();
  });
});
