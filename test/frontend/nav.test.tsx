import { describe, expect, it } from 'vitest';
import { fireEvent, render, screen, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { AppShell } from '@/components/layouts/app-shell';
import { ToastProvider } from '@/components/ui/toast';
import { buildMe, buildMeta, SITES } from './support/fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

function renderShell(abilities: string[], meta = buildMeta()) {
  const user = buildMe({ role: 'administrator', name: 'Casey Superintendent', abilities });
  return render(
    <MemoryRouter>
      <ToastProvider>
        <AppShell user={user} meta={meta} onSignOut={() => {}}>
          <p>Page</p>
        </AppShell>
      </ToastProvider>
    </MemoryRouter>,
  );
}

// The side bar and the bottom bar are both in the page; CSS shows one of them by screen width.
const mainNavs = () => screen.getAllByRole('navigation', { name: 'Main' });

describe('main navigation', () => {
  it('shows Users to a user whose abilities include listing users: in the side bar, and under More on a phone', () => {
    renderShell(['session.read', 'preferences.update', 'users.list', 'register.read']);
    const [side, phone] = mainNavs();
    expect(mainNavs()).toHaveLength(2);
    expect(within(side!).getByRole('link', { name: /Users/ }).getAttribute('href')).toBe('/users');
    for (const nav of mainNavs()) {
      expect(within(nav).getByRole('link', { name: /Home/ }).getAttribute('href')).toBe('/');
      expect(within(nav).getByRole('link', { name: /Register/ }).getAttribute('href')).toBe('/register');
    }
    expect(within(phone!).queryByRole('link', { name: /Users/ })).toBeNull();
    fireEvent.click(within(phone!).getByRole('button', { name: 'More' }));
    expect(within(screen.getByRole('dialog', { name: 'More' })).getByRole('link', { name: /Users/ }).getAttribute('href')).toBe('/users');
  });

  it('follows the abilities, not the role: no Users without users.list', () => {
    renderShell(['session.read', 'preferences.update']);
    for (const nav of mainNavs()) {
      expect(within(nav).queryByRole('link', { name: /Users/ })).toBeNull();
      expect(within(nav).getByRole('link', { name: /Home/ })).toBeTruthy();
    }
  });

  it("shows the user's name and role, a way to sign out, and the account item on a phone", () => {
    renderShell(['session.read']);
    expect(screen.getByText('Casey Superintendent')).toBeTruthy();
    expect(screen.getByText('Administrator')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Sign out' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'More' })).toBeTruthy();
  });

  it('marks a demo in the shell with the link to sent e-mails', () => {
    renderShell(['session.read'], buildMeta({ mode: 'demo' }));
    expect(screen.getAllByText('Demo').length).toBeGreaterThan(0);
    expect(screen.getByRole('link', { name: 'Open sent e-mails' }).getAttribute('href')).toBe('/demo/mail');
  });
});

describe('pages behind an ability', () => {
  it('tells a viewer who opens /users they have no access, and shows no table', async () => {
    const api = new MockApi().on('GET /api/sites', json({ data: SITES }));
    renderApp('/users', { me: buildMe({ role: 'viewer' }), api });
    expect(await screen.findByRole('heading', { level: 1, name: "You don't have access to this page" })).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
    expect(api.calls('GET', '/api/users')).toHaveLength(0);
  });
});
