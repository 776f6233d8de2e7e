import { useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import type { ImportProblemDto } from '@shared/schemas/csv.schema';
import { SelectField } from '@/components/ui/field';
import { SortableTh, TBody, Td, THead, Table, Tr } from '@/components/ui/table';

const column = createColumnHelper<ImportProblemDto>();

const rowLabel = (row: number) => (row === 0 ? 'Header' : row.toLocaleString());

const columns = [
  column.accessor('row', {
    header: 'Row',
    cell: (info) => <span className="font-semibold whitespace-nowrap tabular-nums">{rowLabel(info.getValue())}</span>,
    sortingFn: 'basic',
  }),
  column.accessor((p) => p.column ?? '', {
    id: 'column',
    header: 'Column',
    cell: (info) => (info.getValue() ? <span className="font-mono [overflow-wrap:anywhere]">{info.getValue()}</span> : <span className="text-ink-600">Whole row</span>),
  }),
  column.accessor('message', { header: 'Problem', cell: (info) => info.getValue() }),
];

const PHONE_SORTS = [
  { value: 'row:asc', label: 'Row, first to last' },
  { value: 'column:asc', label: 'Column, A to Z' },
  { value: 'message:asc', label: 'Problem, A to Z' },
];

/** Every problem of a file by row and column; sorted in the page, since the server sends them all at once. */
export function ImportProblemsTable({ problems }: { problems: ImportProblemDto[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'row', desc: false }]);
  const data = useMemo(() => problems, [problems]);
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    enableSortingRemoval: false,
    enableMultiSort: false,
    sortDescFirst: false,
  });
  const current = sorting[0];
  const phoneValue = current ? `${current.id}:${current.desc ? 'desc' : 'asc'}` : 'row:asc';

  return (
    <>
      <div className="hidden md:block">
        <Table aria-label="Problems in the file">
          <THead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <SortableTh key={header.id} direction={header.column.getIsSorted()} onSort={() => header.column.toggleSorting(undefined, false)} className={header.column.id === 'message' ? 'w-full' : undefined}>
                    {flexRender(header.column.columnDef.header, header.getContext())}
                  </SortableTh>
                ))}
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
      <div className="flex flex-col gap-3 md:hidden">
        <SelectField
          label="Sort problems by"
          options={PHONE_SORTS}
          value={phoneValue}
          onChange={(event) => {
            const [id = 'row', dir] = event.target.value.split(':');
            setSorting([{ id, desc: dir === 'desc' }]);
          }}
        />
        <ul className="flex flex-col gap-2" aria-label="Problems in the file">
          {table.getRowModel().rows.map((row) => {
            const problem = row.original;
            return (
              <li key={row.id} className="rounded-[var(--radius-control)] border border-l-4 border-ink-200 border-l-danger-700 bg-white px-4 py-3">
                <p className="flex flex-wrap gap-x-3 text-sm font-semibold text-ink-700">
                  <span>{problem.row === 0 ? 'Header' : `Row ${problem.row.toLocaleString()}`}</span>
                  {problem.column ? <span className="font-mono [overflow-wrap:anywhere]">{problem.column}</span> : null}
                </p>
                <p className="text-ink-950">{problem.message}</p>
              </li>
            );
          })}
        </ul>
      </div>
    </>
  );
}
