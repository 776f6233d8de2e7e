import type { ImportKind, ImportPreviewRow } from '@shared/schemas/csv.schema';
import { useCurrentUser } from '@/lib/auth';
import { TBody, Td, Th, THead, Table, Tr } from '@/components/ui/table';
import { PreviewValue, previewColumns } from './import-values';

/** The first rows as they will be written, in the reader's units. */
export function ImportPreviewTable({ kind, rows }: { kind: ImportKind; rows: ImportPreviewRow[] }) {
  const { preferences } = useCurrentUser();
  const keys = new Set(rows.flatMap((r) => Object.keys(r.values)));
  const columns = previewColumns(kind, keys);
  return (
    <Table aria-label="Rows as they will be written">
      <THead>
        <tr>
          <Th>Row</Th>
          {columns.map((c) => (
            <Th key={c.key}>{c.label}</Th>
          ))}
        </tr>
      </THead>
      <TBody>
        {rows.map((row) => (
          <Tr key={row.row}>
            <Td className="font-semibold tabular-nums">{row.row.toLocaleString()}</Td>
            {columns.map((c) => (
              <Td key={c.key} className={c.kind === 'text' && c.key !== 'status' && c.key !== 'check_outcome' ? 'min-w-48' : 'whitespace-nowrap'}>
                <PreviewValue column={c} value={row.values[c.key]} preferences={preferences} />
              </Td>
            ))}
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
