import { useCallback } from 'react';
import { TUBE_COMPOUND_NAMES, TUBE_COMPOUNDS, type TubeCompound } from '@shared/checks/compatibility';
import type { ArchivedFilter, ConstructionListQuery } from '@shared/schemas/register.schema';
import { SIZE_CLASSES } from '@shared/sizes/nominal-sizes';
import { SelectField } from '@/components/ui/field';
import { useUnits } from '../hooks/use-units';
import { sizeOptionLabel } from '../utils/quantities';
import { ARCHIVED_OPTIONS, isArchivedFilter } from './archived-options';
import { SearchBox } from './search-box';

const isTubeCompound = (value: string): value is TubeCompound => (TUBE_COMPOUNDS as readonly string[]).includes(value);
const TUBE_OPTIONS = TUBE_COMPOUNDS.map((code) => ({ value: code, label: `${code} · ${TUBE_COMPOUND_NAMES[code]}` }));

interface ConstructionsFiltersProps {
  query: ConstructionListQuery;
  onChange: (patch: Partial<ConstructionListQuery>, options?: { replace?: boolean }) => void;
}

/** Search by code, name, maker or part number; filter by size, tube compound and archived. */
export function ConstructionsFilters({ query, onChange }: ConstructionsFiltersProps) {
  const units = useUnits();
  const onSearch = useCallback((q: string | undefined, options?: { replace?: boolean }) => onChange({ q }, options), [onChange]);
  const sizeOptions = SIZE_CLASSES.map((size) => ({ value: size.code, label: sizeOptionLabel(size, units.lengthUnit) }));

  return (
    <div role="search" aria-label="Search and filter constructions" className="grid grid-cols-2 gap-3 lg:grid-cols-[minmax(0,2fr)_repeat(3,minmax(0,1fr))]">
      <div className="col-span-2 lg:col-span-1">
        <SearchBox label="Search constructions" placeholder="Code, name, maker or part number" value={query.q} onSearch={onSearch} />
      </div>
      <SelectField
        label="Size"
        placeholder="All sizes"
        options={sizeOptions}
        value={query.sizeCode ?? ''}
        onChange={(event) => onChange({ sizeCode: event.target.value || undefined })}
      />
      <SelectField
        label="Tube compound"
        placeholder="All compounds"
        options={TUBE_OPTIONS}
        value={query.tubeCompound ?? ''}
        onChange={(event) => {
          const value = event.target.value;
          onChange({ tubeCompound: isTubeCompound(value) ? value : undefined });
        }}
      />
      <SelectField
        label="Archived"
        options={ARCHIVED_OPTIONS}
        value={query.archived}
        onChange={(event) => {
          const value = event.target.value;
          onChange({ archived: (isArchivedFilter(value) ? value : 'exclude') satisfies ArchivedFilter });
        }}
      />
    </div>
  );
}
