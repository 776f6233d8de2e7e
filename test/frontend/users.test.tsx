import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { UserDto } from '@shared/schemas/users.schema';
import { buildMe, buildUser, SITES } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const admin = buildMe({ role: 'administrator', name: 'Casey Superintendent', allSites: true, sites: SITES });

const USERS: UserDto[] = [
  buildUser({ name: 'Avery Fitter', email: 'avery.fitter@example.test', role: 'technician' }),
  buildUser({ name: 'Blake Engineer', email: 'blake.engineer@example.test', role: 'reliability_engineer', allSites: true, sites: [], lastSignInAt: null }),
  buildUser({ name: 'Drew Auditor', email: 'drew.auditor@example.test', role: 'viewer', status: 'invited', accessExpiresOn: '2027-03-31' }),
];

function usersApi(users: UserDto[] = USERS) {
  return new MockApi().on('GET /api/sites', json({ data: SITES })).on('GET /api/users', ({ url }) => {
    const role = url.searchParams.get('role');
    const q = url.searchParams.get('q');
    const rows = users.filter((u) => (!role || u.role === role) && (!q || u.name.toLowerCase().includes(q.toLowerCase())));
    return json({ data: rows, pagination: { page: Number(url.searchParams.get('page') ?? 1), pageSize: 25, total: rows.length } });
  });
}

async function openUsers(api = usersApi(), path = '/users') {
  const view = renderApp(path, { me: admin, api });
  await screen.findByRole('heading', { level: 1, name: 'Users' });
  return view;
}

/** The hint and error texts a field points at with aria-describedby. */
const messagesOf = (element: HTMLElement) =>
  (element.getAttribute('aria-describedby') ?? '').split(' ').map((id) => document.getElementById(id)?.textContent);

const usersTable = async () => screen.findByRole('table', { name: 'Users' });
const lastListQuery = (api: MockApi) => api.last('GET', '/api/users')?.url.searchParams;

describe('user administration table', () => {
  it('lists the users the server returns, with the count', async () => {
    const { api } = await openUsers();
    const table = await usersTable();
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(1 + USERS.length);
    expect(within(table).getByRole('link', { name: 'Avery Fitter' }).getAttribute('href')).toBe(`/users/${USERS[0]!.id}`);
    expect(within(rows[2]!).getByText('Reliability engineer')).toBeTruthy();
    expect(within(rows[2]!).getByText('All sites')).toBeTruthy();
    expect(within(rows[2]!).getByText('Never')).toBeTruthy();
    expect(within(rows[3]!).getByText('Invited')).toBeTruthy();
    expect(screen.getByText('3 users')).toBeTruthy();

    const query = lastListQuery(api)!;
    expect(query.get('sort')).toBe('name');
    expect(query.get('dir')).toBe('asc');
    expect(query.get('page')).toBe('1');
    expect(query.get('pageSize')).toBe('25');
  });

  it('asks the server for the new order when a column heading is pressed, and keeps it in the address', async () => {
    const { api, router } = await openUsers();
    const table = await usersTable();
    const nameHeader = within(table).getByRole('columnheader', { name: /Name/ });
    expect(nameHeader.getAttribute('aria-sort')).toBe('ascending');

    fireEvent.click(within(nameHeader).getByRole('button'));
    await waitFor(() => expect(lastListQuery(api)?.get('dir')).toBe('desc'));
    expect(lastListQuery(api)?.get('sort')).toBe('name');
    expect(router.state.location.search).toContain('dir=desc');

    fireEvent.click(within(table).getByRole('button', { name: /Last sign-in/ }));
    await waitFor(() => expect(lastListQuery(api)?.get('sort')).toBe('lastSignInAt'));
    expect(lastListQuery(api)?.get('dir')).toBe('asc');
    expect(within(table).queryByRole('button', { name: /Status/ })).toBeNull();
  });

  it('filters by role and by search text on the server, with both in the address', async () => {
    const { api, router } = await openUsers();
    await usersTable();

    fireEvent.change(screen.getByLabelText('Filter by role'), { target: { value: 'technician' } });
    await waitFor(() => expect(lastListQuery(api)?.get('role')).toBe('technician'));
    expect(new URLSearchParams(router.state.location.search).get('role')).toBe('technician');
    expect(await screen.findByText('1 user')).toBeTruthy();

    fireEvent.change(screen.getByRole('searchbox', { name: 'Search users' }), { target: { value: 'avery' } });
    await waitFor(() => expect(lastListQuery(api)?.get('q')).toBe('avery'));
    expect(lastListQuery(api)?.get('role')).toBe('technician');
    expect(new URLSearchParams(router.state.location.search).get('q')).toBe('avery');
  });

  it('reads the filters from the address it was opened with', async () => {
    const { api } = await openUsers(usersApi(), '/users?status=invited&sort=email&dir=desc&page=2');
    await waitFor(() => expect(api.calls('GET', '/api/users').length).toBeGreaterThan(0));
    const query = lastListQuery(api)!;
    expect(query.get('status')).toBe('invited');
    expect(query.get('sort')).toBe('email');
    expect(query.get('dir')).toBe('desc');
    expect(query.get('page')).toBe('2');
    expect((screen.getByLabelText('Filter by status') as HTMLSelectElement).value).toBe('invited');
  });

  it('says when no user matches and offers to clear the filters', async () => {
    const { api } = await openUsers(usersApi(), '/users?q=nobody');
    expect(await screen.findByRole('heading', { name: 'No users match' })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Clear search and filters' }));
    await waitFor(() => expect(lastListQuery(api)?.get('q')).toBeNull());
    expect(await usersTable()).toBeTruthy();
  });

  it('shows an error with a retry when the list cannot be loaded', async () => {
    let fail = true;
    const api = usersApi().on('GET /api/users', () => (fail ? apiError(500, 'internal', 'The server ran into a problem.') : undefined));
    await openUsers(api);
    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('Users could not be loaded')).toBeTruthy();

    fail = false;
    fireEvent.click(within(alert).getByRole('button', { name: 'Try again' }));
    expect(await usersTable()).toBeTruthy();
  });
});

describe('invite user form', () => {
  async function openInvite(api: MockApi) {
    await openUsers(api);
    fireEvent.click(screen.getAllByRole('button', { name: 'Invite user' })[0]!);
    return screen.findByRole('dialog', { name: 'Invite user' });
  }

  it('checks the fields before sending', async () => {
    const api = usersApi();
    const dialog = await openInvite(api);
    fireEvent.click(within(dialog).getByRole('button', { name: 'Send invitation' }));
    expect(await within(dialog).findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(within(dialog).getByText('Name is required')).toBeTruthy();
    const role = within(dialog).getByLabelText('Role');
    expect(role.getAttribute('aria-invalid')).toBe('true');
    expect(messagesOf(role)).toContain('Choose a role');
    expect(api.calls('POST', '/api/users')).toHaveLength(0);
  });

  it("puts the server's 'e-mail taken' answer on the e-mail field", async () => {
    const api = usersApi().on('POST /api/users', apiError(409, 'email_taken', 'A user with this e-mail already exists.', 'email'));
    const dialog = await openInvite(api);
    const email = within(dialog).getByLabelText('E-mail') as HTMLInputElement;
    fireEvent.change(email, { target: { value: 'avery.fitter@example.test' } });
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Avery Fitter' } });
    fireEvent.change(within(dialog).getByLabelText('Role'), { target: { value: 'technician' } });
    fireEvent.click(await within(dialog).findByLabelText(/^North pit/));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    await waitFor(() => expect(email.getAttribute('aria-invalid')).toBe('true'));
    expect(messagesOf(email)).toContain('A user with this e-mail already exists.');
    expect(screen.getByRole('dialog', { name: 'Invite user' })).toBeTruthy();
    expect(api.last('POST', '/api/users')?.body).toEqual({
      email: 'avery.fitter@example.test',
      name: 'Avery Fitter',
      role: 'technician',
      allSites: false,
      siteIds: [SITES[0]!.id],
      accessExpiresOn: null,
    });
  });

  it('sends "all sites" with an access expiry, closes and refreshes the list', async () => {
    const created = buildUser({ name: 'Emery Contractor', email: 'emery@example.test', role: 'viewer', status: 'invited' });
    const api = usersApi().on('POST /api/users', json({ data: created }, 201));
    const dialog = await openInvite(api);
    fireEvent.change(within(dialog).getByLabelText('E-mail'), { target: { value: 'emery@example.test' } });
    fireEvent.change(within(dialog).getByLabelText('Name'), { target: { value: 'Emery Contractor' } });
    fireEvent.change(within(dialog).getByLabelText('Role'), { target: { value: 'viewer' } });
    fireEvent.click(within(dialog).getByLabelText('All sites, including future ones'));
    fireEvent.change(within(dialog).getByLabelText('Access expires on'), { target: { value: '2027-06-30' } });
    const listCalls = api.calls('GET', '/api/users').length;
    fireEvent.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Invite user' })).toBeNull());
    expect(api.last('POST', '/api/users')?.body).toMatchObject({ allSites: true, siteIds: [], accessExpiresOn: '2027-06-30', role: 'viewer' });
    expect(await screen.findByText('Invitation sent to emery@example.test')).toBeTruthy();
    await waitFor(() => expect(api.calls('GET', '/api/users').length).toBeGreaterThan(listCalls));
  });
});
