import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, render, screen, waitFor } from '@testing-library/react';
import type { MeDto } from '@shared/schemas/auth.schema';
import { AppProvider } from '@/app/provider';
import { CurrentUserProvider } from '@/lib/auth';
import { createQueryClient } from '@/lib/query-client';
import { ExportCsvButton } from '@/features/csv/components/export-csv-button';
import { exportHref } from '@/features/csv/api/export-assemblies';
import { abilitiesOf, buildMe } from './support/fixtures';
import { registerDomCleanup } from './support/render-app';

registerDomCleanup();

function renderButton(search: string, me: MeDto = buildMe({ role: 'viewer' })) {
  return render(
    <AppProvider queryClient={createQueryClient()}>
      <CurrentUserProvider user={me}>
        <ExportCsvButton search={search} />
      </CurrentUserProvider>
    </AppProvider>,
  );
}

let clicked: Array<{ href: string; download: string }>;
beforeEach(() => {
  clicked = [];
  // jsdom has no object URLs; a download needs only an address to click.
  Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:ferrule-export'), revokeObjectURL: vi.fn() });
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    clicked.push({ href: this.getAttribute('href') ?? '', download: this.download });
  });
});
afterEach(() => {
  vi.restoreAllMocks();
  delete (URL as Partial<typeof URL>).createObjectURL;
  delete (URL as Partial<typeof URL>).revokeObjectURL;
});

const csvResponse = () =>
  new Response('\uFEFFtag_code,status\r\n3KQ-7VM-X,Installed\r\n', {
    status: 200,
    headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': 'attachment; filename="ferrule-register-2026-12-01.csv"' },
  });

describe('export button', () => {
  it("downloads the register's current view, filters and sort kept, paging left out", async () => {
    const fetch = vi.fn(async () => csvResponse());
    vi.stubGlobal('fetch', fetch);
    renderButton('siteId=7d0c7f8e-1c1a-4c43-9f0a-0d5f1a6c2b01&status=installed,tagged_out&sort=nextInspectionDue&dir=desc&page=3&pageSize=50');

    fireEvent.click(screen.getByRole('button', { name: 'Export CSV' }));
    await waitFor(() => expect(clicked).toHaveLength(1));
    const url = new URL(String((fetch.mock.calls[0] as unknown[])[0]), 'http://localhost');
    expect(url.pathname).toBe('/api/assemblies/export');
    expect(Object.fromEntries(url.searchParams)).toEqual({ siteId: '7d0c7f8e-1c1a-4c43-9f0a-0d5f1a6c2b01', status: 'installed,tagged_out', sort: 'nextInspectionDue', dir: 'desc' });
    expect(clicked[0]).toEqual({ href: 'blob:ferrule-export', download: 'ferrule-register-2026-12-01.csv' });
    expect(await screen.findByText('Export downloaded')).toBeTruthy();
  });

  it('says why when the export is refused, and can be pressed again', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response(JSON.stringify({ error: { code: 'invalid_input', message: 'Unknown status' } }), { status: 400, headers: { 'Content-Type': 'application/json' } })),
    );
    renderButton('status=lost');
    fireEvent.click(screen.getByRole('button', { name: 'Export CSV' }));
    expect(await screen.findByText('The export could not be made')).toBeTruthy();
    expect(screen.getByText('Unknown status')).toBeTruthy();
    expect(clicked).toHaveLength(0);
    expect((screen.getByRole('button', { name: 'Export CSV' }) as HTMLButtonElement).disabled).toBe(false);
  });

  it('shows nothing to someone without the ability to export', () => {
    const me = buildMe({ role: 'viewer', abilities: abilitiesOf('viewer').filter((a) => a !== 'register.export') });
    renderButton('', me);
    expect(screen.queryByRole('button', { name: 'Export CSV' })).toBeNull();
  });

  it('builds the address from a query string or from search params', () => {
    expect(exportHref('')).toBe('/api/assemblies/export');
    expect(exportHref(new URLSearchParams({ q: 'drill rig', page: '2' }))).toBe('/api/assemblies/export?q=drill+rig');
  });
});
