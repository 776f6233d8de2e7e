import { describe, expect, it } from 'vitest';
import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import type { ReferenceDto } from '@shared/schemas/register.schema';
import { SERVICE_CATALOGUE } from '@shared/services/service-catalogue';
import { SIZE_CLASSES } from '@shared/sizes/nominal-sizes';
import { buildMe, SITES } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp, type ApiRequest } from './support/render-app';

registerDomCleanup();
// Each page is loaded on demand, as in the app: on a busy machine the first render takes a while.
configure({ asyncUtilTimeout: 10_000 });

const engineer = buildMe({ role: 'reliability_engineer', allSites: true, sites: SITES });

const reference = {
  sizeClasses: SIZE_CLASSES.map((s) => ({ ...s, alsoWrittenMm: [...s.alsoWrittenMm] })),
  media: [],
  tubeCompounds: [],
  compatibility: {},
  compatibilityRatings: [],
  reinforcements: [],
  electricalProperties: [],
  criticalityLevels: [],
  removalReasons: [],
  fittingStyles: [],
  services: SERVICE_CATALOGUE.map((s) => ({ ...s })),
  units: { pressure: [], length: [], temperature: [] },
} as unknown as ReferenceDto;

let n = 0;
function buildRow(overrides: Partial<AssemblyListItemDto> = {}): AssemblyListItemDto {
  n += 1;
  const id = `9a1b2c3d-0000-4000-8000-${String(n).padStart(12, '0')}`;
  return {
    id,
    number: '3KQ7VMX',
    status: 'installed',
    siteId: SITES[0]!.id,
    siteName: SITES[0]!.name,
    construction: { id: '9a1b2c3d-1111-4000-8000-000000000001', code: 'AIR-25-W', name: 'Air hose 1 in', sizeCode: 'bore-25' },
    position: { id: `9a1b2c3d-2222-4000-8000-${String(n).padStart(12, '0')}`, code: 'DR03-AIR-MAIN', name: 'Main air supply', equipmentName: 'Drill rig 3', equipmentAssetNumber: 'BFQ-DR-03', areaName: 'Main pit', serviceCode: 'compressed-air' },
    checkOutcome: 'pass',
    overridden: false,
    nextInspectionDue: '2099-01-15',
    installedAt: '2026-02-01T07:30:00.000Z',
    updatedAt: '2026-02-01T07:30:00.000Z',
    ...overrides,
  };
}

const ROWS: AssemblyListItemDto[] = [
  buildRow(),
  buildRow({ number: 'BRB798$', checkOutcome: 'fail', overridden: true, nextInspectionDue: '2020-07-05', position: { id: '9a1b2c3d-2222-4000-8000-0000000000f1', code: 'DR07-AIR-MAIN', name: 'Main air supply', equipmentName: 'Drill rig 7', equipmentAssetNumber: 'BFQ-DR-07', areaName: 'Main pit', serviceCode: 'compressed-air' } }),
  buildRow({ number: 'K3J7V19', status: 'in_stock', position: null, checkOutcome: null, nextInspectionDue: null, installedAt: null }),
];

/** The register's API: one page of rows, and one-row pages whose totals are the view's counts. */
function registerApi(rows: AssemblyListItemDto[] = ROWS, total = rows.length) {
  return new MockApi()
    .on('GET /api/sites', json({ data: SITES }))
    .on('GET /api/reference', json({ data: reference }))
    .on('GET /api/areas', json({ data: [], pagination: { page: 1, pageSize: 200, total: 0 } }))
    .on('GET /api/equipment', json({ data: [], pagination: { page: 1, pageSize: 200, total: 0 } }))
    .on('GET /api/constructions', json({ data: [], pagination: { page: 1, pageSize: 200, total: 0 } }))
    .on('GET /api/assemblies', ({ url }) => {
      const page = Number(url.searchParams.get('page') ?? 1);
      const pageSize = Number(url.searchParams.get('pageSize') ?? 25);
      if (pageSize === 1) {
        const count = url.searchParams.get('checkOutcome') === 'fail' ? 1 : url.searchParams.get('due') === 'overdue' ? 2 : total;
        return json({ data: rows.slice(0, 1), pagination: { page, pageSize, total: count } });
      }
      return json({ data: rows, pagination: { page, pageSize, total } });
    });
}

/** The last request for a page of the register (not a count). */
const lastPage = (api: MockApi): URLSearchParams | undefined =>
  api
    .calls('GET', '/api/assemblies')
    .filter((r: ApiRequest) => r.url.searchParams.get('pageSize') !== '1')
    .at(-1)?.url.searchParams;

async function openRegister(api = registerApi(), path = '/register') {
  const view = renderApp(path, { me: engineer, api });
  await screen.findByRole('heading', { level: 1, name: 'Register' });
  return view;
}

const registerTable = () => screen.findByRole('table', { name: 'Register of assemblies' });
const headers = (table: HTMLElement) => within(table).getAllByRole('columnheader').map((th) => th.textContent);

describe('register', { timeout: 30_000 }, () => {
  it('lists the assemblies the server returns, with their links, outcomes in words and the counts of the view', async () => {
    const { api } = await openRegister();
    const table = await registerTable();
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(1 + ROWS.length);
    expect(within(rows[1]!).getByRole('link', { name: '3KQ-7VM-X' }).getAttribute('href')).toBe(`/assemblies/${ROWS[0]!.id}`);
    expect(within(rows[1]!).getByRole('link', { name: 'DR03-AIR-MAIN' }).getAttribute('href')).toBe(`/positions/${ROWS[0]!.position!.id}`);
    expect(within(rows[1]!).getByText('Pass')).toBeTruthy();
    expect(within(rows[2]!).getByText('Fail')).toBeTruthy();
    expect(within(rows[2]!).getByText('Overridden')).toBeTruthy();
    expect(within(rows[2]!).getByText('Overdue')).toBeTruthy();
    expect(within(rows[3]!).getByText('Not installed')).toBeTruthy();
    expect(within(rows[3]!).getByText('Not checked')).toBeTruthy();

    expect(screen.getByText('3 assemblies')).toBeTruthy();
    expect((await screen.findByRole('button', { name: /1 with failed checks/ })).textContent).toContain('1');
    expect(screen.getByRole('button', { name: /2 overdue/ })).toBeTruthy();

    const query = lastPage(api)!;
    expect(query.get('sort')).toBe('number');
    expect(query.get('dir')).toBe('asc');
    expect(query.get('page')).toBe('1');
    expect(query.get('pageSize')).toBe('25');
  });

  it('sends the filters to the server and keeps them in the address', async () => {
    const { api, router } = await openRegister();
    await registerTable();

    fireEvent.change(screen.getByLabelText('Checks'), { target: { value: 'warn' } });
    await waitFor(() => expect(lastPage(api)?.get('checkOutcome')).toBe('warn'));

    fireEvent.click(screen.getByLabelText('Tagged out'));
    fireEvent.click(screen.getByLabelText('Installed'));
    await waitFor(() => expect(lastPage(api)?.get('status')).toBe('installed,tagged_out'));

    fireEvent.change(screen.getByLabelText('Inspection due'), { target: { value: 'within-7-days' } });
    await waitFor(() => expect(lastPage(api)?.get('due')).toBe('within-7-days'));

    fireEvent.change(screen.getByRole('searchbox', { name: 'Search the register' }), { target: { value: '3kq-7vm-x' } });
    await waitFor(() => expect(lastPage(api)?.get('q')).toBe('3kq-7vm-x'));

    const query = lastPage(api)!;
    expect(query.get('checkOutcome')).toBe('warn');
    expect(query.get('status')).toBe('installed,tagged_out');
    expect(query.get('due')).toBe('within-7-days');
    const address = new URLSearchParams(router.state.location.search);
    expect(address.get('checkOutcome')).toBe('warn');
    expect(address.get('status')).toBe('installed,tagged_out');
    expect(address.get('due')).toBe('within-7-days');
    expect(address.get('q')).toBe('3kq-7vm-x');
  });

  it('asks the server for the order and the page pressed, and keeps them in the address', async () => {
    const { api, router } = await openRegister(registerApi(ROWS, 80), '/register?checkOutcome=warn');
    const table = await registerTable();

    fireEvent.click(within(table).getByRole('button', { name: /Inspection due/ }));
    await waitFor(() => expect(lastPage(api)?.get('sort')).toBe('nextInspectionDue'));
    expect(lastPage(api)?.get('dir')).toBe('asc');
    fireEvent.click(within(table).getByRole('button', { name: /Inspection due/ }));
    await waitFor(() => expect(lastPage(api)?.get('dir')).toBe('desc'));

    fireEvent.click(screen.getByRole('button', { name: 'Next page' }));
    await waitFor(() => expect(lastPage(api)?.get('page')).toBe('2'));
    expect(lastPage(api)?.get('checkOutcome')).toBe('warn');

    const address = new URLSearchParams(router.state.location.search);
    expect(address.get('sort')).toBe('nextInspectionDue');
    expect(address.get('dir')).toBe('desc');
    expect(address.get('page')).toBe('2');
    expect(address.get('checkOutcome')).toBe('warn');
  });

  it('opens a shared link exactly as it was: filters, order, page, page size and columns', async () => {
    const site = SITES[1]!;
    const path = `/register?q=DR03&siteId=${site.id}&serviceCode=compressed-air&sizeCode=bore-25&status=installed,tagged_out&checkOutcome=fail&due=overdue&sort=nextInspectionDue&dir=desc&page=3&pageSize=50&cols=number,site,checkOutcome,nextInspectionDue`;
    const { api, router } = await openRegister(registerApi(ROWS, 400), path);
    const table = await registerTable();

    const query = lastPage(api)!;
    expect(Object.fromEntries(query)).toEqual({
      q: 'DR03',
      siteId: site.id,
      serviceCode: 'compressed-air',
      sizeCode: 'bore-25',
      status: 'installed,tagged_out',
      checkOutcome: 'fail',
      due: 'overdue',
      sort: 'nextInspectionDue',
      dir: 'desc',
      page: '3',
      pageSize: '50',
    });

    expect((screen.getByRole('searchbox', { name: 'Search the register' }) as HTMLInputElement).value).toBe('DR03');
    await waitFor(() => expect((screen.getByLabelText('Site') as HTMLSelectElement).value).toBe(site.id));
    await waitFor(() => expect((screen.getByLabelText('Service') as HTMLSelectElement).value).toBe('compressed-air'));
    expect((screen.getByLabelText('Size') as HTMLSelectElement).value).toBe('bore-25');
    expect((screen.getByLabelText('Checks') as HTMLSelectElement).value).toBe('fail');
    expect((screen.getByLabelText('Inspection due') as HTMLSelectElement).value).toBe('overdue');
    expect((screen.getByLabelText('Installed') as HTMLInputElement).checked).toBe(true);
    expect((screen.getByLabelText('Tagged out') as HTMLInputElement).checked).toBe(true);
    expect((screen.getByLabelText('In stock') as HTMLInputElement).checked).toBe(false);
    expect((screen.getByLabelText('Rows per page') as HTMLSelectElement).value).toBe('50');

    expect(headers(table)).toEqual(['Assembly', 'Site', 'Checks', 'Inspection due']);
    expect(within(table).getByRole('columnheader', { name: /Inspection due/ }).getAttribute('aria-sort')).toBe('descending');
    expect(screen.getByText(/page 3 of 8/)).toBeTruthy();
    // Nothing was rewritten on the way in.
    expect(new URLSearchParams(router.state.location.search).get('cols')).toBe('number,site,checkOutcome,nextInspectionDue');
  });

  it('hides a column from the column chooser and keeps the choice in the address', async () => {
    const { router, api } = await openRegister();
    const table = await registerTable();
    expect(headers(table)).toContain('Equipment');
    const requestsBefore = api.calls('GET', '/api/assemblies').length;

    fireEvent.click(screen.getByRole('button', { name: /Columns/ }));
    const chooser = screen.getByRole('group', { name: 'Columns to show' });
    expect((within(chooser).getByLabelText(/Assembly/) as HTMLInputElement).disabled).toBe(true);
    fireEvent.click(within(chooser).getByLabelText('Equipment'));
    fireEvent.click(within(chooser).getByLabelText('Site'));

    await waitFor(() => expect(headers(table)).not.toContain('Equipment'));
    expect(headers(table)).toContain('Site');
    const cols = new URLSearchParams(router.state.location.search).get('cols');
    expect(cols?.split(',')).toEqual(['number', 'status', 'position', 'site', 'construction', 'checkOutcome', 'nextInspectionDue']);
    // Choosing columns changes only what shows, not what is asked for.
    expect(api.calls('GET', '/api/assemblies').length).toBe(requestsBefore);

    fireEvent.click(within(chooser).getByRole('button', { name: 'Default columns' }));
    await waitFor(() => expect(new URLSearchParams(router.state.location.search).get('cols')).toBeNull());
    expect(headers(table)).toContain('Equipment');
  });

  it('narrows the view to the failing ones when their count is pressed', async () => {
    const { api } = await openRegister();
    fireEvent.click(await screen.findByRole('button', { name: /1 with failed checks/ }));
    await waitFor(() => expect(lastPage(api)?.get('checkOutcome')).toBe('fail'));
    expect((screen.getByLabelText('Checks') as HTMLSelectElement).value).toBe('fail');
  });

  it('says when nothing matches and offers to clear the filters', async () => {
    const api = registerApi().on('GET /api/assemblies', ({ url }) =>
      url.searchParams.get('q') === 'nothing' ? json({ data: [], pagination: { page: 1, pageSize: Number(url.searchParams.get('pageSize')), total: 0 } }) : undefined,
    );
    const { router } = await openRegister(api, '/register?q=nothing&checkOutcome=fail');
    expect(await screen.findByRole('heading', { name: 'No assemblies match' })).toBeTruthy();
    fireEvent.click(screen.getAllByRole('button', { name: 'Clear search and filters' }).at(-1)!);
    await waitFor(() => expect(router.state.location.search).toBe(''));
    expect(await registerTable()).toBeTruthy();
  });

  it('shows an error with a retry when the register cannot be loaded', async () => {
    let fail = true;
    const api = registerApi().on('GET /api/assemblies', () => (fail ? apiError(500, 'internal', 'The server ran into a problem.') : undefined));
    await openRegister(api);
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('The register could not be loaded')).toBeTruthy();
    fail = false;
    fireEvent.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await registerTable()).toBeTruthy();
  });

  it('shows each assembly as a card with its number, position, status, outcome and due date for a phone', async () => {
    await openRegister();
    const cards = await screen.findByRole('list', { name: 'Register of assemblies' });
    const items = within(cards).getAllByRole('listitem');
    expect(items).toHaveLength(ROWS.length);
    expect(within(items[1]!).getByRole('link', { name: 'BRB-798-$' })).toBeTruthy();
    expect(within(items[1]!).getByRole('link', { name: 'DR07-AIR-MAIN' })).toBeTruthy();
    expect(within(items[1]!).getByText('Installed')).toBeTruthy();
    expect(within(items[1]!).getByText('Fail')).toBeTruthy();
    expect(within(items[1]!).getByText('Overdue')).toBeTruthy();
  });
});
