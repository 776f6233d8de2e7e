import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  type Table as TanStackTable,
} from '@tanstack/react-table';
import type { Preferences } from '@shared/schemas/auth.schema';
import { constructionListQuerySchema, type ConstructionDto, type ConstructionListQuery } from '@shared/schemas/register.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatPressure, formatTemperature, NO_VALUE } from '@shared/units/units';
import { paths } from '@/config/paths';
import { Badge } from '@/components/ui/badge';
import { SelectField } from '@/components/ui/field';
import { ServerTable, useServerTable } from '@/components/ui/server-table';
import { useUnits } from '../hooks/use-units';
import { labelOf, REINFORCEMENT_LABELS } from '../utils/labels';

type ConstructionSort = ConstructionListQuery['sort'];
const SORTS = constructionListQuerySchema.shape.sort.unwrap().options as readonly ConstructionSort[];
const isSort = (value: string): value is ConstructionSort => (SORTS as readonly string[]).includes(value);

const column = createColumnHelper<ConstructionDto>();
const linkClasses = 'font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800';

/** "−20 to 80 °C"; one end alone when only one is recorded. */
export function temperatureRange(minC: number | null, maxC: number | null, unit: Preferences['temperatureUnit']): string {
  if (minC == null && maxC == null) return NO_VALUE;
  if (minC == null) return `up to ${formatTemperature(maxC, unit)}`;
  if (maxC == null) return `from ${formatTemperature(minC, unit)}`;
  const low = formatTemperature(minC, unit).replace(/ °[CF]$/, '');
  return `${low} to ${formatTemperature(maxC, unit)}`;
}

function columnsFor(units: Preferences) {
  return [
    column.accessor('code', {
      header: 'Code',
      cell: (info) => (
        <span className="flex flex-col items-start gap-1">
          <Link to={paths.catalogue.construction.getHref(info.row.original.id)} className={`${linkClasses} font-mono whitespace-nowrap`}>
            {info.getValue()}
          </Link>
          {info.row.original.archivedAt ? <Badge tone="muted">Archived</Badge> : null}
        </span>
      ),
    }),
    column.accessor('name', { header: 'Name' }),
    column.accessor('sizeCode', { header: 'Size', cell: (info) => <span className="whitespace-nowrap">{sizeLabel(info.getValue(), units.lengthUnit)}</span> }),
    column.accessor('tubeCompound', { header: 'Tube', enableSorting: false, cell: (info) => info.getValue() ?? NO_VALUE }),
    column.accessor('reinforcement', { header: 'Reinforcement', enableSorting: false, cell: (info) => labelOf(REINFORCEMENT_LABELS, info.getValue()) ?? NO_VALUE }),
    column.accessor('workingPressureKpa', {
      header: 'Working pressure',
      cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatPressure(info.getValue(), units.pressureUnit)}</span>,
    }),
    column.accessor('burstPressureKpa', {
      header: 'Burst',
      enableSorting: false,
      cell: (info) => <span className="whitespace-nowrap tabular-nums">{formatPressure(info.getValue(), units.pressureUnit)}</span>,
    }),
    column.display({
      id: 'temperature',
      header: 'Temperature',
      cell: (info) => <span className="whitespace-nowrap">{temperatureRange(info.row.original.minTempC, info.row.original.maxTempC, units.temperatureUnit)}</span>,
    }),
  ];
}

interface ConstructionsTableOptions {
  constructions: ConstructionDto[];
  total: number;
  query: ConstructionListQuery;
  onQueryChange: (patch: Partial<ConstructionListQuery>) => void;
}

/** The table's state is the address's: sorting and paging happen on the server. */
export function useConstructionsTable({ constructions, total, query, onQueryChange }: ConstructionsTableOptions) {
  const units = useUnits();
  const columns = useMemo(() => columnsFor(units), [units]);
  return useServerTable({ data: constructions, columns, total, query, onQueryChange, isSort: isSort, getRowId: (row) => row.id });
}

/** A desktop table of constructions; on a phone the same rows show as cards. */
export function ConstructionsTable({ table, busy }: { table: TanStackTable<ConstructionDto>; busy: boolean }) {
  return (
    <>
      <div className="hidden md:block" aria-busy={busy || undefined}>
        <ServerTable table={table} label="Hose constructions" isSortable={isSort} />
      </div>
      <ConstructionCards table={table} busy={busy} />
    </>
  );
}

const PHONE_SORTS: Array<{ value: string; label: string }> = [
  { value: 'code:asc', label: 'Code, A to Z' },
  { value: 'code:desc', label: 'Code, Z to A' },
  { value: 'name:asc', label: 'Name, A to Z' },
  { value: 'sizeCode:asc', label: 'Size, smallest first' },
  { value: 'sizeCode:desc', label: 'Size, largest first' },
  { value: 'workingPressureKpa:desc', label: 'Working pressure, highest first' },
  { value: 'workingPressureKpa:asc', label: 'Working pressure, lowest first' },
  { value: 'updatedAt:desc', label: 'Changed most recently' },
];

function ConstructionCards({ table, busy }: { table: TanStackTable<ConstructionDto>; busy: boolean }) {
  const units = useUnits();
  const current = table.getState().sorting[0];
  const value = current ? `${current.id}:${current.desc ? 'desc' : 'asc'}` : 'code:asc';
  const options = PHONE_SORTS.some((o) => o.value === value) ? PHONE_SORTS : [...PHONE_SORTS, { value, label: 'Current order' }];

  return (
    <div className="flex flex-col gap-3 md:hidden">
      <SelectField
        label="Sort by"
        options={options}
        value={value}
        onChange={(event) => {
          const [id = 'code', dir] = event.target.value.split(':');
          table.setSorting([{ id, desc: dir === 'desc' }]);
        }}
      />
      <ul className="flex flex-col gap-3" aria-label="Hose constructions" aria-busy={busy || undefined}>
        {table.getRowModel().rows.map((row) => {
          const c = row.original;
          return (
            <li key={row.id} className="relative rounded-[var(--radius-card)] border border-ink-200 bg-white p-4 shadow-sm">
              <div className="flex items-start justify-between gap-3">
                <div className="flex min-w-0 flex-col">
                  <Link
                    to={paths.catalogue.construction.getHref(c.id)}
                    className={`${linkClasses} inline-flex min-h-11 items-center font-mono text-lg after:absolute after:inset-0 after:content-['']`}
                  >
                    {c.code}
                  </Link>
                  <span className="text-ink-800">{c.name}</span>
                </div>
                {c.archivedAt ? <Badge tone="muted">Archived</Badge> : null}
              </div>
              <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 text-sm">
                <div>
                  <dt className="text-ink-600">Size</dt>
                  <dd className="font-semibold text-ink-950">{sizeLabel(c.sizeCode, units.lengthUnit)}</dd>
                </div>
                <div>
                  <dt className="text-ink-600">Tube</dt>
                  <dd className="font-semibold text-ink-950">{c.tubeCompound ?? NO_VALUE}</dd>
                </div>
                <div>
                  <dt className="text-ink-600">Working pressure</dt>
                  <dd className="font-semibold text-ink-950 tabular-nums">{formatPressure(c.workingPressureKpa, units.pressureUnit)}</dd>
                </div>
                <div>
                  <dt className="text-ink-600">Temperature</dt>
                  <dd className="font-semibold text-ink-950">{temperatureRange(c.minTempC, c.maxTempC, units.temperatureUnit)}</dd>
                </div>
              </dl>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
