import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { buildMe, buildUser, SITES } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const admin = buildMe({ role: 'administrator', allSites: true, sites: SITES });
const target = buildUser({ name: 'Avery Fitter', email: 'avery.fitter@example.test', role: 'administrator', allSites: true, sites: [] });

function userApi() {
  return new MockApi()
    .on('GET /api/sites', json({ data: SITES }))
    .on(`GET /api/users/${target.id}`, json({ data: target }))
    .on(
      'GET /api/audit',
      json({
        data: [{ id: 'a1', at: '2026-03-01T08:00:00.000Z', actorName: 'Casey Superintendent', action: 'user.invite', entityType: 'user', entityId: target.id, summary: 'Invited as Administrator' }],
        pagination: { page: 1, pageSize: 10, total: 1 },
      }),
    );
}

async function openUser(api = userApi()) {
  const view = renderApp(`/users/${target.id}`, { me: admin, api });
  await screen.findByRole('heading', { level: 1, name: 'Avery Fitter' });
  return view;
}

describe('user page', () => {
  it("shows the user's short history from the audit log", async () => {
    const { api } = await openUser();
    const history = screen.getByRole('region', { name: 'History' });
    expect(await within(history).findByText('Invited as Administrator')).toBeTruthy();
    const query = api.last('GET', '/api/audit')!.url.searchParams;
    expect(query.get('entityType')).toBe('user');
    expect(query.get('entityId')).toBe(target.id);
  });

  it('sends only what was changed', async () => {
    const api = userApi().on(`PATCH /api/users/${target.id}`, ({ body }) => json({ data: { ...target, ...(body as object) } }));
    await openUser(api);
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'Avery Fitter-Lane' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(api.last('PATCH', `/api/users/${target.id}`)?.body).toEqual({ name: 'Avery Fitter-Lane' }));
    expect(await screen.findByText('Changes saved')).toBeTruthy();
  });

  it('asks before deactivating, and shows why the server refused', async () => {
    const api = userApi().on(
      `POST /api/users/${target.id}/deactivate`,
      apiError(409, 'last_administrator', 'This is the last active administrator with all sites. Give someone else that access first.'),
    );
    await openUser(api);
    fireEvent.click(screen.getByRole('button', { name: 'Deactivate user' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Deactivate Avery Fitter?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Deactivate' }));

    expect(await within(dialog).findByText(/last active administrator/)).toBeTruthy();
    expect(api.calls('POST', `/api/users/${target.id}/deactivate`)).toHaveLength(1);
  });

  it('says so when the user does not exist', async () => {
    const api = new MockApi().on(`GET /api/users/${target.id}`, apiError(404, 'not_found', 'User not found.'));
    renderApp(`/users/${target.id}`, { me: admin, api });
    expect(await screen.findByRole('heading', { level: 1, name: 'User not found' })).toBeTruthy();
  });
});
