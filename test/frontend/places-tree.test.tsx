import { describe, expect, it } from 'vitest';
import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { AreaDto, EquipmentDto, PositionDto } from '@shared/schemas/register.schema';
import { buildArea, buildEquipment, buildSite, page } from './support/catalogue-fixtures';
import { buildMe, SITES } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();
// The pages load lazily; on a busy machine the first screen can take longer than a second.
configure({ asyncUtilTimeout: 5000 });

const site = SITES[0]!;
const engineer = buildMe({ role: 'reliability_engineer', sites: [site] });

function position(equipment: EquipmentDto, overrides: Partial<PositionDto> = {}): PositionDto {
  return {
    id: '5b0a5b0a-0000-4000-8000-000000000001',
    siteId: site.id,
    siteName: site.name,
    equipmentId: equipment.id,
    equipmentName: equipment.name,
    equipmentAssetNumber: equipment.assetNumber,
    areaId: equipment.areaId,
    areaName: equipment.areaName,
    code: 'DR-03-AIR',
    name: 'Main air supply',
    serviceCode: 'compressed-air',
    mediumCode: null,
    maxOperatingPressureKpa: 700,
    minTempC: null,
    maxTempC: null,
    sizeCode: 'bore-19',
    requiredLengthMm: null,
    endAConnection: null,
    endBConnection: null,
    suctionDuty: null,
    routedBendRadiusMm: null,
    criticality: 'high',
    inspectionIntervalDays: null,
    effectiveInspectionIntervalDays: 60,
    notes: null,
    currentAssembly: { id: '7a7a7a7a-0000-4000-8000-000000000001', number: '3KQ7VMX', status: 'installed', checkOutcome: 'pass' },
    archivedAt: null,
    updatedAt: '2026-03-02T07:15:00.000Z',
    abilities: { update: true, archive: false, install: false },
    ...overrides,
  };
}

/** A server whose areas list grows when an area is added. */
function placesApi({ areas = [] as AreaDto[], equipment = [] as EquipmentDto[], positions = [] as PositionDto[] } = {}) {
  const stored = [...areas];
  const api = new MockApi()
    .on('GET /api/sites', json({ data: [site] }))
    .on(`GET /api/sites/${site.id}`, json({ data: buildSite() }))
    .on('GET /api/areas', () => json(page(stored)))
    .on('GET /api/equipment', ({ url }) => json(page(equipment.filter((e) => e.areaId === url.searchParams.get('areaId')))))
    .on('GET /api/positions', ({ url }) => json(page(positions.filter((p) => p.equipmentId === url.searchParams.get('equipmentId')))));
  return { api, stored };
}

describe('sites and equipment tree', () => {
  it("adds an area to a site, and opens it", async () => {
    const { api, stored } = placesApi();
    api.on('POST /api/areas', ({ body }) => {
      const area = buildArea({ ...(body as { code: string; name: string }), id: 'a4ea0000-0000-4000-8000-0000000000aa' });
      stored.push(area);
      return json({ data: area }, 201);
    });
    renderApp('/sites', { me: engineer, api });
    expect(await screen.findByText(`No areas at ${site.name} yet. Add the pits, plants and workshops where its equipment works.`)).toBeTruthy();
    expect(screen.getByText('Europe/London')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Add area' }));
    const dialog = await screen.findByRole('dialog', { name: 'New area' });
    fireEvent.change(within(dialog).getByLabelText('Area code'), { target: { value: 'WS' } });
    fireEvent.change(within(dialog).getByLabelText('Area name'), { target: { value: 'Hose workshop' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add area' }));

    await waitFor(() => expect(api.calls('POST', '/api/areas')).toHaveLength(1));
    expect(api.last('POST', '/api/areas')!.body).toEqual({ siteId: site.id, code: 'WS', name: 'Hose workshop' });
    const areas = await screen.findByRole('list', { name: `Areas of ${site.name}` });
    const toggle = within(areas).getByRole('button', { name: /^WS\s*Hose workshop/ });
    expect(toggle.getAttribute('aria-expanded')).toBe('true');
    expect(await screen.findByText('No equipment in Hose workshop yet. Add the machines and plant items that carry hoses.')).toBeTruthy();
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('keeps the area form open with the server refusing a code on the code field', async () => {
    const { api } = placesApi({ areas: [buildArea()] });
    api.on('POST /api/areas', apiError(409, 'code_taken', 'Another area of this site has this code', 'code'));
    renderApp('/sites', { me: engineer, api });
    fireEvent.click(await screen.findByRole('button', { name: 'Add area' }));
    const dialog = await screen.findByRole('dialog', { name: 'New area' });
    fireEvent.change(within(dialog).getByLabelText('Area code'), { target: { value: 'PIT' } });
    fireEvent.change(within(dialog).getByLabelText('Area name'), { target: { value: 'North pit' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add area' }));
    expect(await within(dialog).findByText('Another area of this site has this code')).toBeTruthy();
    expect(within(dialog).getByLabelText('Area code').getAttribute('aria-invalid')).toBe('true');
  });

  it('opens an area and its equipment down to the positions, which link to their own pages', async () => {
    const area = buildArea();
    const rig = buildEquipment({ areaId: area.id });
    const { api } = placesApi({ areas: [area], equipment: [rig], positions: [position(rig)] });
    renderApp(`/sites?siteId=${site.id}`, { me: engineer, api });
    fireEvent.click(await screen.findByRole('button', { name: /^PIT\s*Main pit/ }));
    fireEvent.click(await screen.findByRole('button', { name: /^DR-03\s*Drill rig 3/ }));
    const positions = await screen.findByRole('list', { name: 'Positions on Drill rig 3' });
    const link = within(positions).getByRole('link', { name: /Main air supply/ });
    expect(link.getAttribute('href')).toBe('/positions/5b0a5b0a-0000-4000-8000-000000000001');
    expect(within(link).getByText('3KQ-7VM-X')).toBeTruthy();
    expect(within(link).getByText('Compressed air')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Add position' }).getAttribute('href')).toBe(`/positions/new?equipmentId=${rig.id}`);

    fireEvent.click(screen.getByRole('button', { name: /^PIT\s*Main pit/ }));
    expect(screen.queryByRole('list', { name: 'Positions on Drill rig 3' })).toBeNull();
  });

  it('adds equipment with an hour meter to an area', async () => {
    const area = buildArea();
    const { api } = placesApi({ areas: [area] });
    api.on('POST /api/equipment', ({ body }) => json({ data: buildEquipment({ ...(body as object), areaId: area.id }) }, 201));
    renderApp('/sites', { me: engineer, api });
    fireEvent.click(await screen.findByRole('button', { name: /^PIT\s*Main pit/ }));
    fireEvent.click(await screen.findByRole('button', { name: 'Add equipment' }));
    const dialog = await screen.findByRole('dialog', { name: 'New equipment' });
    fireEvent.change(within(dialog).getByLabelText('Asset number'), { target: { value: 'DW-02' } });
    fireEvent.change(within(dialog).getByLabelText('Equipment name'), { target: { value: 'Dewatering pump 2' } });
    fireEvent.click(within(dialog).getByLabelText('Has an hour meter'));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add equipment' }));
    await waitFor(() => expect(api.calls('POST', '/api/equipment')).toHaveLength(1));
    expect(api.last('POST', '/api/equipment')!.body).toEqual({ areaId: area.id, assetNumber: 'DW-02', name: 'Dewatering pump 2', hasHourMeter: true });
  });

  it("shows the server's reason when an area still in use cannot be archived", async () => {
    const area = buildArea();
    const { api } = placesApi({ areas: [area] });
    api.on(`POST /api/areas/${area.id}/archive`, apiError(409, 'area_in_use', 'Archive the 2 pieces of equipment in this area first'));
    renderApp('/sites', { me: engineer, api });
    fireEvent.click(await screen.findByRole('button', { name: 'Archive Main pit' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Archive Main pit?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Archive area' }));
    expect(await within(dialog).findByText('Archive the 2 pieces of equipment in this area first')).toBeTruthy();
  });

  it('gives a viewer the tree to read, with no way to change it', async () => {
    const area = buildArea({ abilities: { update: false, archive: false } });
    const { api } = placesApi({ areas: [area] });
    renderApp('/sites', { me: buildMe({ role: 'viewer', sites: [site] }), api });
    expect(await screen.findByRole('button', { name: /^PIT\s*Main pit/ })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Add area' })).toBeNull();
    expect(screen.queryByRole('button', { name: /Rename/ })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Add site' })).toBeNull();
  });

  it('lets an administrator add a site', async () => {
    const { api } = placesApi();
    api.on('POST /api/sites', ({ body }) => json({ data: buildSite({ ...(body as object), id: '7d0c7f8e-1c1a-4c43-9f0a-0d5f1a6c2b09' }) }, 201));
    renderApp('/sites', { me: buildMe({ role: 'administrator', allSites: true, sites: [site] }), api });
    fireEvent.click(await screen.findByRole('button', { name: 'Add site' }));
    const dialog = await screen.findByRole('dialog', { name: 'New site' });
    fireEvent.change(within(dialog).getByLabelText('Site code'), { target: { value: 'SQ' } });
    fireEvent.change(within(dialog).getByLabelText('Site name'), { target: { value: 'South quarry' } });
    fireEvent.change(within(dialog).getByLabelText('Time zone'), { target: { value: 'Europe/London' } });
    fireEvent.change(within(dialog).getByLabelText('Currency'), { target: { value: 'gbp' } });
    fireEvent.change(within(dialog).getByLabelText('Pressure'), { target: { value: 'psi' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add site' }));
    await waitFor(() => expect(api.calls('POST', '/api/sites')).toHaveLength(1));
    expect(api.last('POST', '/api/sites')!.body).toEqual({
      code: 'SQ',
      name: 'South quarry',
      timeZone: 'Europe/London',
      currency: 'GBP',
      defaultUnits: { pressureUnit: 'psi', lengthUnit: 'mm', temperatureUnit: 'C' },
    });
    await waitFor(() => expect(api.calls('GET', '/api/sites').length).toBeGreaterThan(1));
  });

  it('shows an error with a retry when the areas cannot be loaded', async () => {
    let fail = true;
    const { api } = placesApi({ areas: [buildArea()] });
    api.on('GET /api/areas', () => (fail ? apiError(500, 'internal', 'The server ran into a problem.') : undefined));
    renderApp('/sites', { me: engineer, api });
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The areas could not be loaded')).toBeTruthy();
    fail = false;
    fireEvent.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('button', { name: /^PIT\s*Main pit/ })).toBeTruthy();
  });
});
