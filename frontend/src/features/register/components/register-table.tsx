import { useMemo } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
  type Table as TanStackTable,
  type Updater,
  type VisibilityState,
} from '@tanstack/react-table';
import type { LengthUnit } from '@shared/schemas/auth.schema';
import { ASSEMBLY_SORTS, type AssemblyListItemDto } from '@shared/schemas/assemblies.schema';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatDay } from '@/lib/format';
import { AssemblyStatusBadge } from '@/components/ui/assembly-status-badge';
import { CheckOutcomeBadge } from '@/components/ui/check-outcome-badge';
import { SortableTh, TBody, Td, Th, THead, Table, Tr } from '@/components/ui/table';
import { REGISTER_COLUMNS, type RegisterColumn, type RegisterQuery } from '../hooks/use-register-search';
import { AssemblyNumberLink, DueDate, PositionCell, todayIso } from './register-cells';

type RegisterSort = (typeof ASSEMBLY_SORTS)[number];
const isRegisterSort = (value: string): value is RegisterSort => (ASSEMBLY_SORTS as readonly string[]).includes(value);

/** Each column's heading, also the words of the column chooser. */
export const COLUMN_LABELS: Record<RegisterColumn, string> = {
  number: 'Assembly',
  status: 'Status',
  position: 'Position',
  equipment: 'Equipment',
  area: 'Area',
  site: 'Site',
  construction: 'Construction',
  size: 'Size',
  service: 'Service',
  checkOutcome: 'Checks',
  nextInspectionDue: 'Inspection due',
  installedAt: 'Installed on',
  updatedAt: 'Last changed',
};

const column = createColumnHelper<AssemblyListItemDto>();
const dash = <span className="text-ink-600">—</span>;

interface ColumnContext {
  lengthUnit: LengthUnit;
  serviceName: (code: string) => string;
  today: string;
}

function buildColumns({ lengthUnit, serviceName, today }: ColumnContext) {
  return [
    column.accessor('number', { id: 'number', header: COLUMN_LABELS.number, cell: (info) => <AssemblyNumberLink assembly={info.row.original} /> }),
    column.accessor('status', { id: 'status', header: COLUMN_LABELS.status, cell: (info) => <AssemblyStatusBadge status={info.getValue()} /> }),
    column.accessor('position', { id: 'position', header: COLUMN_LABELS.position, cell: (info) => <PositionCell position={info.getValue()} /> }),
    column.accessor((row) => row.position, {
      id: 'equipment',
      header: COLUMN_LABELS.equipment,
      enableSorting: false,
      cell: (info) => {
        const position = info.getValue();
        if (!position) return dash;
        return (
          <span className="flex flex-col">
            <span className="font-mono text-sm font-semibold whitespace-nowrap text-ink-900">{position.equipmentAssetNumber}</span>
            <span className="text-sm text-ink-700">{position.equipmentName}</span>
          </span>
        );
      },
    }),
    column.accessor((row) => row.position?.areaName ?? null, { id: 'area', header: COLUMN_LABELS.area, enableSorting: false, cell: (info) => info.getValue() ?? dash }),
    column.accessor('siteName', { id: 'site', header: COLUMN_LABELS.site, enableSorting: false }),
    column.accessor('construction', {
      id: 'construction',
      header: COLUMN_LABELS.construction,
      cell: (info) => (
        <span className="flex max-w-36 flex-col">
          <span className="font-mono font-semibold whitespace-nowrap text-ink-950">{info.getValue().code}</span>
          <span className="truncate text-sm text-ink-700" title={info.getValue().name}>
            {info.getValue().name}
          </span>
        </span>
      ),
    }),
    column.accessor((row) => row.construction.sizeCode, {
      id: 'size',
      header: COLUMN_LABELS.size,
      enableSorting: false,
      cell: (info) => <span className="whitespace-nowrap">{sizeLabel(info.getValue(), lengthUnit)}</span>,
    }),
    column.accessor((row) => row.position?.serviceCode ?? null, {
      id: 'service',
      header: COLUMN_LABELS.service,
      enableSorting: false,
      cell: (info) => {
        const code = info.getValue();
        return code ? serviceName(code) : dash;
      },
    }),
    column.accessor('checkOutcome', {
      id: 'checkOutcome',
      header: COLUMN_LABELS.checkOutcome,
      cell: (info) => <CheckOutcomeBadge outcome={info.getValue()} overridden={info.row.original.overridden} />,
    }),
    column.accessor('nextInspectionDue', { id: 'nextInspectionDue', header: COLUMN_LABELS.nextInspectionDue, cell: (info) => <DueDate due={info.getValue()} today={today} /> }),
    column.accessor('installedAt', {
      id: 'installedAt',
      header: COLUMN_LABELS.installedAt,
      cell: (info) => {
        const value = info.getValue();
        return value ? <time dateTime={value} className="whitespace-nowrap">{formatDay(value)}</time> : dash;
      },
    }),
    column.accessor('updatedAt', {
      id: 'updatedAt',
      header: COLUMN_LABELS.updatedAt,
      cell: (info) => <time dateTime={info.getValue()} className="whitespace-nowrap">{formatDay(info.getValue())}</time>,
    }),
  ];
}

interface RegisterTableOptions {
  rows: AssemblyListItemDto[];
  total: number;
  query: RegisterQuery;
  columns: readonly RegisterColumn[];
  lengthUnit: LengthUnit;
  serviceName: (code: string) => string;
  onQueryChange: (patch: Partial<RegisterQuery>) => void;
}

/** The table's state is the address's: sorting, paging and filtering happen on the server. */
export function useRegisterTable({ rows, total, query, columns, lengthUnit, serviceName, onQueryChange }: RegisterTableOptions) {
  const today = todayIso();
  const columnDefs = useMemo(() => buildColumns({ lengthUnit, serviceName, today }), [lengthUnit, serviceName, today]);
  const sorting: SortingState = useMemo(() => [{ id: query.sort, desc: query.dir === 'desc' }], [query.sort, query.dir]);
  const pagination = useMemo(() => ({ pageIndex: query.page - 1, pageSize: query.pageSize }), [query.page, query.pageSize]);
  const columnVisibility: VisibilityState = useMemo(() => Object.fromEntries(REGISTER_COLUMNS.map((c) => [c, columns.includes(c)])), [columns]);

  return useReactTable({
    data: rows,
    columns: columnDefs,
    getRowId: (row) => row.id,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    sortDescFirst: false,
    rowCount: total,
    state: { sorting, pagination, columnVisibility },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      if (first && isRegisterSort(first.id)) onQueryChange({ sort: first.id, dir: first.desc ? 'desc' : 'asc' });
    },
    onPaginationChange: (updater) => {
      const next = typeof updater === 'function' ? updater(pagination) : updater;
      onQueryChange({ page: next.pageIndex + 1, pageSize: next.pageSize });
    },
  });
}

/** The register on a desktop: one row per assembly, the chosen columns, headings that sort. */
export function RegisterTable({ table, busy }: { table: TanStackTable<AssemblyListItemDto>; busy: boolean }) {
  return (
    <div className="hidden md:block" aria-busy={busy || undefined}>
      <Table aria-label="Register of assemblies" className={busy ? 'opacity-70' : undefined}>
        <THead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const content = flexRender(header.column.columnDef.header, header.getContext());
                return header.column.getCanSort() ? (
                  <SortableTh key={header.id} direction={header.column.getIsSorted()} onSort={() => header.column.toggleSorting(undefined, false)}>
                    {content}
                  </SortableTh>
                ) : (
                  <Th key={header.id}>{content}</Th>
                );
              })}
            </tr>
          ))}
        </THead>
        <TBody>
          {table.getRowModel().rows.map((row) => (
            <Tr key={row.id}>
              {row.getVisibleCells().map((cell) => (
                <Td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</Td>
              ))}
            </Tr>
          ))}
        </TBody>
      </Table>
    </div>
  );
}
