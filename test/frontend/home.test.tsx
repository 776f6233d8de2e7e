import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import type { Role } from '@shared/roles';
import { buildMe, SITES } from './support/fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

function homeApi() {
  return new MockApi()
    .on('GET /api/sites', json({ data: SITES }))
    .on('GET /api/assemblies', ({ url }) => {
      // Totals by filter: 140 in service, 5 failing, 30 warning, 17 overdue, 18 due soon, 6 tagged out.
      const p = url.searchParams;
      const total =
        p.get('checkOutcome') === 'fail' ? 5 : p.get('checkOutcome') === 'warn' ? 30 : p.get('due') === 'overdue' ? 17 : p.get('due') ? 18 : p.get('status') === 'tagged_out' ? 6 : 140;
      return json({ data: [], pagination: { page: 1, pageSize: 1, total } });
    })
    .on('GET /api/users', ({ url }) => {
      const totals: Record<string, number> = { active: 12, invited: 3, expired: 2, inactive: 1 };
      const total = totals[url.searchParams.get('status') ?? ''] ?? 16;
      return json({ data: [], pagination: { page: 1, pageSize: 1, total } });
    });
}

const HEADINGS: Array<[Role, string]> = [
  ['technician', 'Technician home'],
  ['reliability_engineer', 'Reliability engineer home'],
  ['safety_officer', 'Safety officer home'],
  ['administrator', 'Administrator home'],
  ['viewer', 'Viewer home'],
];

describe('home page', () => {
  it.each(HEADINGS)('a %s lands on a home named for the role', async (role, heading) => {
    renderApp('/', { me: buildMe({ role }), api: homeApi() });
    expect(await screen.findByRole('heading', { level: 1, name: heading })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Your sites' })).toBeTruthy();
    expect(screen.getByRole('heading', { name: 'Your units' })).toBeTruthy();
  });

  it("lists the user's sites and their units", async () => {
    renderApp('/', { me: buildMe({ preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } }), api: homeApi() });
    const sites = await screen.findByRole('region', { name: 'Your sites' });
    expect(await within(sites).findByText('North pit')).toBeTruthy();
    expect(within(sites).getByText('Crusher and mill')).toBeTruthy();

    const units = screen.getByRole('region', { name: 'Your units' });
    expect(within(units).getByText('psi')).toBeTruthy();
    expect(within(units).getByText('in')).toBeTruthy();
    expect(within(units).getByText('°F')).toBeTruthy();
  });

  it('gives an administrator a users summary with counts by status', async () => {
    renderApp('/', { me: buildMe({ role: 'administrator', allSites: true }), api: homeApi() });
    const card = await screen.findByRole('region', { name: 'Users' });
    expect(await within(card).findByText('12')).toBeTruthy();
    expect(within(card).getByText('3')).toBeTruthy();
    expect(within(card).getByText('2')).toBeTruthy();
    expect(within(card).getByText('Access expired')).toBeTruthy();
    expect(within(card).getByText('18 users')).toBeTruthy();
    expect(within(card).getByRole('link', { name: 'Manage users' }).getAttribute('href')).toBe('/users');
  });

  it('gives a technician the way to find a hose and the hoses that need them, each count opening the register filtered', async () => {
    renderApp('/', { me: buildMe({ role: 'technician', abilities: ['session.read', 'register.read'] }), api: homeApi() });
    const card = await screen.findByRole('region', { name: 'Hoses that need you' });
    const overdue = await within(card).findByRole('link', { name: /Inspection overdue/ });
    expect(overdue.textContent).toContain('17');
    expect(overdue.getAttribute('href')).toBe('/register?status=installed%2Ctagged_out&due=overdue&sort=nextInspectionDue');
    expect(within(card).getByRole('link', { name: /Tagged out/ }).textContent).toContain('6');
    const find = screen.getByRole('region', { name: 'At a hose' });
    expect(within(find).getByRole('link', { name: 'Find a hose' }).getAttribute('href')).toBe('/find');
  });

  it('gives a reliability engineer the register at a glance', async () => {
    renderApp('/', { me: buildMe({ role: 'reliability_engineer', abilities: ['session.read', 'register.read'] }), api: homeApi() });
    const card = await screen.findByRole('region', { name: 'The register at a glance' });
    expect((await within(card).findByRole('link', { name: /In service/ })).textContent).toContain('140');
    expect(within(card).getByRole('link', { name: /Failing a check/ }).textContent).toContain('5');
  });

  it('shows no users summary to someone without the ability to list users', async () => {
    const { api } = renderApp('/', { me: buildMe({ role: 'reliability_engineer' }), api: homeApi() });
    await screen.findByRole('heading', { level: 1, name: 'Reliability engineer home' });
    expect(screen.queryByRole('region', { name: 'Users' })).toBeNull();
    expect(api.calls('GET', '/api/users')).toHaveLength(0);
  });

  it('shows an empty state when the user has no sites', async () => {
    const api = homeApi().on('GET /api/sites', json({ data: [] }));
    renderApp('/', { me: buildMe({ sites: [] }), api });
    expect(await screen.findByRole('heading', { name: 'No sites yet' })).toBeTruthy();
  });

  it('shows an error with a retry when the sites cannot be loaded', async () => {
    const api = homeApi().on('GET /api/sites', { status: 503, body: { error: { code: 'unavailable', message: 'The database is not answering.' } } });
    renderApp('/', { me: buildMe(), api });
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Your sites could not be loaded')).toBeTruthy();
    expect(within(alert).getByText('The database is not answering.')).toBeTruthy();
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});
