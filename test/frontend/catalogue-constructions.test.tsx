import { describe, expect, it } from 'vitest';
import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { CONFIRM_WITH_MAKER } from '@shared/checks/compatibility';
import type { Preferences } from '@shared/schemas/auth.schema';
import type { ConstructionDto } from '@shared/schemas/register.schema';
import { buildConstruction, buildReference, page } from './support/catalogue-fixtures';
import { buildMe } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();
// The pages load lazily; on a busy machine the first screen can take longer than a second.
configure({ asyncUtilTimeout: 5000 });

const engineer = (preferences: Preferences = { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' }) =>
  buildMe({ role: 'reliability_engineer', name: 'Blake Engineer', allSites: true, preferences });

function catalogueApi(constructions: ConstructionDto[] = [buildConstruction()]) {
  const api = new MockApi().on('GET /api/reference', json({ data: buildReference() })).on('GET /api/constructions', json(page(constructions)));
  for (const c of constructions) api.on(`GET /api/constructions/${c.id}`, json({ data: c }));
  return api;
}

/** The row of a table whose first cell is `name`. */
const rowOf = (table: HTMLElement, name: string) => {
  const row = within(table)
    .getAllByRole('row')
    .find((r) => within(r).queryAllByRole('cell')[0]?.textContent === name);
  if (!row) throw new Error(`No row for ${name}`);
  return row;
};

describe('construction page', () => {
  it("shows the tube's compatibility medium by medium: the rating in words with its source, memory marked, gaps said", async () => {
    const construction = buildConstruction();
    renderApp(`/catalogue/constructions/${construction.id}`, { me: engineer(), api: catalogueApi([construction]) });
    const table = await screen.findByRole('table', { name: 'NBR (nitrile rubber) tube against each medium' });

    const oilMist = rowOf(table, 'Compressed air with compressor oil mist');
    expect(within(oilMist).getByText('Suitable')).toBeTruthy();
    expect(within(oilMist).getByText('common practice (general properties of the elastomer): NBR is oil and fuel resistant')).toBeTruthy();
    expect(within(oilMist).queryByText(CONFIRM_WITH_MAKER)).toBeNull();

    const water = rowOf(table, 'Water');
    expect(within(water).getByText('Suitable')).toBeTruthy();
    expect(within(water).getByText('From memory')).toBeTruthy();
    expect(within(water).getByText(CONFIRM_WITH_MAKER)).toBeTruthy();
    expect(within(water).getByText('up to 70 °C')).toBeTruthy();

    const acid = rowOf(table, 'Sulfuric acid');
    expect(within(acid).getByText('up to 10 %')).toBeTruthy();
    expect(within(acid).getByText('Limited')).toBeTruthy();

    expect(within(rowOf(table, 'Saturated steam')).getByText('Not suitable')).toBeTruthy();
    const slurry = rowOf(table, 'Limestone slurry');
    expect(within(slurry).getByText('No data')).toBeTruthy();
    expect(within(slurry).getByText('No data — confirm with the maker')).toBeTruthy();
    expect(screen.getByText(/20 media: 8 suitable, 4 limited, 5 not suitable, 3 with no data/)).toBeTruthy();
  });

  it("names common practice as such, and shows every property in the reader's units", async () => {
    const construction = buildConstruction({ tubeCompound: 'EPDM', code: 'STM-25' });
    const me = engineer({ pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' });
    renderApp(`/catalogue/constructions/${construction.id}`, { me, api: catalogueApi([construction]) });
    const table = await screen.findByRole('table', { name: /EPDM .* tube against each medium/ });
    expect(within(rowOf(table, 'Hot water')).getByText('Common practice')).toBeTruthy();
    expect(within(rowOf(table, 'Hot water')).getByText('158–203 °F')).toBeTruthy();

    const ratings = screen.getAllByLabelText('Ratings')[0]!;
    expect(within(ratings).getByText('300 psi')).toBeTruthy();
    expect(within(ratings).getByText('1200 psi')).toBeTruthy();
    expect(within(ratings).getByText('4.0 : 1 burst to working')).toBeTruthy();
    expect(within(ratings).getByText('-40 °F')).toBeTruthy();
    expect(within(ratings).getByText('7.09 in')).toBeTruthy();
    expect(within(ratings).getByText('0.55 lb/ft')).toBeTruthy();
  });

  it('says when the construction has no tube compound instead of rating nothing', async () => {
    const construction = buildConstruction({ tubeCompound: null });
    renderApp(`/catalogue/constructions/${construction.id}`, { me: engineer(), api: catalogueApi([construction]) });
    expect(await screen.findByRole('heading', { name: 'No tube compound recorded' })).toBeTruthy();
  });

  it('hides editing from a technician, who still reads everything', async () => {
    const construction = buildConstruction({ abilities: { update: false, archive: false } });
    renderApp(`/catalogue/constructions/${construction.id}`, { me: buildMe({ role: 'technician' }), api: catalogueApi([construction]) });
    expect(await screen.findByRole('heading', { level: 1, name: 'AIR-19-2W' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Edit construction' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Archive' })).toBeNull();
  });

  it('archives after a confirmation', async () => {
    const construction = buildConstruction();
    const api = catalogueApi([construction]).on(`POST /api/constructions/${construction.id}/archive`, { status: 204 });
    renderApp(`/catalogue/constructions/${construction.id}`, { me: engineer(), api });
    fireEvent.click(await screen.findByRole('button', { name: 'Archive' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Archive AIR-19-2W?' });
    expect(api.calls('POST', `/api/constructions/${construction.id}/archive`)).toHaveLength(0);
    fireEvent.click(within(dialog).getByRole('button', { name: 'Archive construction' }));
    await waitFor(() => expect(api.calls('POST', `/api/constructions/${construction.id}/archive`)).toHaveLength(1));
    expect(await screen.findByText('AIR-19-2W is archived')).toBeTruthy();
  });
});

describe('construction form', () => {
  async function openNew(api: MockApi, me = engineer({ pressureUnit: 'psi', lengthUnit: 'mm', temperatureUnit: 'C' })) {
    renderApp('/catalogue/constructions', { me, api });
    fireEvent.click((await screen.findAllByRole('button', { name: 'New construction' }))[0]!);
    return screen.findByRole('dialog', { name: 'New construction' });
  }

  it("sends pressures typed in psi as { value, unit: 'psi' } and puts the server's 'code taken' on the code field", async () => {
    const api = catalogueApi().on('POST /api/constructions', apiError(409, 'code_taken', 'Another construction has this code', 'code'));
    const dialog = await openNew(api);
    fireEvent.change(within(dialog).getByLabelText('Construction code'), { target: { value: 'AIR-19-2W' } });
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Air hose, 2-wire braid' } });
    fireEvent.change(within(dialog).getByLabelText('Nominal size'), { target: { value: 'bore-19' } });
    fireEvent.change(within(dialog).getByLabelText('Tube compound'), { target: { value: 'NBR' } });
    fireEvent.change(within(dialog).getByLabelText(/^Working pressure/), { target: { value: '300' } });
    fireEvent.change(within(dialog).getByLabelText(/^Burst pressure/), { target: { value: '1200' } });
    fireEvent.change(within(dialog).getByLabelText(/^Highest temperature/), { target: { value: '93' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add construction' }));

    await waitFor(() => expect(api.calls('POST', '/api/constructions')).toHaveLength(1));
    const body = api.last('POST', '/api/constructions')!.body as Record<string, unknown>;
    expect(body).toMatchObject({
      code: 'AIR-19-2W',
      name: 'Air hose, 2-wire braid',
      sizeCode: 'bore-19',
      tubeCompound: 'NBR',
      workingPressure: { value: 300, unit: 'psi' },
      burstPressure: { value: 1200, unit: 'psi' },
      maxTemp: { value: 93, unit: 'C' },
      minTemp: null,
      vacuumRating: null,
      weightKgPerM: null,
      maker: null,
    });

    const code = within(dialog).getByLabelText('Construction code');
    await waitFor(() => expect(code.getAttribute('aria-invalid')).toBe('true'));
    expect(within(dialog).getByText('Another construction has this code')).toBeTruthy();
    expect(screen.getByRole('dialog', { name: 'New construction' })).toBeTruthy();
  });

  it('checks as it is typed: a burst pressure under the working pressure and a word for a number are refused before sending', async () => {
    const api = catalogueApi();
    const dialog = await openNew(api);
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add construction' }));
    expect(await within(dialog).findByText('Construction code is required')).toBeTruthy();
    expect(within(dialog).getByText('Choose a nominal size')).toBeTruthy();

    fireEvent.change(within(dialog).getByLabelText('Construction code'), { target: { value: 'AIR 19' } });
    expect(await within(dialog).findByText('Construction code may hold letters, digits and . _ / - only')).toBeTruthy();
    fireEvent.change(within(dialog).getByLabelText('Construction code'), { target: { value: 'AIR-19' } });
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Air hose' } });
    fireEvent.change(within(dialog).getByLabelText('Nominal size'), { target: { value: 'bore-19' } });
    fireEvent.change(within(dialog).getByLabelText(/^Working pressure/), { target: { value: '300' } });
    fireEvent.change(within(dialog).getByLabelText(/^Burst pressure/), { target: { value: '100' } });
    expect(await within(dialog).findByText('Burst pressure must be at least the working pressure')).toBeTruthy();
    fireEvent.change(within(dialog).getByLabelText(/^Minimum bend radius/), { target: { value: 'tight' } });
    expect(await within(dialog).findByText('Minimum bend radius must be a number')).toBeTruthy();
    fireEvent.change(within(dialog).getByLabelText(/^Service life/), { target: { value: '0' } });
    expect(await within(dialog).findByText('Service life: enter at least 1')).toBeTruthy();
    expect(api.calls('POST', '/api/constructions')).toHaveLength(0);
  });

  it('sends only what changed when editing, so values shown rounded are not written back', async () => {
    const construction = buildConstruction();
    const api = catalogueApi([construction]).on(`PATCH /api/constructions/${construction.id}`, ({ body }) =>
      json({ data: { ...construction, name: (body as { name: string }).name, updatedAt: '2026-03-03T07:15:00.000Z' } }),
    );
    renderApp(`/catalogue/constructions/${construction.id}`, { me: engineer({ pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' }), api });
    fireEvent.click(await screen.findByRole('button', { name: 'Edit construction' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit AIR-19-2W' });
    expect((within(dialog).getByLabelText(/^Working pressure/) as HTMLInputElement).value).toBe('300');
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Air hose, two-wire braid' } });
    fireEvent.change(within(dialog).getByLabelText(/^Highest temperature/), { target: { value: '200' } });
    const save = within(dialog).getByRole('button', { name: 'Save changes' }) as HTMLButtonElement;
    await waitFor(() => expect(save.disabled).toBe(false));
    fireEvent.click(save);
    await waitFor(() => expect(api.calls('PATCH', `/api/constructions/${construction.id}`)).toHaveLength(1));
    expect(api.last('PATCH', `/api/constructions/${construction.id}`)!.body).toEqual({ name: 'Air hose, two-wire braid', maxTemp: { value: 200, unit: 'F' } });
    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Edit AIR-19-2W' })).toBeNull());
  });
});

describe('constructions list', () => {
  it('asks the server for the filters and keeps them in the address', async () => {
    const api = catalogueApi([buildConstruction(), buildConstruction({ code: 'WTR-51', sizeCode: 'bore-51', tubeCompound: 'SBR' })]);
    const { router } = renderApp('/catalogue/constructions', { me: engineer(), api });
    const table = await screen.findByRole('table', { name: 'Hose constructions' });
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(within(table).getByRole('link', { name: 'WTR-51' })).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Tube compound'), { target: { value: 'NBR' } });
    await waitFor(() => expect(api.last('GET', '/api/constructions')?.url.searchParams.get('tubeCompound')).toBe('NBR'));
    fireEvent.change(screen.getByLabelText('Archived'), { target: { value: 'include' } });
    await waitFor(() => expect(api.last('GET', '/api/constructions')?.url.searchParams.get('archived')).toBe('include'));
    const search = new URLSearchParams(router.state.location.search);
    expect(search.get('tubeCompound')).toBe('NBR');
    expect(search.get('archived')).toBe('include');

    fireEvent.click(within(table).getByRole('button', { name: /Working pressure/ }));
    await waitFor(() => expect(api.last('GET', '/api/constructions')?.url.searchParams.get('sort')).toBe('workingPressureKpa'));
  });

  it('shows an empty catalogue with the way to add the first construction, and an error with a retry', async () => {
    let fail = true;
    const api = catalogueApi([]).on('GET /api/constructions', () => (fail ? apiError(500, 'internal', 'The server ran into a problem.') : undefined));
    renderApp('/catalogue/constructions', { me: engineer(), api });
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Constructions could not be loaded')).toBeTruthy();
    fail = false;
    fireEvent.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('heading', { name: 'No constructions yet' })).toBeTruthy();
    expect(screen.getAllByRole('button', { name: 'New construction' }).length).toBe(2);
  });
});
