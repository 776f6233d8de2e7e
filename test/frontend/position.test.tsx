import { describe, expect, it } from 'vitest';
import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { AssemblyDto, PositionLifeDto } from '@shared/schemas/assemblies.schema';
import type { PositionDto, ReferenceDto, SiteServiceDto } from '@shared/schemas/register.schema';
import { CRITICALITY_DEFINITIONS } from '@shared/services/criticality';
import { REMOVAL_REASON_DEFINITIONS } from '@shared/services/removal-reasons';
import { defaultServiceSettings, SERVICE_CATALOGUE } from '@shared/services/service-catalogue';
import { MEDIA } from '@shared/checks/compatibility';
import { SIZE_CLASSES } from '@shared/sizes/nominal-sizes';
import { KPA_PER_PSI } from '@shared/units/units';
import { buildMe, SITES } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();
// Each page is loaded on demand, as in the app: on a busy machine the first render takes a while.
configure({ asyncUtilTimeout: 10_000 });

const POSITION_ID = '5c7a0e7e-3f1b-4c1e-9a51-0000000000a1';
const ASSEMBLY_ID = '5c7a0e7e-3f1b-4c1e-9a51-0000000000b1';

const reference = {
  sizeClasses: SIZE_CLASSES.map((s) => ({ ...s, alsoWrittenMm: [...s.alsoWrittenMm] })),
  media: MEDIA.map((m) => ({ ...m })),
  tubeCompounds: [],
  compatibility: {},
  compatibilityRatings: ['suitable', 'limited', 'unsuitable'],
  reinforcements: [],
  electricalProperties: [],
  criticalityLevels: CRITICALITY_DEFINITIONS.map((c) => ({ ...c })),
  removalReasons: REMOVAL_REASON_DEFINITIONS.map((r) => ({ ...r })),
  fittingStyles: [],
  services: SERVICE_CATALOGUE.map((s) => ({ ...s })),
  units: { pressure: ['kPa', 'bar', 'psi', 'MPa'], length: ['mm', 'in', 'm', 'ft'], temperature: ['C', 'F'] },
} as unknown as ReferenceDto;

function buildPosition(overrides: Partial<PositionDto> = {}): PositionDto {
  return {
    id: POSITION_ID,
    siteId: SITES[0]!.id,
    siteName: SITES[0]!.name,
    equipmentId: '5c7a0e7e-3f1b-4c1e-9a51-0000000000e1',
    equipmentName: 'Drill rig 3',
    equipmentAssetNumber: 'DR-03',
    areaId: '5c7a0e7e-3f1b-4c1e-9a51-0000000000c1',
    areaName: 'Main pit',
    code: 'DR03-AIR-MAIN',
    name: 'Main air supply',
    serviceCode: 'compressed-air',
    mediumCode: 'compressed-air-oil-mist',
    maxOperatingPressureKpa: 150 * KPA_PER_PSI,
    minTempC: -20,
    maxTempC: 60,
    sizeCode: 'bore-25',
    requiredLengthMm: 6000,
    endAConnection: 'Claw 1 in',
    endBConnection: 'Claw 1 in',
    suctionDuty: false,
    routedBendRadiusMm: 300,
    criticality: 'high',
    inspectionIntervalDays: null,
    effectiveInspectionIntervalDays: 45,
    notes: null,
    currentAssembly: { id: ASSEMBLY_ID, number: '5W5KMMH', status: 'installed', checkOutcome: 'pass' },
    archivedAt: null,
    updatedAt: '2026-11-30T08:00:00.000Z',
    abilities: { update: true, archive: false, install: false },
    ...overrides,
  };
}

const LIVES: PositionLifeDto[] = [
  { assemblyId: ASSEMBLY_ID, assemblyNumber: '5W5KMMH', constructionCode: 'AIR-25-W', installedAt: '2025-09-16T07:30:00.000Z', installedAtEstimated: false, removedAt: null, daysInService: 441.6, hoursInService: null, removalReason: null, lifeOutcome: null, current: true },
  { assemblyId: '5c7a0e7e-3f1b-4c1e-9a51-0000000000b2', assemblyNumber: '4D46QFP', constructionCode: 'AIR-25-W', installedAt: '2025-03-03T07:30:00.000Z', installedAtEstimated: false, removedAt: '2025-09-15T07:30:00.000Z', daysInService: 196, hoursInService: 1900, removalReason: 'planned-replacement', lifeOutcome: 'suspension', current: false },
  { assemblyId: '5c7a0e7e-3f1b-4c1e-9a51-0000000000b3', assemblyNumber: '2Y2STAV', constructionCode: 'AIR-25-W', installedAt: '2024-07-21T07:30:00.000Z', installedAtEstimated: true, removedAt: '2025-03-02T07:30:00.000Z', daysInService: 224, hoursInService: 2200, removalReason: 'worn-at-inspection', lifeOutcome: 'failure', current: false },
];

function buildAssembly(checkOutcome: AssemblyDto['checkOutcome']): AssemblyDto {
  return {
    id: ASSEMBLY_ID,
    number: '5W5KMMH',
    status: 'installed',
    siteId: SITES[0]!.id,
    siteName: SITES[0]!.name,
    construction: { id: '5c7a0e7e-3f1b-4c1e-9a51-0000000000f1', code: 'AIR-25-W', name: 'Air hose 1 in', sizeCode: 'bore-25' },
    position: { id: POSITION_ID, code: 'DR03-AIR-MAIN', name: 'Main air supply', equipmentName: 'Drill rig 3', equipmentAssetNumber: 'BFQ-DR-03', areaName: 'Main pit', serviceCode: 'compressed-air' },
    checkOutcome,
    overridden: false,
    nextInspectionDue: '2026-12-20',
    installedAt: '2025-09-16T07:30:00.000Z',
    updatedAt: '2026-11-30T08:00:00.000Z',
    hoseBatch: null,
    hoseManufacturedOn: null,
    overallLengthMm: 6000,
    cutLengthMm: null,
    endA: null,
    endB: null,
    builtOn: '2025-09-01',
    builtOnEstimated: false,
    builder: null,
    cost: null,
    storeLocation: null,
    installedAtEstimated: false,
    predatesRecords: false,
    proofTest: null,
    allowablePressureKpa: 2068,
    checkResults: [
      checkOutcome === 'fail'
        ? { check: 'allowable-pressure', outcome: 'fail', sentence: 'Allowable 20.7 bar is below the 25.0 bar this position can see.', source: [], overridable: false }
        : { check: 'allowable-pressure', outcome: 'pass', sentence: 'Allowable 20.7 bar covers the 10.3 bar this position can see.', source: [], overridable: false },
    ],
    overrides: [],
    lastInspectedAt: null,
    notes: null,
    version: 1,
    abilities: { proofTest: false, install: false, tagOut: true, remove: true, replace: true, returnToStock: false, scrap: false, override: true },
  };
}

const siteServices: SiteServiceDto[] = SERVICE_CATALOGUE.map((s) => ({
  siteId: SITES[0]!.id,
  serviceCode: s.code,
  name: s.name,
  description: s.description,
  settings: defaultServiceSettings(s),
  defaults: defaultServiceSettings(s),
  customised: false,
}));

function positionApi(position = buildPosition()) {
  return new MockApi()
    .on('GET /api/sites', json({ data: SITES }))
    .on('GET /api/reference', json({ data: reference }))
    .on('GET /api/services', json({ data: siteServices, pagination: { page: 1, pageSize: siteServices.length, total: siteServices.length } }))
    .on(`GET /api/positions/${POSITION_ID}`, json({ data: position }))
    .on(`GET /api/positions/${POSITION_ID}/history`, json({ data: LIVES }))
    .on(`GET /api/assemblies/${ASSEMBLY_ID}`, json({ data: buildAssembly('pass') }));
}

const engineer = buildMe({ role: 'reliability_engineer', allSites: true, sites: SITES, preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } });

async function openPosition(api = positionApi(), me = engineer) {
  const view = renderApp(`/positions/${POSITION_ID}`, { me, api });
  await screen.findByRole('heading', { level: 1, name: 'DR03-AIR-MAIN' });
  return view;
}

/** Saving is offered once the form holds a change, which it knows after checking the value. */
async function saveForm(form: HTMLElement) {
  const save = within(form).getByRole('button', { name: 'Save design conditions' }) as HTMLButtonElement;
  await waitFor(() => expect(save.disabled).toBe(false));
  fireEvent.click(save);
}

const termValue = (region: HTMLElement, term: string) => within(region).getByText(term).nextElementSibling?.textContent;

describe('position page', { timeout: 30_000 }, () => {
  it("shows the design conditions in the viewer's units: psi, inches and °F", async () => {
    await openPosition();
    const conditions = screen.getByRole('region', { name: 'Design conditions' });
    expect(await within(conditions).findByText('Compressed air')).toBeTruthy();
    expect(termValue(conditions, 'Maximum operating pressure')).toBe('150 psi');
    expect(termValue(conditions, 'Temperature range')).toBe('-4 °F to 140 °F');
    expect(termValue(conditions, 'Required length')).toBe('236 in');
    expect(termValue(conditions, 'Routed bend radius')).toBe('11.8 in');
    expect(termValue(conditions, 'Size')).toBe('1 in (25 mm, −16)');
    expect(termValue(conditions, 'Medium')).toBe('compressed air with compressor oil mist, up to 70 °C');
    expect(within(conditions).getByText('Every 45 days')).toBeTruthy();
    expect(within(conditions).getByText(/adjusted for high criticality/)).toBeTruthy();
  });

  it('shows the equipment, the assembly in the position and its checks', async () => {
    await openPosition();
    expect(screen.getByText('DR-03')).toBeTruthy();
    const current = screen.getByRole('region', { name: 'Assembly in this position' });
    expect(within(current).getByRole('link', { name: '5W5-KMM-H' }).getAttribute('href')).toBe(`/assemblies/${ASSEMBLY_ID}`);
    expect(await within(current).findByText('All 1 checks pass')).toBeTruthy();
  });

  it('lists every assembly that has been in the position, with its life and how it ended', async () => {
    await openPosition();
    const history = screen.getByRole('region', { name: 'History' });
    const table = await within(history).findByRole('table', { name: 'Assemblies at this position' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(1 + LIVES.length);
    expect(within(rows[1]!).getByText('Still in service')).toBeTruthy();
    expect(within(rows[1]!).getByText('442')).toBeTruthy();
    expect(within(rows[2]!).getByText('Suspension')).toBeTruthy();
    expect(within(rows[2]!).getByText('Planned replacement')).toBeTruthy();
    expect(within(rows[2]!).getByText('1,900 h')).toBeTruthy();
    expect(within(rows[3]!).getByText('Failure')).toBeTruthy();
    expect(within(rows[3]!).getByText('Worn at inspection')).toBeTruthy();
    expect(within(rows[3]!).getByText(/^about /)).toBeTruthy();
    // The time line names each life's length and ending in words, not only by its fill.
    const timeline = within(history).getByRole('figure');
    expect(within(timeline).getByText('224 days · Failed')).toBeTruthy();
    expect(within(timeline).getByText('196 days · Suspended')).toBeTruthy();
    expect(within(history).getByText('Ended in failure').nextElementSibling?.textContent).toBe('1');
  });

  it("puts the server's field error on the field it names", async () => {
    const api = positionApi().on(`PATCH /api/positions/${POSITION_ID}`, apiError(400, 'invalid_input', 'The highest temperature must be at least the lowest', 'maxTemp.value'));
    await openPosition(api);
    fireEvent.click(await screen.findByRole('button', { name: 'Edit design conditions' }));
    const form = await screen.findByRole('form', { name: 'Edit design conditions' });
    const highest = within(form).getByLabelText(/Highest temperature/) as HTMLInputElement;
    expect(highest.value).toBe('140');
    fireEvent.change(highest, { target: { value: '150' } });
    await saveForm(form);

    await waitFor(() => expect(highest.getAttribute('aria-invalid')).toBe('true'));
    const describedBy = (highest.getAttribute('aria-describedby') ?? '').split(' ').map((id) => document.getElementById(id)?.textContent);
    expect(describedBy).toContain('The highest temperature must be at least the lowest');
    expect(api.last('PATCH', `/api/positions/${POSITION_ID}`)?.body).toEqual({ maxTemp: { value: 150, unit: 'F' } });
  });

  it('checks each value as it is typed', async () => {
    await openPosition();
    fireEvent.click(await screen.findByRole('button', { name: 'Edit design conditions' }));
    const form = await screen.findByRole('form', { name: 'Edit design conditions' });
    const lowest = within(form).getByLabelText(/Lowest temperature/) as HTMLInputElement;
    fireEvent.change(lowest, { target: { value: 'abc' } });
    expect(await within(form).findByText('Lowest temperature must be a number')).toBeTruthy();
    expect(lowest.getAttribute('aria-invalid')).toBe('true');
  });

  it('sends only the changes, in the units they were typed in, with the reason, and shows the checks recomputed', async () => {
    let outcome: 'pass' | 'fail' = 'pass';
    const api = positionApi()
      .on(`GET /api/assemblies/${ASSEMBLY_ID}`, () => json({ data: buildAssembly(outcome) }))
      .on(`PATCH /api/positions/${POSITION_ID}`, () => {
        outcome = 'fail';
        return json({ data: buildPosition({ maxOperatingPressureKpa: 362.6 * KPA_PER_PSI, currentAssembly: { id: ASSEMBLY_ID, number: '5W5KMMH', status: 'installed', checkOutcome: 'fail' } }) });
      });
    await openPosition(api);
    fireEvent.click(await screen.findByRole('button', { name: 'Edit design conditions' }));
    const form = await screen.findByRole('form', { name: 'Edit design conditions' });
    fireEvent.change(within(form).getByLabelText(/Maximum operating pressure/), { target: { value: '362.6' } });
    fireEvent.change(within(form).getByLabelText(/Reason for the change/), { target: { value: 'Booster compressor fitted' } });
    await saveForm(form);

    await waitFor(() =>
      expect(api.last('PATCH', `/api/positions/${POSITION_ID}`)?.body).toEqual({ maxOperatingPressure: { value: 362.6, unit: 'psi' }, reason: 'Booster compressor fitted' }),
    );
    const current = screen.getByRole('region', { name: 'Assembly in this position' });
    expect(await within(current).findByText('Checks recomputed')).toBeTruthy();
    expect(within(current).getByText(/below the 25.0 bar/)).toBeTruthy();
    expect(api.calls('GET', `/api/assemblies/${ASSEMBLY_ID}`).length).toBeGreaterThanOrEqual(2);
  });

  it('refuses to archive while an assembly is installed, and says why', async () => {
    await openPosition();
    const archive = screen.getByRole('region', { name: 'Archive' });
    expect(within(archive).getByText(/can't be archived while an assembly is in it/)).toBeTruthy();
    expect((within(archive).getByRole('button', { name: 'Archive position' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('offers no editing to a technician', async () => {
    await openPosition(positionApi(buildPosition({ abilities: { update: false, archive: false, install: true } })), buildMe({ role: 'technician' }));
    expect(screen.queryByRole('button', { name: 'Edit design conditions' })).toBeNull();
    expect(screen.queryByRole('region', { name: 'Archive' })).toBeNull();
  });
});
