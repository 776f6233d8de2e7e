import { describe, expect, it } from 'vitest';
import { configure, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { FittingTypeDto } from '@shared/schemas/register.schema';
import { buildFittingType, buildReference, page } from './support/catalogue-fixtures';
import { buildMe } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();
// The pages load lazily; on a busy machine the first screen can take longer than a second.
configure({ asyncUtilTimeout: 5000 });

const engineer = buildMe({ role: 'reliability_engineer', allSites: true, preferences: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' } });

function fittingsApi(fittings: FittingTypeDto[]) {
  const api = new MockApi().on('GET /api/reference', json({ data: buildReference() })).on('GET /api/fitting-types', json(page(fittings)));
  for (const f of fittings) api.on(`GET /api/fitting-types/${f.id}`, json({ data: f }));
  return api;
}

const sizeRow = (dialog: HTMLElement, n: number) => within(dialog).getByRole('listitem', { name: `Size ${n}` });

describe('fitting type page', () => {
  it("lists the rating and crimp diameter ± tolerance of each size in the reader's units", async () => {
    const fitting = buildFittingType();
    renderApp(`/catalogue/fittings/${fitting.id}`, { me: buildMe({ preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } }), api: fittingsApi([fitting]) });
    const table = await screen.findByRole('table', { name: 'Ratings of CRIMP-NPT by size' });
    const rows = within(table).getAllByRole('row');
    expect(within(rows[1]!).getByText('1/2 in')).toBeTruthy();
    expect(within(rows[1]!).getByText('5000 psi')).toBeTruthy();
    expect(within(rows[1]!).getByText('0.92 in ± 0.01 in')).toBeTruthy();
    expect(within(rows[2]!).getByText('3/4 in')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Edit fitting type' })).toBeTruthy();
  });
});

describe('fitting type form', () => {
  it('edits the list of sizes: removes one, adds one, and sends the whole list with untouched values as stored', async () => {
    const fitting = buildFittingType();
    const api = fittingsApi([fitting]).on(`PATCH /api/fitting-types/${fitting.id}`, () =>
      json({
        data: {
          ...fitting,
          sizes: [fitting.sizes[1]!, { sizeCode: 'bore-25', ratingKpa: 20000, crimpDiameterMm: 38.6, crimpToleranceMm: 0.25 }],
        },
      }),
    );
    renderApp(`/catalogue/fittings/${fitting.id}`, { me: engineer, api });
    fireEvent.click(await screen.findByRole('button', { name: 'Edit fitting type' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit CRIMP-NPT' });
    expect(within(sizeRow(dialog, 1)).getByLabelText(/^Rating/)).toHaveProperty('value', '344.738');

    fireEvent.click(within(sizeRow(dialog, 1)).getByRole('button', { name: 'Remove 12.5 mm' }));
    await waitFor(() => expect(within(dialog).getAllByRole('listitem')).toHaveLength(1));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add a size' }));
    const added = await waitFor(() => sizeRow(dialog, 2));
    fireEvent.change(within(added).getByLabelText('Size'), { target: { value: 'bore-25' } });
    fireEvent.change(within(added).getByLabelText(/^Rating/), { target: { value: '200' } });
    fireEvent.change(within(added).getByLabelText(/^Crimp diameter/), { target: { value: '38,6' } });
    fireEvent.change(within(added).getByLabelText(/^Crimp tolerance/), { target: { value: '0.25' } });

    const save = within(dialog).getByRole('button', { name: 'Save changes' }) as HTMLButtonElement;
    await waitFor(() => expect(save.disabled).toBe(false));
    fireEvent.click(save);
    await waitFor(() => expect(api.calls('PATCH', `/api/fitting-types/${fitting.id}`)).toHaveLength(1));
    expect(api.last('PATCH', `/api/fitting-types/${fitting.id}`)!.body).toEqual({
      sizes: [
        { sizeCode: 'bore-19', rating: { value: 27579, unit: 'kPa' }, crimpDiameter: { value: 31, unit: 'mm' }, crimpTolerance: { value: 0.2, unit: 'mm' } },
        { sizeCode: 'bore-25', rating: { value: 200, unit: 'bar' }, crimpDiameter: { value: 38.6, unit: 'mm' }, crimpTolerance: { value: 0.25, unit: 'mm' } },
      ],
    });
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    const table = await screen.findByRole('table', { name: 'Ratings of CRIMP-NPT by size' });
    expect(within(table).getByText('25 mm')).toBeTruthy();
    expect(within(table).getByText('200.0 bar')).toBeTruthy();
  });

  it('refuses the same size twice before sending, and shows the server refusing a code on the code field', async () => {
    const api = fittingsApi([]).on('POST /api/fitting-types', apiError(409, 'code_taken', 'Another fitting type has this code', 'code'));
    renderApp('/catalogue/fittings', { me: engineer, api });
    fireEvent.click((await screen.findAllByRole('button', { name: 'New fitting type' }))[0]!);
    const dialog = await screen.findByRole('dialog', { name: 'New fitting type' });
    fireEvent.change(within(dialog).getByLabelText('Fitting code'), { target: { value: 'CLAW-UNI' } });
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Universal claw' } });
    fireEvent.change(within(dialog).getByLabelText('Style'), { target: { value: 'claw' } });
    fireEvent.change(within(dialog).getByLabelText('Material'), { target: { value: 'Malleable iron' } });
    fireEvent.change(within(sizeRow(dialog, 1)).getByLabelText('Size'), { target: { value: 'bore-19' } });
    fireEvent.change(within(sizeRow(dialog, 1)).getByLabelText(/^Rating/), { target: { value: '10' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add a size' }));
    fireEvent.change(within(await waitFor(() => sizeRow(dialog, 2))).getByLabelText('Size'), { target: { value: 'bore-19' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add fitting type' }));
    expect(await within(dialog).findByText('Each size appears once')).toBeTruthy();
    expect(api.calls('POST', '/api/fitting-types')).toHaveLength(0);

    fireEvent.change(within(sizeRow(dialog, 2)).getByLabelText('Size'), { target: { value: 'bore-25' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Add fitting type' }));
    await waitFor(() => expect(api.calls('POST', '/api/fitting-types')).toHaveLength(1));
    expect(api.last('POST', '/api/fitting-types')!.body).toMatchObject({
      code: 'CLAW-UNI',
      style: 'claw',
      sizes: [
        { sizeCode: 'bore-19', rating: { value: 10, unit: 'bar' }, crimpDiameter: null, crimpTolerance: null },
        { sizeCode: 'bore-25', rating: null, crimpDiameter: null, crimpTolerance: null },
      ],
      notes: null,
    });
    await waitFor(() => expect(within(dialog).getByLabelText('Fitting code').getAttribute('aria-invalid')).toBe('true'));
    expect(within(dialog).getByText('Another fitting type has this code')).toBeTruthy();
  });

  it('lists fitting types with their style and sizes', async () => {
    renderApp('/catalogue/fittings', { me: engineer, api: fittingsApi([buildFittingType()]) });
    const table = await screen.findByRole('table', { name: 'Fitting types' });
    expect(within(table).getByText('12.5 mm, 19 mm')).toBeTruthy();
    expect(within(table).getByText('Crimped stem and ferrule')).toBeTruthy();
  });

  it('says when no fitting type is recorded yet, with the way to add one', async () => {
    renderApp('/catalogue/fittings', { me: engineer, api: fittingsApi([]) });
    expect(await screen.findByRole('heading', { name: 'No fitting types yet' })).toBeTruthy();
  });
});
