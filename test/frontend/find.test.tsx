import { describe, expect, it } from 'vitest';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { formatTagCode } from '@shared/tags/tag-code';
import { buildMe } from './support/fixtures';
import { buildAssembly, buildPosition, listItemOf, page } from './support/assembly-fixtures';
import { json, MockApi, registerDomCleanup, renderApp } from './support/render-app';

registerDomCleanup();

const technician = buildMe({ role: 'technician' });

/** The same code with its check symbol swapped for another valid symbol. */
function withWrongCheck(code: string): string {
  const last = code.slice(-1);
  return code.slice(0, -1) + (last === '0' ? '1' : '0');
}

describe('find a hose', { timeout: 15_000 }, () => {
  it('finds an assembly from its code typed in lower case without hyphens, and opens it', async () => {
    const assembly = buildAssembly();
    const other = buildAssembly();
    const api = new MockApi().on('GET /api/assemblies', json(page([listItemOf(other), listItemOf(assembly)])));
    const { router } = renderApp('/find', { me: technician, api });
    const input = await screen.findByLabelText('Tag code', {}, { timeout: 5000 });
    fireEvent.change(input, { target: { value: assembly.number.toLowerCase() } });

    const link = await screen.findByRole('link', { name: new RegExp(formatTagCode(assembly.number).replace(/[*~$=]/g, '\\$&')) }, { timeout: 3000 });
    expect(api.last('GET', '/api/assemblies')!.url.searchParams.get('q')).toBe(assembly.number);
    expect(screen.queryByText(formatTagCode(other.number))).toBeNull();
    fireEvent.click(link);
    await waitFor(() => expect(router.state.location.pathname).toBe(`/assemblies/${assembly.id}`), { timeout: 5000 });
  });

  it('reads I, L and O typed for 1 and 0', async () => {
    const assembly = buildAssembly({ number: '1F1CX5*' });
    const api = new MockApi().on('GET /api/assemblies', json(page([listItemOf(assembly)])));
    renderApp('/find', { me: technician, api });
    fireEvent.change(await screen.findByLabelText('Tag code', {}, { timeout: 5000 }), { target: { value: 'if1-cx5-*' } });
    expect(await screen.findByText('1F1-CX5-*')).toBeTruthy();
    expect(api.last('GET', '/api/assemblies')!.url.searchParams.get('q')).toBe('1F1CX5*');
  });

  it('rejects a code whose check symbol is wrong, and never looks it up', async () => {
    const assembly = buildAssembly();
    const api = new MockApi().on('GET /api/assemblies', json(page([listItemOf(assembly)])));
    renderApp('/find', { me: technician, api });
    const input = await screen.findByLabelText('Tag code', {}, { timeout: 5000 });
    fireEvent.change(input, { target: { value: withWrongCheck(assembly.number) } });
    expect(await screen.findByText('Not a valid tag code — check the label.')).toBeTruthy();
    expect(input.getAttribute('aria-invalid')).toBe('true');
    expect(api.calls('GET', '/api/assemblies')).toHaveLength(0);
    expect(screen.queryByRole('link', { name: new RegExp(formatTagCode(assembly.number).slice(0, 7)) })).toBeNull();
  });

  it('says so when a valid code is at none of the user’s sites', async () => {
    const api = new MockApi().on('GET /api/assemblies', json(page([])));
    renderApp('/find', { me: technician, api });
    fireEvent.change(await screen.findByLabelText('Tag code', {}, { timeout: 5000 }), { target: { value: '1F1CX5*' } });
    expect(await screen.findByText('No assembly 1F1-CX5-* at your sites')).toBeTruthy();
  });

  it('finds by place: equipment, then its positions with the assembly in each', async () => {
    const assembly = buildAssembly();
    const full = buildPosition({ currentAssembly: { id: assembly.id, number: assembly.number, status: 'installed', checkOutcome: 'pass' } });
    const empty = buildPosition({ code: 'DR03-FLUSH', name: 'Flushing water', serviceCode: 'water-discharge' });
    const api = new MockApi()
      .on('GET /api/equipment', json(page([{ id: full.equipmentId, siteId: full.siteId, areaId: full.areaId, areaName: 'Drilling', assetNumber: 'DR-03', name: 'Drill rig 3', hasHourMeter: true, hourMeterHours: null, hourMeterReadAt: null, archivedAt: null, abilities: { update: false, archive: false } }])))
      .on('GET /api/positions', json(page([full, empty])));
    renderApp('/find?by=place', { me: technician, api });
    fireEvent.change(await screen.findByLabelText('Equipment', {}, { timeout: 5000 }), { target: { value: full.equipmentId } });
    const positions = await screen.findByRole('list', { name: 'Positions' });
    expect(api.last('GET', '/api/positions')!.url.searchParams.get('equipmentId')).toBe(full.equipmentId);
    expect(within(positions).getByRole('link', { name: new RegExp(formatTagCode(assembly.number).slice(0, 7)) }).getAttribute('href')).toBe(`/assemblies/${assembly.id}`);
    expect(within(positions).getByText('Empty: nothing installed.')).toBeTruthy();
  });

  it('finds by free text', async () => {
    const assembly = buildAssembly();
    const api = new MockApi().on('GET /api/assemblies', json(page([listItemOf(assembly)])));
    renderApp('/find?by=text', { me: technician, api });
    fireEvent.change(await screen.findByLabelText('Search', {}, { timeout: 5000 }), { target: { value: 'drill rig' } });
    const results = await screen.findByRole('list', { name: 'Assemblies found' });
    expect(within(results).getByText(formatTagCode(assembly.number))).toBeTruthy();
    expect(api.last('GET', '/api/assemblies')!.url.searchParams.get('q')).toBe('drill rig');
  });
});
