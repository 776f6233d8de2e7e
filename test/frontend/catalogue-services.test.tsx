import { describe, expect, it } from 'vitest';
import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { ServiceSettingsInput, SiteServiceDto } from '@shared/schemas/register.schema';
import { WATER_LOW_PRESSURE_LIMIT_KPA } from '@shared/services/service-catalogue';
import { buildReference, buildSiteService } from './support/catalogue-fixtures';
import { buildMe, SITES } from './support/fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();
// The pages load lazily; on a busy machine the first screen can take longer than a second.
configure({ asyncUtilTimeout: 5000 });

const engineer = buildMe({ role: 'reliability_engineer', allSites: true, sites: SITES, preferences: { pressureUnit: 'psi', lengthUnit: 'mm', temperatureUnit: 'C' } });
const servicePath = (code: string, siteId = SITES[0]!.id) => `/api/sites/${siteId}/services/${code}`;

/** The server's services, kept up to date by the PUT and reset answers a test gives. */
function servicesApi(services: SiteServiceDto[] = [buildSiteService('compressed-air'), buildSiteService('water-discharge')]) {
  const stored = new Map(services.map((s) => [s.serviceCode, s]));
  const api = new MockApi()
    .on('GET /api/sites', json({ data: SITES }))
    .on('GET /api/reference', json({ data: buildReference() }))
    .on('GET /api/services', ({ url }) => {
      const siteId = url.searchParams.get('siteId')!;
      const rows = [...stored.values()].map((s) => ({ ...s, siteId }));
      return json({ data: rows, pagination: { page: 1, pageSize: rows.length, total: rows.length } });
    });
  const store = (service: SiteServiceDto) => {
    stored.set(service.serviceCode, service);
    return json({ data: service });
  };
  return { api, store };
}

const card = (name: string) => screen.getByRole('listitem', { name });

async function openService(name: string, api: MockApi, me = engineer) {
  const view = renderApp(`/catalogue/services?siteId=${SITES[0]!.id}`, { me, api });
  await screen.findByRole('heading', { name });
  fireEvent.click(within(card(name)).getByRole('button', { name: 'Settings and sources' }));
  return view;
}

describe('services at a site', () => {
  it('shows each setting with where it comes from', async () => {
    await openService('Water discharge', servicesApi().api);
    const water = card('Water discharge');
    const bands = within(water).getByRole('table', { name: 'Design factors of Water discharge' });
    const rows = within(bands).getAllByRole('row');
    expect(within(rows[1]!).getByText('Up to 150 psi')).toBeTruthy();
    expect(within(rows[1]!).getByText('3 : 1')).toBeTruthy();
    expect(within(rows[1]!).getByText('RMA Hose Handbook IP-2 (2003), design ratios for newly manufactured hose: water hose up to 150 psi, 3:1')).toBeTruthy();
    expect(within(rows[2]!).getByText('Above 150 psi')).toBeTruthy();
    expect(within(water).getByText('Every 180 days')).toBeTruthy();
    expect(within(water).getByText(/Source: Common practice; inspection frequency by the severity/)).toBeTruthy();
    expect(within(water).getByText('Catalogue defaults')).toBeTruthy();
  });

  it('saves changed settings for the site, keeping the untouched band tops exactly as stored', async () => {
    const { api, store } = servicesApi();
    api.on(`PUT ${servicePath('water-discharge')}`, ({ body }) => store({ ...buildSiteService('water-discharge'), settings: body as ServiceSettingsInput, customised: true }));
    await openService('Water discharge', api);
    const water = card('Water discharge');
    fireEvent.click(within(water).getByRole('button', { name: 'Edit settings' }));
    const form = await within(water).findByRole('form', { name: 'Settings of Water discharge' });
    const band2 = within(form).getByRole('listitem', { name: 'Band 2' });
    fireEvent.change(within(band2).getByLabelText(/^Design factor/), { target: { value: '5' } });
    fireEvent.change(within(band2).getByLabelText('Source'), { target: { value: 'Site decision after the 2025 burst review' } });
    fireEvent.change(within(form).getByLabelText(/^Inspection interval/), { target: { value: '90' } });
    fireEvent.change(within(form).getByLabelText('Conductivity'), { target: { value: 'static-dissipative' } });
    fireEvent.change(within(form).getByLabelText('Periodic test'), { target: { value: 'pressure' } });
    expect(await within(form).findByLabelText(/^Test interval/)).toHaveProperty('value', '365');

    const save = within(form).getByRole('button', { name: 'Save settings' }) as HTMLButtonElement;
    await waitFor(() => expect(save.disabled).toBe(false));
    fireEvent.click(save);
    await waitFor(() => expect(api.calls('PUT', servicePath('water-discharge'))).toHaveLength(1));
    expect(api.last('PUT', servicePath('water-discharge'))!.body).toEqual({
      designFactorBands: [
        { upToKpa: WATER_LOW_PRESSURE_LIMIT_KPA, factor: 3, source: 'RMA Hose Handbook IP-2 (2003), design ratios for newly manufactured hose: water hose up to 150 psi, 3:1' },
        { upToKpa: null, factor: 5, source: 'Site decision after the 2025 burst review' },
      ],
      defaultInspectionIntervalDays: 90,
      conductivityRequired: 'static-dissipative',
      periodicTest: { kind: 'pressure', intervalDays: 365 },
      suctionDuty: false,
      foodContactRequired: false,
    });
    expect(await within(water).findByText('Changed at this site')).toBeTruthy();
    expect(within(water).getByText('Catalogue default: every 180 days')).toBeTruthy();
    expect(within(water).getByRole('table', { name: 'Default design factors of Water discharge' })).toBeTruthy();
    expect(screen.getByText('Water discharge saved')).toBeTruthy();
  });

  it('adds a pressure band before the open-ended one and refuses a band without its top', async () => {
    const { api } = servicesApi();
    await openService('Compressed air', api);
    const air = card('Compressed air');
    fireEvent.click(within(air).getByRole('button', { name: 'Edit settings' }));
    const form = await within(air).findByRole('form', { name: 'Settings of Compressed air' });
    fireEvent.click(within(form).getByRole('button', { name: 'Add a pressure band' }));
    const band1 = await within(form).findByRole('listitem', { name: 'Band 1' });
    expect(within(band1).getByLabelText(/^Up to/)).toBeTruthy();
    expect(within(within(form).getByRole('listitem', { name: 'Band 2' })).getByText('Any higher pressure')).toBeTruthy();
    fireEvent.change(within(band1).getByLabelText('Source'), { target: { value: 'Site decision' } });
    fireEvent.click(within(form).getByRole('button', { name: 'Save settings' }));
    expect(await within(band1).findByText('Up to: enter a number')).toBeTruthy();
    expect(api.calls('PUT', servicePath('compressed-air'))).toHaveLength(0);
  });

  it('puts a changed service back to the defaults after a confirmation', async () => {
    const air = buildSiteService('compressed-air');
    const changed = { ...air, settings: { ...air.settings, defaultInspectionIntervalDays: 30 }, customised: true };
    const { api, store } = servicesApi([changed]);
    api.on(`POST ${servicePath('compressed-air')}/reset`, () => store(air));
    await openService('Compressed air', api);
    fireEvent.click(within(card('Compressed air')).getByRole('button', { name: 'Back to defaults' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Put Compressed air back to the defaults?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Back to defaults' }));
    await waitFor(() => expect(api.calls('POST', `${servicePath('compressed-air')}/reset`)).toHaveLength(1));
    expect(await within(card('Compressed air')).findByText('Catalogue defaults')).toBeTruthy();
  });

  it('lets a technician read the settings without a way to change them, and switches site from the picker', async () => {
    const { api } = servicesApi();
    const { router } = await openService('Compressed air', api, buildMe({ role: 'technician', sites: SITES }));
    expect(within(card('Compressed air')).queryByRole('button', { name: 'Edit settings' })).toBeNull();
    fireEvent.change(screen.getByLabelText('Site'), { target: { value: SITES[1]!.id } });
    await waitFor(() => expect(api.last('GET', '/api/services')?.url.searchParams.get('siteId')).toBe(SITES[1]!.id));
    expect(new URLSearchParams(router.state.location.search).get('siteId')).toBe(SITES[1]!.id);
  });
});
