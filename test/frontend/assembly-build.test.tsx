import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { buildMe } from './support/fixtures';
import { CAUTIONS, CONSTRUCTION, CRIMPED, page, stockAssembly } from './support/assembly-fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const technician = buildMe({ role: 'technician', preferences: { pressureUnit: 'psi', lengthUnit: 'in', temperatureUnit: 'F' } });

function buildApi() {
  const built = stockAssembly({ status: 'built', proofTest: null, abilities: { proofTest: true, install: false, tagOut: false, remove: false, replace: false, returnToStock: false, scrap: true, override: false } });
  const api = new MockApi()
    .on('GET /api/constructions', json(page([CONSTRUCTION])))
    .on(`GET /api/constructions/${CONSTRUCTION.id}`, json({ data: CONSTRUCTION }))
    .on('GET /api/fitting-types', json(page([CRIMPED])))
    .on(`GET /api/sites/${technician.sites[0]!.id}`, json({ data: { id: technician.sites[0]!.id, code: 'PIT1', name: 'North pit', timeZone: 'Europe/London', currency: 'GBP', defaultUnits: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' }, archivedAt: null, abilities: { update: false } } }))
    .on('POST /api/assemblies', json({ data: built }, 201))
    .on(`GET /api/assemblies/${built.id}`, json({ data: built, cautions: CAUTIONS }))
    .on(`GET /api/assemblies/${built.id}/events`, json({ data: [] }));
  return { api, built };
}

describe('building an assembly', { timeout: 15_000 }, () => {
  it('checks the form as it is filled, shows the crimp specification, builds it in the user’s units and offers the proof test', async () => {
    const { api, built } = buildApi();
    const { router } = renderApp(`/assemblies/new?siteId=${technician.sites[0]!.id}`, { me: technician, api });
    const form = await screen.findByRole('form', { name: 'Build an assembly' }, { timeout: 5000 });
    fireEvent.click(within(form).getByRole('button', { name: 'Build and tag it' }));
    expect(await within(form).findByText('Choose the construction', {}, { timeout: 3000 })).toBeTruthy();
    expect(within(form).getByText('Enter the overall length')).toBeTruthy();

    fireEvent.click(await within(form).findByRole('radio', { name: /AIR-19-20/ }, { timeout: 3000 }));
    fireEvent.change(within(form).getByLabelText('Overall length'), { target: { value: '196.85' } });
    const endA = within(form).getByRole('group', { name: 'End A' });
    fireEvent.change(within(endA).getByLabelText(/Fitting type/), { target: { value: CRIMPED.id } });
    expect(await within(endA).findByText(/crimp to 1\.23 in ± 0\.01 in/)).toBeTruthy();
    fireEvent.change(within(endA).getByLabelText(/Crimp diameter/), { target: { value: '1.5' } });
    expect(await within(endA).findByText(/Outside specification/)).toBeTruthy();
    fireEvent.change(within(endA).getByLabelText(/Crimp diameter/), { target: { value: '1.229' } });
    expect(await within(endA).findByText('Within specification')).toBeTruthy();

    fireEvent.click(within(form).getByRole('button', { name: 'Build and tag it' }));
    await waitFor(() => expect(api.calls('POST', '/api/assemblies')).toHaveLength(1));
    const body = api.last('POST', '/api/assemblies')!.body as Record<string, unknown>;
    expect(body).toMatchObject({
      constructionId: CONSTRUCTION.id,
      siteId: technician.sites[0]!.id,
      overallLength: { value: 196.85, unit: 'in' },
      cutLength: null,
      endA: { fittingTypeId: CRIMPED.id, crimpDiameter: { value: 1.229, unit: 'in' } },
      endB: null,
      builder: technician.name,
    });
    expect(body.idempotencyKey).toMatch(/^[A-Za-z0-9_-]{8,100}$/);

    await waitFor(() => expect(router.state.location.pathname).toBe(`/assemblies/${built.id}`), { timeout: 5000 });
    expect(await screen.findByRole('dialog', { name: 'Record a proof test' }, { timeout: 5000 })).toBeTruthy();
  });
});
