import type { SiteSummary } from '@shared/schemas/auth.schema';
import { SelectField } from '@/components/ui/field';
import { PICKER_PAGE_SIZE, useAreas } from '../api/get-areas';
import { useEquipmentList } from '../api/get-equipment';

export interface PlaceValue {
  siteId: string | undefined;
  areaId: string | undefined;
  equipmentId: string | undefined;
}

interface PlaceSelectsProps extends PlaceValue {
  sites: SiteSummary[];
  /** A change of site clears the area and equipment; a change of area clears the equipment. */
  onChange: (patch: Partial<PlaceValue>) => void;
  /** Filters offer "all"; a form asks for one of each. */
  mode?: 'filter' | 'pick';
  errors?: Partial<Record<keyof PlaceValue, string>>;
  disabled?: boolean;
}

/** Site, area and equipment as three selects, each narrowing the next. */
export function PlaceSelects({ sites, siteId, areaId, equipmentId, onChange, mode = 'filter', errors = {}, disabled }: PlaceSelectsProps) {
  const filter = mode === 'filter';
  // A form asks for the site first, then the area: nothing to list before they are chosen.
  const areas = useAreas(siteId, { enabled: filter || Boolean(siteId) });
  const equipment = useEquipmentList({ siteId, areaId }, { enabled: filter || Boolean(areaId) });
  const siteName = new Map(sites.map((s) => [s.id, s.name]));
  const manySites = !siteId && sites.length > 1;

  const areaOptions = (areas.data?.data ?? []).map((a) => ({ value: a.id, label: manySites ? `${a.name} (${a.code}) — ${siteName.get(a.siteId) ?? ''}` : `${a.name} (${a.code})` }));
  const equipmentOptions = (equipment.data?.data ?? []).map((e) => ({ value: e.id, label: `${e.assetNumber} · ${e.name}` }));
  // A value chosen before the list arrived (or beyond its first page) still shows as chosen.
  if (areaId && !areaOptions.some((o) => o.value === areaId)) areaOptions.unshift({ value: areaId, label: areas.isFetching ? 'Loading…' : 'The chosen area' });
  if (equipmentId && !equipmentOptions.some((o) => o.value === equipmentId)) equipmentOptions.unshift({ value: equipmentId, label: equipment.isFetching ? 'Loading…' : 'The chosen equipment' });

  const placeholder = (query: { isFetching: boolean; isError: boolean; data?: unknown }, what: string, all: string) =>
    query.isFetching && !query.data ? `Loading ${what}…` : query.isError ? `The ${what} could not be loaded` : filter ? all : `Choose the ${what === 'areas' ? 'area' : what}`;

  return (
    <>
      <SelectField
        label="Site"
        placeholder={filter ? 'All your sites' : 'Choose the site'}
        options={sites.map((s) => ({ value: s.id, label: `${s.name} (${s.code})` }))}
        value={siteId ?? ''}
        error={errors.siteId}
        disabled={disabled}
        onChange={(event) => onChange({ siteId: event.target.value || undefined, areaId: undefined, equipmentId: undefined })}
      />
      <SelectField
        label="Area"
        placeholder={placeholder(areas, 'areas', siteId ? 'All areas of the site' : 'All areas')}
        options={areaOptions}
        value={areaId ?? ''}
        error={errors.areaId}
        disabled={disabled || (!filter && !siteId)}
        hint={areas.data && areas.data.pagination.total > PICKER_PAGE_SIZE ? `The first ${PICKER_PAGE_SIZE} by code; choose a site to narrow.` : undefined}
        onChange={(event) => onChange({ areaId: event.target.value || undefined, equipmentId: undefined })}
      />
      <SelectField
        label="Equipment"
        placeholder={placeholder(equipment, 'equipment', areaId ? 'All equipment in the area' : 'All equipment')}
        options={equipmentOptions}
        value={equipmentId ?? ''}
        error={errors.equipmentId}
        disabled={disabled || (!filter && !areaId)}
        hint={equipment.data && equipment.data.pagination.total > PICKER_PAGE_SIZE ? `The first ${PICKER_PAGE_SIZE} by asset number; choose an area to narrow.` : undefined}
        onChange={(event) => onChange({ equipmentId: event.target.value || undefined })}
      />
    </>
  );
}
