import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { buildMe, buildMeta } from './support/fixtures';
import { apiError, json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const field = (label: string) => screen.getByLabelText(label) as HTMLInputElement;
const type = (label: string, value: string) => fireEvent.change(field(label), { target: { value } });

async function openSignIn(path = '/sign-in', api = new MockApi(), meta = buildMeta()) {
  const view = renderApp(path, { api, meta });
  await screen.findByRole('heading', { level: 1, name: 'Sign in' });
  return view;
}

describe('sign-in page', () => {
  it('says what is missing when the form is sent empty, and sends nothing', async () => {
    const { api } = await openSignIn();
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();
    expect(screen.getByText('Password is required')).toBeTruthy();
    expect(field('E-mail').getAttribute('aria-invalid')).toBe('true');
    expect(api.calls('POST', '/api/auth/sign-in')).toHaveLength(0);
  });

  it('checks the e-mail as soon as the field is left, and clears the message once it is right', async () => {
    await openSignIn();
    type('E-mail', 'not-an-address');
    fireEvent.blur(field('E-mail'));
    expect(await screen.findByText('Enter a valid e-mail address')).toBeTruthy();

    type('E-mail', 'avery.fitter@example.test');
    await waitFor(() => expect(screen.queryByText('Enter a valid e-mail address')).toBeNull());
  });

  it("shows the server's message when the e-mail or password is wrong", async () => {
    const api = new MockApi().on('POST /api/auth/sign-in', apiError(401, 'invalid_credentials', 'The e-mail or password is not right.'));
    await openSignIn('/sign-in', api);
    type('E-mail', 'Avery.Fitter@Example.test');
    type('Password', 'wrong password here');
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The e-mail or password is not right.');
    const sent = api.last('POST', '/api/auth/sign-in');
    expect(sent?.body).toEqual({ email: 'avery.fitter@example.test', password: 'wrong password here' });
    expect(sent?.headers['content-type']).toBe('application/json');
  });

  it('says how long to wait after too many attempts', async () => {
    const api = new MockApi().on(
      'POST /api/auth/sign-in',
      apiError(429, 'too_many_attempts', 'Too many attempts.', undefined, { 'Retry-After': '30' }),
    );
    await openSignIn('/sign-in', api);
    type('E-mail', 'avery.fitter@example.test');
    type('Password', 'a password of some length');
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect((await screen.findByRole('alert')).textContent).toContain('Too many attempts. Try again in 30 seconds.');
  });

  it('puts a field error from the server on that field', async () => {
    const api = new MockApi().on('POST /api/auth/sign-in', apiError(400, 'validation_failed', 'Enter a valid e-mail address', 'email'));
    await openSignIn('/sign-in', api);
    type('E-mail', 'avery.fitter@example.test');
    type('Password', 'a password of some length');
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(field('E-mail').getAttribute('aria-invalid')).toBe('true'));
    const describedBy = field('E-mail').getAttribute('aria-describedby') ?? '';
    const messages = describedBy.split(' ').map((id) => document.getElementById(id)?.textContent);
    expect(messages).toContain('Enter a valid e-mail address');
  });

  it('goes on to the page the person was sent from once signed in', async () => {
    const me = buildMe({ role: 'viewer', name: 'Blake Viewer' });
    let signedIn = false;
    const api = new MockApi()
      .on('POST /api/auth/sign-in', () => {
        signedIn = true;
        return json({ data: me });
      })
      .on('GET /api/auth/me', () => (signedIn ? json({ data: me }) : apiError(401, 'unauthenticated', 'Sign in to continue.')));
    const { router } = await openSignIn('/sign-in?next=%2Fpreferences', api);
    type('E-mail', 'blake.viewer@example.test');
    type('Password', 'a password of some length');
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Preferences' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/preferences');
  });

  it('sends someone who is not signed in to sign in, remembering where they were going', async () => {
    const { router } = renderApp('/users?role=viewer');
    await screen.findByRole('heading', { level: 1, name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(new URLSearchParams(router.state.location.search).get('next')).toBe('/users?role=viewer');
  });

  it('has a link to the password reset page', async () => {
    await openSignIn();
    fireEvent.click(screen.getByRole('link', { name: 'Forgot password?' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Reset your password' })).toBeTruthy();
  });

  it('marks a demo and links to the e-mails it has sent', async () => {
    await openSignIn('/sign-in', new MockApi(), buildMeta({ mode: 'demo' }));
    expect(screen.getAllByText('Demo').length).toBeGreaterThan(0);
    const link = screen.getByRole('link', { name: 'Open sent e-mails' });
    expect(link.getAttribute('href')).toBe('/demo/mail');
  });

  it('shows no demo marker in production', async () => {
    await openSignIn();
    expect(screen.queryByText('Demo')).toBeNull();
    expect(screen.queryByRole('link', { name: 'Open sent e-mails' })).toBeNull();
  });
});

describe('password pages', () => {
  it('puts the server\'s "too common" message on the new password field', async () => {
    const api = new MockApi().on(
      'POST /api/auth/password-reset/complete',
      apiError(400, 'validation_failed', 'This password is too common. Choose another.', 'password'),
    );
    renderApp('/reset-password?token=abcdefghijklmnopqrstuvwxyz012345', { api });
    await screen.findByRole('heading', { level: 1, name: 'Choose a new password' });
    expect(screen.getByText(/At least 12 characters/)).toBeTruthy();

    type('New password', 'correct horse battery');
    fireEvent.click(screen.getByRole('button', { name: 'Set new password' }));

    expect(await screen.findByText('This password is too common. Choose another.')).toBeTruthy();
    expect(field('New password').getAttribute('aria-invalid')).toBe('true');
    expect(api.last('POST', '/api/auth/password-reset/complete')?.body).toEqual({
      token: 'abcdefghijklmnopqrstuvwxyz012345',
      password: 'correct horse battery',
    });
  });

  it('refuses a short password before sending it', async () => {
    const { api } = renderApp('/accept-invite?token=abcdefghijklmnopqrstuvwxyz012345');
    await screen.findByRole('heading', { level: 1, name: 'Accept your invitation' });
    type('New password', 'short');
    fireEvent.click(screen.getByRole('button', { name: 'Set password and finish' }));
    expect(await screen.findByText('Use at least 12 characters')).toBeTruthy();
    expect(api.calls('POST', '/api/auth/invitations/accept')).toHaveLength(0);
  });

  it('explains an expired reset link and offers a new one', async () => {
    const api = new MockApi().on('POST /api/auth/password-reset/complete', apiError(400, 'invalid_token', 'This link has expired.'));
    renderApp('/reset-password?token=abcdefghijklmnopqrstuvwxyz012345', { api });
    await screen.findByRole('heading', { level: 1, name: 'Choose a new password' });
    type('New password', 'three quiet river stones');
    fireEvent.click(screen.getByRole('button', { name: 'Set new password' }));

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText('This link has expired or has already been used')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Request a new link' })).toBeTruthy();
  });
});
