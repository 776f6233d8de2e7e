import { CSV_UNIT_WORDS, IMPORT_COLUMNS, IMPORT_KIND_LABELS, IMPORT_LIMITS, templateHeader, type CsvColumn, type ImportKind } from '@shared/schemas/csv.schema';
import { mediumByCode, mediumLabel } from '@shared/checks/compatibility';
import { serviceByCode } from '@shared/services/service-catalogue';
import { buttonClasses } from '@/components/ui/button';
import { Card, CardBody, CardHeader } from '@/components/ui/card';
import { DownloadIcon } from '@/components/ui/icons';
import { formatBytes } from './import-values';

const UNIT_LIST: Record<'pressure' | 'length' | 'temperature', string> = {
  pressure: Object.keys(CSV_UNIT_WORDS.pressure).join(', '),
  length: Object.keys(CSV_UNIT_WORDS.length).join(', '),
  temperature: Object.keys(CSV_UNIT_WORDS.temperature).map((u) => `°${u}`).join(', '),
};

/** Words beside a code, where the code alone says little. */
function choiceName(column: CsvColumn, code: string): string | null {
  if (column.key === 'service') return serviceByCode(code)?.name ?? null;
  if (column.key === 'medium') {
    const medium = mediumByCode(code);
    return medium ? mediumLabel(medium) : null;
  }
  return null;
}

function Choices({ column, choices }: { column: CsvColumn; choices: readonly string[] }) {
  if (choices.length <= 8) return <span className="block text-sm text-ink-600">One of: {choices.join(', ')}.</span>;
  return (
    <details className="mt-1 text-sm">
      <summary className="inline-flex min-h-11 cursor-pointer items-center font-semibold text-copper-700 underline decoration-2 underline-offset-4">
        The {choices.length} accepted codes
      </summary>
      <ul className="mt-1 grid gap-x-4 gap-y-0.5 sm:grid-cols-2">
        {choices.map((code) => {
          const name = choiceName(column, code);
          return (
            <li key={code}>
              <code className="font-mono text-ink-950">{code}</code>
              {name ? <span className="text-ink-600"> — {name}</span> : null}
            </li>
          );
        })}
      </ul>
    </details>
  );
}

function needed(column: CsvColumn): { text: string; strong: boolean } {
  if (column.required === true) return { text: 'Required', strong: true };
  if (typeof column.required === 'string') return { text: `Required ${column.required}`, strong: true };
  return { text: 'Optional', strong: false };
}

function ColumnItem({ column }: { column: CsvColumn }) {
  const need = needed(column);
  const quantity = column.kind === 'pressure' || column.kind === 'length' || column.kind === 'temperature' ? column.kind : null;
  return (
    <li className="grid gap-x-4 gap-y-1 border-b border-ink-100 py-3 last:border-b-0 md:grid-cols-[minmax(12rem,16rem)_9rem_1fr]">
      <div className="flex flex-col">
        <code className="font-mono font-semibold text-ink-950 [overflow-wrap:anywhere]">{column.key}</code>
        {quantity ? <span className="text-sm text-ink-600">with its unit, e.g. {templateHeader(column)}</span> : null}
      </div>
      <div className={need.strong ? 'font-semibold text-ink-950' : 'text-ink-600'}>{need.text}</div>
      <div className="text-ink-800">
        <span className="font-semibold">{column.label}.</span> {column.description}
        {quantity ? <span className="block text-sm text-ink-600">Units: {UNIT_LIST[quantity]}.</span> : null}
        {column.choices && column.kind === 'choice' ? <Choices column={column} choices={column.choices} /> : null}
      </div>
    </li>
  );
}

/** What a file of this kind may hold, column by column, from the same definitions the server reads it with. */
export function ImportColumnsGuide({ kind }: { kind: ImportKind }) {
  const columns = IMPORT_COLUMNS[kind];
  const titleId = `import-columns-${kind}`;
  return (
    <Card labelledBy={titleId}>
      <CardHeader
        titleId={titleId}
        title={`Columns for importing ${IMPORT_KIND_LABELS[kind].toLowerCase()}`}
        description="Headers in any order; only the required ones must be there."
        actions={
          <a href={`/api/imports/templates/${kind}`} download className={buttonClasses('secondary')}>
            <DownloadIcon />
            Download the template
          </a>
        }
      />
      <CardBody className="flex flex-col gap-4">
        <ul className="grid gap-x-6 gap-y-1 text-ink-800 md:grid-cols-2">
          <li>Save as CSV in UTF-8 (with or without a byte-order mark), separated by commas or semicolons.</li>
          <li>Numbers with a decimal point; a semicolon file may use a decimal comma (12,5). No thousands separators.</li>
          <li>
            Every quantity with its unit: in the header (<code className="font-mono">working_pressure_bar</code>, <code className="font-mono">working_pressure [psi]</code>) or in a
            column of its own (<code className="font-mono">working_pressure_unit</code>).
          </li>
          <li>Dates as YYYY-MM-DD; yes/no columns take yes or no. Sizes in any written form: 19 mm, 3/4 in and -12 are one size.</li>
          <li>
            At most {formatBytes(IMPORT_LIMITS.maxBytes)} and {IMPORT_LIMITS.maxRows.toLocaleString()} rows. Nothing is written until every row is clean.
          </li>
          <li>An import only adds: a code already in the register is reported, never overwritten.</li>
        </ul>
        <ul aria-label={`Columns for importing ${IMPORT_KIND_LABELS[kind].toLowerCase()}`} className="flex flex-col">
          {columns.map((column) => (
            <ColumnItem key={column.key} column={column} />
          ))}
        </ul>
      </CardBody>
    </Card>
  );
}
