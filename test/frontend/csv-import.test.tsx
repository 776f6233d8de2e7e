import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { ImportJobDto } from '@shared/schemas/csv.schema';
import { buildMe, SITES } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const engineer = buildMe({ role: 'reliability_engineer', allSites: true, sites: SITES });
const JOB_ID = '5b0e8f4e-2a4f-4c1e-9a57-0c6b7e2d9f11';

function buildJob(overrides: Partial<ImportJobDto> = {}): ImportJobDto {
  return {
    id: JOB_ID,
    kind: 'positions',
    siteId: SITES[0]!.id,
    siteName: SITES[0]!.name,
    fileName: 'north-pit-positions.csv',
    fileBytes: 48_213,
    status: 'checking',
    totalRows: 1200,
    processedRows: 500,
    errorCount: 0,
    writtenRows: 0,
    message: null,
    createdAt: '2026-11-30T08:00:00.000Z',
    updatedAt: '2026-11-30T08:00:02.000Z',
    finishedAt: null,
    abilities: { write: false },
    problems: [],
    moreProblems: 0,
    preview: [],
    ...overrides,
  };
}

const PROBLEMS = [
  { row: 7, column: 'working_pressure_bar', message: '"twenty" is not a number.' },
  { row: 2, column: 'size', message: '"7/8" is not a known nominal size.' },
  { row: 0, column: 'colour', message: 'Unknown column "colour".' },
];

const PREVIEW = [
  { row: 1, values: { code: 'DR3-AIR', name: 'Main air supply', equipment: 'DR-03', service: 'compressed-air', size: 'bore-19', max_operating_pressure: 700, criticality: 'high' } },
  { row: 2, values: { code: 'PU2-DIS', name: 'Discharge', equipment: 'PU-02', service: 'water-discharge', size: 'bore-51', max_operating_pressure: null, criticality: 'medium' } },
];

/** The API of the import page; `jobs` answers GET /api/imports/:id in turn, the last one from then on. */
function importApi(jobs: ImportJobDto[] = []) {
  let asked = 0;
  return new MockApi()
    .on('GET /api/sites', json({ data: SITES }))
    .on('GET /api/imports', json({ data: [] }))
    .on(`GET /api/imports/${JOB_ID}`, () => json({ data: jobs[Math.min(asked++, jobs.length - 1)] }));
}

/** The page's code arrives lazily; on a busy machine that takes longer than a query's default wait. */
const LOAD = { timeout: 5000 };
/** A test that waits for the page to ask the server again (once a second). */
const POLLING_TEST_MS = 20_000;

const uploadBody = (api: MockApi) => {
  const call = api.fetch.mock.calls.find(([url, init]) => String(url) === '/api/imports' && (init as RequestInit | undefined)?.method === 'POST');
  return (call?.[1] as RequestInit | undefined)?.body as FormData | undefined;
};

describe('import page', () => {
  it('uploads the file with what it holds and its site, then follows the check in the address', async () => {
    const running = buildJob({ processedRows: 500 });
    const api = importApi([running, running, buildJob({ status: 'checked', processedRows: 1200, errorCount: 3, problems: PROBLEMS })]);
    api.on('POST /api/imports', json({ data: buildJob({ processedRows: 0, totalRows: 0 }) }, 202));
    const { router } = renderApp('/import', { me: engineer, api });
    expect(await screen.findByRole('heading', { level: 1, name: 'Import from CSV' }, LOAD)).toBeTruthy();

    fireEvent.click(screen.getByLabelText('Positions'));
    const site = await screen.findByLabelText(/^Site/, undefined, LOAD);
    fireEvent.change(site, { target: { value: SITES[0]!.id } });
    const file = new File(['code,name\n'], 'north-pit-positions.csv', { type: 'text/csv' });
    fireEvent.change(screen.getByLabelText('The file'), { target: { files: [file] } });
    expect(screen.getByText('north-pit-positions.csv')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Upload and check' }));

    await waitFor(() => expect(router.state.location.search).toBe(`?job=${JOB_ID}`), LOAD);
    const body = uploadBody(api)!;
    expect(body.get('kind')).toBe('positions');
    expect(body.get('siteId')).toBe(SITES[0]!.id);
    expect((body.get('file') as File).name).toBe('north-pit-positions.csv');

    // The upload's answer shows at once; the page then asks each second how far the check has got.
    const progress = await screen.findByRole('progressbar', { name: 'Checking the positions' }, LOAD);
    await waitFor(() => expect(progress.getAttribute('aria-valuenow')).toBe('500'), LOAD);
    expect(progress.getAttribute('aria-valuemax')).toBe('1200');
    expect(screen.getByText('500 of 1,200 rows · 42 %')).toBeTruthy();

    expect(await screen.findByText('3 problems to correct', undefined, LOAD)).toBeTruthy();
    expect(screen.queryByRole('progressbar')).toBeNull();
    expect(api.calls('GET', `/api/imports/${JOB_ID}`).length).toBeGreaterThanOrEqual(3);
  }, POLLING_TEST_MS);

  it('asks for the site before uploading positions, and for a file', async () => {
    const api = importApi();
    renderApp('/import', { me: engineer, api });
    fireEvent.click(await screen.findByLabelText('Positions', undefined, LOAD));
    await screen.findByLabelText(/^Site/, undefined, LOAD);
    fireEvent.click(screen.getByRole('button', { name: 'Upload and check' }));
    expect(await screen.findByText('Choose the site the rows belong to', undefined, LOAD)).toBeTruthy();
    expect(api.calls('POST', '/api/imports')).toHaveLength(0);

    fireEvent.click(screen.getByLabelText('Constructions'));
    expect(screen.queryByLabelText(/^Site/)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Upload and check' }));
    expect(await screen.findByText('Choose the CSV file to import.')).toBeTruthy();
  });

  it('puts a refusal of the file under the file', async () => {
    const api = importApi().on('POST /api/imports', apiError(400, 'too_many_rows', 'The file has 120,000 rows; an import takes at most 100,000.', 'file'));
    renderApp('/import', { me: engineer, api });
    fireEvent.click(await screen.findByLabelText('Constructions', undefined, LOAD));
    fireEvent.change(screen.getByLabelText('The file'), { target: { files: [new File(['x'], 'big.csv')] } });
    fireEvent.click(screen.getByRole('button', { name: 'Upload and check' }));
    expect(await screen.findByText('The file has 120,000 rows; an import takes at most 100,000.', undefined, LOAD)).toBeTruthy();
  });

  it('shows the documented columns of the chosen kind with a template to download', async () => {
    renderApp('/import', { me: engineer, api: importApi() });
    const guide = await screen.findByRole('region', { name: 'Columns for importing assemblies' }, LOAD);
    expect(within(guide).getByText('overall_length')).toBeTruthy();
    expect(within(guide).getByRole('link', { name: 'Download the template' }).getAttribute('href')).toBe('/api/imports/templates/assemblies');
    fireEvent.click(screen.getByLabelText('Constructions'));
    const constructions = await screen.findByRole('region', { name: 'Columns for importing constructions' });
    expect(within(constructions).getByText('burst_pressure')).toBeTruthy();
  });

  it('lists every problem by row and column and sorts them; no write while any is left', async () => {
    const api = importApi([buildJob({ status: 'checked', processedRows: 1200, errorCount: 1203, problems: PROBLEMS, moreProblems: 1200 })]);
    renderApp(`/import?job=${JOB_ID}`, { me: engineer, api });
    const table = await screen.findByRole('table', { name: 'Problems in the file' }, LOAD);
    const rows = () => within(table).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent));
    expect(rows()).toEqual([
      ['Header', 'colour', 'Unknown column "colour".'],
      ['2', 'size', '"7/8" is not a known nominal size.'],
      ['7', 'working_pressure_bar', '"twenty" is not a number.'],
    ]);
    fireEvent.click(within(table).getByRole('button', { name: /Column/ }));
    expect(rows().map((r) => r[1])).toEqual(['colour', 'size', 'working_pressure_bar']);
    fireEvent.click(within(table).getByRole('button', { name: /Column/ }));
    expect(rows().map((r) => r[1])).toEqual(['working_pressure_bar', 'size', 'colour']);
    expect(within(table).getByRole('columnheader', { name: /Column/ }).getAttribute('aria-sort')).toBe('descending');

    expect(screen.getByText(/1,200 more are not/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: /^Write/ })).toBeNull();
  });

  it('previews the rows in my units, writes them on request and shows the result with links to the register', async () => {
    const checked = buildJob({ status: 'checked', totalRows: 2, processedRows: 2, preview: PREVIEW, abilities: { write: true } });
    const api = importApi([checked]);
    api.on('POST /api/imports/' + JOB_ID + '/write', () => {
      api.on(`GET /api/imports/${JOB_ID}`, json({ data: buildJob({ status: 'done', totalRows: 2, processedRows: 2, writtenRows: 2, finishedAt: '2026-11-30T08:01:00.000Z' }) }));
      return json({ data: buildJob({ status: 'writing', totalRows: 2, processedRows: 0 }) }, 202);
    });
    renderApp(`/import?job=${JOB_ID}`, { me: buildMe({ ...engineer, preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } }), api });

    const preview = await screen.findByRole('table', { name: 'Rows as they will be written' }, LOAD);
    const first = within(preview).getAllByRole('row')[1]!;
    expect(within(first).getByText('DR3-AIR')).toBeTruthy();
    expect(within(first).getByText('Compressed air')).toBeTruthy();
    expect(within(first).getByText('3/4 in')).toBeTruthy();
    expect(within(first).getByText('102 psi')).toBeTruthy();
    expect(within(first).getByText('High')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Write 2 positions' }));
    expect(await screen.findByRole('progressbar', { name: 'Writing 2 positions' }, LOAD)).toBeTruthy();
    expect(api.calls('POST', `/api/imports/${JOB_ID}/write`)).toHaveLength(1);

    expect(await screen.findByText('2 positions written', undefined, LOAD)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Open the register' }).getAttribute('href')).toBe(`/register?siteId=${SITES[0]!.id}`);
    expect(screen.getByRole('link', { name: 'Upload another file' }).getAttribute('href')).toBe('/import');
  }, POLLING_TEST_MS);

  it('picks up a running import when the page is opened again from its address', async () => {
    const api = importApi([buildJob({ status: 'writing', processedRows: 300 })]);
    renderApp(`/import?job=${JOB_ID}`, { me: engineer, api });
    const progress = await screen.findByRole('progressbar', { name: 'Writing 1,200 positions' }, LOAD);
    expect(progress.getAttribute('aria-valuenow')).toBe('300');
    expect(screen.getByText(/nothing is written/)).toBeTruthy();
  });

  it('says plainly when an import failed and nothing was written', async () => {
    const api = importApi([buildJob({ status: 'failed', message: 'The register changed since the check: 1 row no longer fits. Nothing was written.', errorCount: 1, problems: [PROBLEMS[0]!] })]);
    renderApp(`/import?job=${JOB_ID}`, { me: engineer, api });
    expect(await screen.findByText('Nothing was written', undefined, LOAD)).toBeTruthy();
    expect(screen.getByText(/The register changed since the check/)).toBeTruthy();
    expect(screen.getByRole('table', { name: 'Problems in the file' })).toBeTruthy();
  });

  it('says when the import is not found, and offers a new one', async () => {
    const api = importApi().on(`GET /api/imports/${JOB_ID}`, apiError(404, 'not_found', 'Import not found'));
    renderApp(`/import?job=${JOB_ID}`, { me: engineer, api });
    expect(await screen.findByRole('heading', { name: 'This import was not found' }, LOAD)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Upload another file' })).toBeTruthy();
  });

  it('lists my recent imports with their state', async () => {
    const api = importApi().on('GET /api/imports', json({ data: [buildJob({ status: 'done', writtenRows: 1200 }), buildJob({ id: 'a1', fileName: 'hoses.csv', status: 'checked', errorCount: 4 })] }));
    renderApp('/import', { me: engineer, api });
    const recent = await screen.findByRole('region', { name: 'Your recent imports' }, LOAD);
    expect(await within(recent).findByText('Written')).toBeTruthy();
    expect(within(recent).getByText('Has problems')).toBeTruthy();
    expect(within(recent).getByRole('link', { name: /hoses\.csv/ }).getAttribute('href')).toBe('/import?job=a1');
  });

  it('is closed to a technician', async () => {
    renderApp('/import', { me: buildMe({ role: 'technician' }), api: importApi() });
    expect(await screen.findByRole('heading', { name: "You don't have access to this page" }, LOAD)).toBeTruthy();
  });
});
