import { useMemo } from 'react';
import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState, type Table as TanStackTable, type Updater } from '@tanstack/react-table';
import { SortableTh, TBody, Td, Th, THead, Table, Tr } from './table';

/** The part of a list's query a table drives: sort, direction and page, all kept by the caller (the address). */
export interface ServerTableQuery<S extends string> {
  sort: S;
  dir: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

interface ServerTableOptions<Row, S extends string> {
  data: Row[];
  columns: ColumnDef<Row, any>[];
  total: number;
  query: ServerTableQuery<S>;
  onQueryChange: (patch: Partial<ServerTableQuery<S>>) => void;
  /** The sorts the server accepts; a column with another id does not sort. */
  isSort: (id: string) => id is S;
  getRowId: (row: Row) => string;
}

/** A TanStack table whose sorting and paging happen on the server and live in the caller's query. */
export function useServerTable<Row, S extends string>({ data, columns, total, query, onQueryChange, isSort, getRowId }: ServerTableOptions<Row, S>): TanStackTable<Row> {
  const sorting: SortingState = useMemo(() => [{ id: query.sort, desc: query.dir === 'desc' }], [query.sort, query.dir]);
  const pagination = useMemo(() => ({ pageIndex: query.page - 1, pageSize: query.pageSize }), [query.page, query.pageSize]);
  return useReactTable({
    data,
    columns,
    getRowId,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableMultiSort: false,
    enableSortingRemoval: false,
    sortDescFirst: false,
    rowCount: total,
    state: { sorting, pagination },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const first = next[0];
      if (first && isSort(first.id)) onQueryChange({ sort: first.id, dir: first.desc ? 'desc' : 'asc' } as Partial<ServerTableQuery<S>>);
    },
    onPaginationChange: (updater) => {
      const next = typeof updater === 'function' ? updater(pagination) : updater;
      onQueryChange({ page: next.pageIndex + 1, pageSize: next.pageSize } as Partial<ServerTableQuery<S>>);
    },
  });
}

/** The desktop rendering of such a table: sortable headers where the server sorts, then the rows. */
export function ServerTable<Row>({ table, label, isSortable = () => true }: { table: TanStackTable<Row>; label: string; isSortable?: (id: string) => boolean }) {
  return (
    <Table aria-label={label}>
      <THead>
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id}>
            {group.headers.map((header) => {
              const content = flexRender(header.column.columnDef.header, header.getContext());
              return header.column.getCanSort() && isSortable(header.column.id) ? (
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
  );
}
