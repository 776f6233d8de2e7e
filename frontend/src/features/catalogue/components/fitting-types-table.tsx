import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import {
  createColumnHelper,
  type Table as TanStackTable,
} from '@tanstack/react-table';
import type { LengthUnit } from '@shared/schemas/auth.schema';
import { FITTING_STYLE_LABELS, fittingTypeListQuerySchema, type FittingTypeDto, type FittingTypeListQuery } from '@shared/schemas/register.schema';
import { SIZE_CLASS_CODES, sizeLabel } from '@shared/sizes/nominal-sizes';
import { paths } from '@/config/paths';
import { Badge } from '@/components/ui/badge';
import { SelectField } from '@/components/ui/field';
import { ServerTable, useServerTable } from '@/components/ui/server-table';
import { useUnits } from '../hooks/use-units';

type FittingSort = FittingTypeListQuery['sort'];
const SORTS = fittingTypeListQuerySchema.shape.sort.unwrap().options as readonly FittingSort[];
const isSort = (value: string): value is FittingSort => (SORTS as readonly string[]).includes(value);

const column = createColumnHelper<FittingTypeDto>();
const linkClasses = 'font-semibold text-copper-700 underline decoration-2 underline-offset-4 hover:text-copper-800';

/** The sizes a fitting type is made in, smallest first: "1/2 in, 3/4 in, 1 in". */
export function sizesText(fitting: FittingTypeDto, lengthUnit: LengthUnit): string {
  if (fitting.sizes.length === 0) return 'No sizes listed';
  return [...fitting.sizes]
    .sort((a, b) => SIZE_CLASS_CODES.indexOf(a.sizeCode) - SIZE_CLASS_CODES.indexOf(b.sizeCode))
    .map((s) => sizeLabel(s.sizeCode, lengthUnit))
    .join(', ');
}

function columnsFor(lengthUnit: LengthUnit) {
  return [
    column.accessor('code', {
      header: 'Code',
      cell: (info) => (
        <span className="flex flex-col items-start gap-1">
          <Link to={paths.catalogue.fitting.getHref(info.row.original.id)} className={`${linkClasses} font-mono whitespace-nowrap`}>
            {info.getValue()}
          </Link>
          {info.row.original.archivedAt ? <Badge tone="muted">Archived</Badge> : null}
        </span>
      ),
    }),
    column.accessor('name', { header: 'Name' }),
    column.accessor('style', { header: 'Style', cell: (info) => FITTING_STYLE_LABELS[info.getValue()] ?? info.getValue() }),
    column.accessor('material', { header: 'Material', enableSorting: false }),
    column.display({ id: 'sizes', header: 'Sizes', cell: (info) => <span className="text-sm">{sizesText(info.row.original, lengthUnit)}</span> }),
  ];
}

interface FittingTypesTableOptions {
  fittingTypes: FittingTypeDto[];
  total: number;
  query: FittingTypeListQuery;
  onQueryChange: (patch: Partial<FittingTypeListQuery>) => void;
}

export function useFittingTypesTable({ fittingTypes, total, query, onQueryChange }: FittingTypesTableOptions) {
  const units = useUnits();
  const columns = useMemo(() => columnsFor(units.lengthUnit), [units.lengthUnit]);
  return useServerTable({ data: fittingTypes, columns, total, query, onQueryChange, isSort: isSort, getRowId: (row) => row.id });
}

/** A desktop table of fitting types; cards on a phone. */
export function FittingTypesTable({ table, busy }: { table: TanStackTable<FittingTypeDto>; busy: boolean }) {
  const units = useUnits();
  const current = table.getState().sorting[0];
  const sortValue = current ? `${current.id}:${current.desc ? 'desc' : 'asc'}` : 'code:asc';
  return (
    <>
      <div className="hidden md:block" aria-busy={busy || undefined}>
        <ServerTable table={table} label="Fitting types" isSortable={isSort} />
      </div>
      <div className="flex flex-col gap-3 md:hidden">
        <SelectField
          label="Sort by"
          options={[
            { value: 'code:asc', label: 'Code, A to Z' },
            { value: 'code:desc', label: 'Code, Z to A' },
            { value: 'name:asc', label: 'Name, A to Z' },
            { value: 'style:asc', label: 'Style' },
          ]}
          value={sortValue}
          onChange={(event) => {
            const [id = 'code', dir] = event.target.value.split(':');
            table.setSorting([{ id, desc: dir === 'desc' }]);
          }}
        />
        <ul className="flex flex-col gap-3" aria-label="Fitting types" aria-busy={busy || undefined}>
          {table.getRowModel().rows.map((row) => {
            const f = row.original;
            return (
              <li key={row.id} className="relative rounded-[var(--radius-card)] border border-ink-200 bg-white p-4 shadow-sm">
                <div className="flex items-start justify-between gap-3">
                  <div className="flex min-w-0 flex-col">
                    <Link
                      to={paths.catalogue.fitting.getHref(f.id)}
                      className={`${linkClasses} inline-flex min-h-11 items-center font-mono text-lg after:absolute after:inset-0 after:content-['']`}
                    >
                      {f.code}
                    </Link>
                    <span className="text-ink-800">{f.name}</span>
                  </div>
                  {f.archivedAt ? <Badge tone="muted">Archived</Badge> : null}
                </div>
                <dl className="mt-3 grid grid-cols-2 gap-x-4 gap-y-2 text-sm">
                  <div>
                    <dt className="text-ink-600">Style</dt>
                    <dd className="font-semibold text-ink-950">{FITTING_STYLE_LABELS[f.style] ?? f.style}</dd>
                  </div>
                  <div>
                    <dt className="text-ink-600">Material</dt>
                    <dd className="font-semibold text-ink-950">{f.material}</dd>
                  </div>
                  <div className="col-span-2">
                    <dt className="text-ink-600">Sizes</dt>
                    <dd className="font-semibold text-ink-950">{sizesText(f, units.lengthUnit)}</dd>
                  </div>
                </dl>
              </li>
            );
          })}
        </ul>
      </div>
    </>
  );
}
