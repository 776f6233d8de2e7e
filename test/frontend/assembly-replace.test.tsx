import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { formatTagCode } from '@shared/tags/tag-code';
import { buildMe, SITES } from './support/fixtures';
import { buildAssembly, buildPosition, CAUTIONS, checkResult, CLAW, CONSTRUCTION, listItemOf, page, siteServices, stockAssembly } from './support/assembly-fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp, type ApiRequest } from './support/render-app';

registerDomCleanup();

const technician = buildMe({ role: 'technician' });
const engineer = buildMe({ role: 'reliability_engineer', allSites: true, sites: SITES });

function scenario() {
  const position = buildPosition();
  const old = buildAssembly({ position: { id: position.id, code: position.code, name: position.name, equipmentName: position.equipmentName, equipmentAssetNumber: position.equipmentAssetNumber, areaName: position.areaName, serviceCode: position.serviceCode } });
  const fresh = stockAssembly();
  const installed = { ...fresh, status: 'installed' as const, position: old.position, checkOutcome: 'pass' as const, storeLocation: null };
  const api = new MockApi()
    .on(`GET /api/assemblies/${old.id}`, json({ data: old, cautions: CAUTIONS }))
    .on(`GET /api/assemblies/${fresh.id}`, json({ data: fresh, cautions: CAUTIONS }))
    .on('GET /api/assemblies', json(page([listItemOf(fresh)])))
    .on(`GET /api/positions/${position.id}`, json({ data: position }))
    .on(`GET /api/equipment/${position.equipmentId}`, json({ data: { id: position.equipmentId, siteId: position.siteId, areaId: position.areaId, areaName: position.areaName, assetNumber: 'DR-03', name: 'Drill rig 3', hasHourMeter: true, hourMeterHours: 1200, hourMeterReadAt: null, archivedAt: null, abilities: { update: false, archive: false } } }))
    .on(`GET /api/constructions/${CONSTRUCTION.id}`, json({ data: CONSTRUCTION }))
    .on(`GET /api/fitting-types/${CLAW.id}`, json({ data: CLAW }))
    .on('GET /api/services', json({ data: siteServices() }));
  return { old, fresh, installed, position, api };
}

const confirmPath = (oldId: string, newId: string) => `/assemblies/${oldId}/replace?step=confirm&reason=failure&new=${newId}`;

async function openConfirm(s = scenario(), me = technician) {
  const view = renderApp(confirmPath(s.old.id, s.fresh.id), { me, api: s.api });
  await screen.findByRole('heading', { level: 2, name: 'Confirm the replacement' }, { timeout: 5000 });
  await screen.findByText(formatTagCode(s.fresh.number), {}, { timeout: 5000 });
  return view;
}

const replaceCalls = (api: MockApi, oldId: string): ApiRequest[] => api.calls('POST', `/api/assemblies/${oldId}/replace`);

describe('replacing a hose', { timeout: 15_000 }, () => {
  it('walks through the reason, the new assembly from stock and the cautions to the confirm step', async () => {
    const s = scenario();
    const { router } = renderApp(`/assemblies/${s.old.id}/replace`, { me: technician, api: s.api });
    expect(await screen.findByRole('heading', { level: 2, name: 'Why did it come out?' }, { timeout: 5000 })).toBeTruthy();
    fireEvent.click(screen.getByLabelText('Worn at inspection'));
    fireEvent.click(screen.getByRole('button', { name: 'Next: pick the new assembly' }));

    expect(await screen.findByRole('heading', { level: 2, name: 'Pick the new assembly' })).toBeTruthy();
    const stock = await screen.findByRole('list', { name: 'Assemblies in stock' });
    const query = s.api.last('GET', '/api/assemblies')!.url.searchParams;
    expect(query.get('status')).toBe('in_stock');
    expect(query.get('siteId')).toBe(s.old.siteId);
    expect(query.get('sizeCode')).toBe('bore-19');
    fireEvent.click(within(stock).getByRole('radio'));
    const build = screen.getByRole('link', { name: /Build a new one/ });
    expect(build.getAttribute('href')).toContain(`siteId=${s.old.siteId}`);
    expect(decodeURIComponent(build.getAttribute('href')!)).toContain(`next=/assemblies/${s.old.id}/replace?`);
    fireEvent.click(screen.getByRole('button', { name: 'Next: the cautions' }));

    expect(await screen.findByRole('heading', { level: 2, name: 'Before you disconnect' })).toBeTruthy();
    for (const caution of CAUTIONS) expect(screen.getByText(caution)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'I have read these: next' }));

    expect(await screen.findByRole('heading', { level: 2, name: 'Confirm the replacement' })).toBeTruthy();
    expect(router.state.location.search).toContain('reason=worn-at-inspection');
    expect(router.state.location.search).toContain(`new=${s.fresh.id}`);
    expect(await screen.findByText('Every check passes at this position.')).toBeTruthy();
  });

  it('shows the cautions before the confirm button', async () => {
    await openConfirm();
    const cautions = screen.getByRole('region', { name: 'Cautions' });
    for (const caution of CAUTIONS) expect(within(cautions).getByText(caution)).toBeTruthy();
    expect(cautions.textContent).toMatch(/local codes/);
    const confirm = screen.getByRole('button', { name: 'Confirm replacement' });
    expect(cautions.compareDocumentPosition(confirm) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
  });

  it('sends one request with one key when confirm is tapped twice, and says Saved only from the answer', async () => {
    const s = scenario();
    let release: () => void = () => {};
    const answered = new Promise<void>((resolve) => (release = resolve));
    s.api.on(`POST /api/assemblies/${s.old.id}/replace`, async () => {
      await answered;
      return json({ data: s.installed, cautions: CAUTIONS });
    });
    await openConfirm(s);
    const confirm = screen.getByRole('button', { name: 'Confirm replacement' });
    fireEvent.click(confirm);
    fireEvent.click(confirm);
    await waitFor(() => expect(replaceCalls(s.api, s.old.id)).toHaveLength(1));
    fireEvent.click(confirm);
    expect(screen.queryByRole('heading', { name: 'Saved' })).toBeNull();
    release();

    expect(await screen.findByRole('heading', { name: 'Saved' })).toBeTruthy();
    expect(replaceCalls(s.api, s.old.id)).toHaveLength(1);
    const body = replaceCalls(s.api, s.old.id)[0]!.body as Record<string, unknown>;
    expect(body).toMatchObject({ newAssemblyId: s.fresh.id, reason: 'failure' });
    expect(body.idempotencyKey).toMatch(/^[A-Za-z0-9_-]{8,100}$/);
    expect(screen.getByRole('link', { name: formatTagCode(s.old.number) }).getAttribute('href')).toBe(`/assemblies/${s.old.id}`);
    expect(screen.getAllByRole('link', { name: formatTagCode(s.fresh.number) })[0]!.getAttribute('href')).toBe(`/assemblies/${s.fresh.id}`);
    expect(screen.getByText(/Taken out of/).textContent).toContain('failure');
  });

  it('retries once on a network error with the same key, so the replacement is made once', async () => {
    const s = scenario();
    let attempts = 0;
    s.api.on(`POST /api/assemblies/${s.old.id}/replace`, () => {
      attempts += 1;
      if (attempts === 1) throw new TypeError('Failed to fetch');
      return json({ data: s.installed, cautions: CAUTIONS }, 200, { 'Idempotent-Replayed': 'true' });
    });
    await openConfirm(s);
    fireEvent.click(screen.getByRole('button', { name: 'Confirm replacement' }));
    expect(await screen.findByRole('heading', { name: 'Saved' })).toBeTruthy();
    const calls = replaceCalls(s.api, s.old.id);
    expect(calls).toHaveLength(2);
    const [first, second] = calls.map((c) => (c.body as { idempotencyKey: string }).idempotencyKey);
    expect(first).toBeTruthy();
    expect(second).toBe(first);
  });

  it('keeps the key when the person presses again after no answer at all', async () => {
    const s = scenario();
    let attempts = 0;
    s.api.on(`POST /api/assemblies/${s.old.id}/replace`, () => {
      attempts += 1;
      if (attempts <= 2) throw new TypeError('Failed to fetch');
      return json({ data: s.installed, cautions: CAUTIONS });
    });
    await openConfirm(s);
    fireEvent.click(screen.getByRole('button', { name: 'Confirm replacement' }));
    expect(await screen.findByText(/No answer from the server/)).toBeTruthy();
    expect(screen.queryByRole('heading', { name: 'Saved' })).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('heading', { name: 'Saved' })).toBeTruthy();
    const keys = new Set(replaceCalls(s.api, s.old.id).map((c) => (c.body as { idempotencyKey: string }).idempotencyKey));
    expect(replaceCalls(s.api, s.old.id)).toHaveLength(3);
    expect(keys.size).toBe(1);
  });

  it('shows the failing checks when the server refuses, and lets an engineer override them', async () => {
    const s = scenario();
    const bend = checkResult({ check: 'bend-radius', outcome: 'fail', sentence: 'The hose is routed through a 100 mm bend, tighter than its 150 mm minimum bend radius.' });
    s.api.on(`POST /api/assemblies/${s.old.id}/replace`, ({ body }) =>
      (body as { override?: unknown }).override
        ? json({ data: { ...s.installed, overridden: true, checkOutcome: 'warn' }, cautions: CAUTIONS })
        : {
            status: 409,
            body: { error: { code: 'checks_failed', message: `${bend.sentence} A reliability engineer or administrator may accept this.`, details: { results: [bend, checkResult({ check: 'size-class' })], overridable: true } } },
          },
    );
    await openConfirm(s, engineer);
    fireEvent.click(screen.getByRole('button', { name: 'Confirm replacement' }));
    const refusal = await screen.findByTestId('checks-refusal');
    expect(within(refusal).getByText(bend.sentence)).toBeTruthy();
    const override = within(refusal).getByRole('group', { name: 'Override the failed checks' });
    fireEvent.change(within(override).getByLabelText('Why it is acceptable'), { target: { value: 'Guard fitted; routing changes at the next shutdown' } });
    fireEvent.click(within(override).getByRole('button', { name: 'Replace with override' }));
    expect(await screen.findByRole('heading', { name: 'Saved' })).toBeTruthy();
    const last = replaceCalls(s.api, s.old.id).at(-1)!.body as { override: { checks: string[]; reason: string; reviewOn: string } };
    expect(last.override.checks).toEqual(['bend-radius']);
    expect(last.override.reason).toBe('Guard fitted; routing changes at the next shutdown');
    expect(last.override.reviewOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });

  it('says plainly when a failed check cannot be overridden', async () => {
    const s = scenario();
    const pressure = checkResult({ check: 'allowable-pressure', outcome: 'fail', overridable: false, sentence: 'Allowable 10.0 bar is below the 30.0 bar this position can see.' });
    s.api.on(`POST /api/assemblies/${s.old.id}/replace`, {
      status: 409,
      body: { error: { code: 'checks_failed', message: pressure.sentence, details: { results: [pressure], overridable: false } } },
    });
    await openConfirm(s, engineer);
    fireEvent.click(screen.getByRole('button', { name: 'Confirm replacement' }));
    const refusal = await screen.findByTestId('checks-refusal');
    expect(within(refusal).getByText(pressure.sentence)).toBeTruthy();
    expect(within(refusal).getByText('This cannot be overridden')).toBeTruthy();
    expect(within(refusal).getByText(/change of the position’s design conditions/)).toBeTruthy();
    expect(within(refusal).queryByRole('group', { name: 'Override the failed checks' })).toBeNull();
  });

  it('shows a conflict as the server words it, with a reload', async () => {
    const s = scenario();
    s.api.on(`POST /api/assemblies/${s.old.id}/replace`, apiError(409, 'wrong_status', 'Assembly 2Y2STAV is installed, not in stock. Choose another.', 'newAssemblyId'));
    await openConfirm(s);
    fireEvent.click(screen.getByRole('button', { name: 'Confirm replacement' }));
    expect(await screen.findByText('Assembly 2Y2STAV is installed, not in stock. Choose another.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Choose another assembly' })).toBeTruthy();
  });

  it('tells a fitter when the assembly is not installed, so there is nothing to replace', async () => {
    const s = scenario();
    const removed = { ...s.old, status: 'removed' as const, position: null, abilities: { ...s.old.abilities, replace: false } };
    s.api.on(`GET /api/assemblies/${s.old.id}`, json({ data: removed, cautions: CAUTIONS }));
    renderApp(`/assemblies/${s.old.id}/replace`, { me: technician, api: s.api });
    expect(await screen.findByText('This assembly cannot be replaced now', {}, { timeout: 5000 })).toBeTruthy();
  });
});
