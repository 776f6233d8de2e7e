import { describe, expect, it } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import { buildMe, SITES } from './support/fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

describe('not-found page', () => {
  it('answers an unknown address with a not-found page and a way home', async () => {
    const api = new MockApi().on('GET /api/sites', json({ data: SITES }));
    const { router } = renderApp('/no/such/page', { me: buildMe(), api });
    expect(await screen.findByRole('heading', { level: 1, name: 'Page not found' })).toBeTruthy();

    fireEvent.click(screen.getByRole('link', { name: 'Go to your home page' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Technician home' })).toBeTruthy();
    expect(router.state.location.pathname).toBe('/');
  });
});
