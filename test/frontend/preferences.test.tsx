import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import type { Preferences } from '@shared/schemas/auth.schema';
import { buildMe } from './support/fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

describe('preferences page', () => {
  it('saves the chosen units and confirms with a toast', async () => {
    const me = buildMe();
    const api = new MockApi().on('PUT /api/me/preferences', ({ body }) => json({ data: { ...me, preferences: body as Preferences } }));
    renderApp('/preferences', { me, api });
    await screen.findByRole('heading', { level: 1, name: 'Preferences' });

    expect((screen.getByRole('radio', { name: 'bar' }) as HTMLInputElement).checked).toBe(true);
    fireEvent.click(screen.getByRole('radio', { name: 'psi' }));
    fireEvent.click(screen.getByRole('radio', { name: '°F' }));
    fireEvent.click(screen.getByRole('button', { name: 'Save preferences' }));

    await waitFor(() => expect(api.last('PUT', '/api/me/preferences')?.body).toEqual({ pressureUnit: 'psi', lengthUnit: 'mm', temperatureUnit: 'F' }));
    expect(await screen.findByText('Preferences saved')).toBeTruthy();
  });

  it('asks before signing out everywhere', async () => {
    renderApp('/preferences', { me: buildMe() });
    await screen.findByRole('heading', { level: 1, name: 'Preferences' });
    fireEvent.click(screen.getByRole('button', { name: 'Sign out everywhere' }));
    expect(await screen.findByRole('alertdialog', { name: 'Sign out everywhere?' })).toBeTruthy();
  });
});
