import { useCallback } from 'react';
import { FITTING_STYLE_LABELS, FITTING_STYLES, type FittingStyle, type FittingTypeListQuery } from '@shared/schemas/register.schema';
import { SelectField } from '@/components/ui/field';
import { ARCHIVED_OPTIONS, isArchivedFilter } from './archived-options';
import { SearchBox } from './search-box';

const STYLE_OPTIONS = FITTING_STYLES.map((code) => ({ value: code, label: FITTING_STYLE_LABELS[code] }));
const isStyle = (value: string): value is FittingStyle => (FITTING_STYLES as readonly string[]).includes(value);

interface FittingTypesFiltersProps {
  query: FittingTypeListQuery;
  onChange: (patch: Partial<FittingTypeListQuery>, options?: { replace?: boolean }) => void;
}

/** Search by code or name; filter by style and archived. */
export function FittingTypesFilters({ query, onChange }: FittingTypesFiltersProps) {
  const onSearch = useCallback((q: string | undefined, options?: { replace?: boolean }) => onChange({ q }, options), [onChange]);
  return (
    <div role="search" aria-label="Search and filter fitting types" className="grid grid-cols-2 gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)]">
      <div className="col-span-2 sm:col-span-1">
        <SearchBox label="Search fitting types" placeholder="Code or name" value={query.q} onSearch={onSearch} />
      </div>
      <SelectField
        label="Style"
        placeholder="All styles"
        options={STYLE_OPTIONS}
        value={query.style ?? ''}
        onChange={(event) => {
          const value = event.target.value;
          onChange({ style: isStyle(value) ? value : undefined });
        }}
      />
      <SelectField
        label="Archived"
        options={ARCHIVED_OPTIONS}
        value={query.archived}
        onChange={(event) => {
          const value = event.target.value;
          onChange({ archived: isArchivedFilter(value) ? value : 'exclude' });
        }}
      />
    </div>
  );
}
