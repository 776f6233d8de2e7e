import type { ReactNode } from 'react';
import type { Preferences } from '@shared/schemas/auth.schema';
import type { CheckOutcome } from '@shared/checks/types';
import { IMPORT_COLUMNS, IMPORT_KIND_LABELS, type CsvColumn, type ImportKind, type ImportStatus } from '@shared/schemas/csv.schema';
import { mediumByCode } from '@shared/checks/compatibility';
import { serviceByCode } from '@shared/services/service-catalogue';
import { CRITICALITY_DEFINITIONS } from '@shared/services/criticality';
import { sizeLabel } from '@shared/sizes/nominal-sizes';
import { formatLength, formatPressure, formatTemperature } from '@shared/units/units';
import { formatDate } from '@/lib/format';
import { AssemblyStatusBadge } from '@/components/ui/assembly-status-badge';
import { Badge, type BadgeTone } from '@/components/ui/badge';
import { CheckOutcomeBadge } from '@/components/ui/check-outcome-badge';

export const KIND_OPTIONS: ReadonlyArray<{ value: ImportKind; label: string; description: string }> = [
  { value: 'constructions', label: IMPORT_KIND_LABELS.constructions, description: 'Hose builds for the catalogue, used at every site.' },
  { value: 'positions', label: IMPORT_KIND_LABELS.positions, description: 'Hose points on equipment already set up at one site.' },
  { value: 'assemblies', label: IMPORT_KIND_LABELS.assemblies, description: 'Hoses in stock or in place at one site, with their history.' },
];

/** "positions" → "positions", used in sentences. */
export const kindWord = (kind: ImportKind, n = 2) => (n === 1 ? kind.replace(/ies$/, 'y').replace(/s$/, '') : kind);

const STATUS: Record<ImportStatus, { label: string; tone: BadgeTone }> = {
  checking: { label: 'Checking', tone: 'accent' },
  checked: { label: 'Checked', tone: 'neutral' },
  writing: { label: 'Writing', tone: 'accent' },
  done: { label: 'Written', tone: 'success' },
  failed: { label: 'Failed', tone: 'danger' },
};

export function ImportStatusBadge({ status, errorCount = 0 }: { status: ImportStatus; errorCount?: number }) {
  if (status === 'checked' && errorCount > 0) return <Badge tone="danger">Has problems</Badge>;
  if (status === 'checked') return <Badge tone="success">Ready to write</Badge>;
  return <Badge tone={STATUS[status].tone}>{STATUS[status].label}</Badge>;
}

/** The columns the preview of a kind shows, in the documented order, with what the server adds. */
export function previewColumns(kind: ImportKind, keys: Set<string>): Array<Pick<CsvColumn, 'key' | 'label' | 'kind'>> {
  const documented = IMPORT_COLUMNS[kind].filter((c) => keys.has(c.key));
  const extra: Array<Pick<CsvColumn, 'key' | 'label' | 'kind'>> = [];
  if (keys.has('status')) extra.push({ key: 'status', label: 'Will be', kind: 'text' });
  if (keys.has('check_outcome')) extra.push({ key: 'check_outcome', label: 'Selection checks', kind: 'text' });
  return [...documented, ...extra];
}

/** One preview value in the reader's units: quantities come in kPa, mm and °C, sizes as size classes. */
export function PreviewValue({ column, value, preferences }: { column: Pick<CsvColumn, 'key' | 'kind'>; value: string | number | boolean | null | undefined; preferences: Preferences }): ReactNode {
  if (column.key === 'status' && typeof value === 'string') return <AssemblyStatusBadge status={value} />;
  if (column.key === 'check_outcome') return value ? <CheckOutcomeBadge outcome={value as CheckOutcome} /> : <span className="text-ink-600">Not installed</span>;
  if (column.key === 'tag_code' && value == null) return <span className="text-ink-600">New tag</span>;
  if (value === null || value === undefined || value === '') return <span className="text-ink-500">—</span>;
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (column.key === 'service') return serviceByCode(String(value))?.name ?? String(value);
  if (column.key === 'medium') return mediumByCode(String(value))?.name ?? String(value);
  if (column.key === 'criticality') return CRITICALITY_DEFINITIONS.find((c) => c.code === value)?.label ?? String(value);
  switch (column.kind) {
    case 'pressure':
      return <span className="whitespace-nowrap">{formatPressure(Number(value), preferences.pressureUnit)}</span>;
    case 'length':
      return <span className="whitespace-nowrap">{formatLength(Number(value), preferences.lengthUnit)}</span>;
    case 'temperature':
      return <span className="whitespace-nowrap">{formatTemperature(Number(value), preferences.temperatureUnit)}</span>;
    case 'size':
      return <span className="whitespace-nowrap">{sizeLabel(String(value), preferences.lengthUnit)}</span>;
    case 'date':
      return <span className="whitespace-nowrap">{formatDate(String(value))}</span>;
    case 'code':
      return <span className="font-mono whitespace-nowrap">{String(value)}</span>;
    default:
      return String(value);
  }
}

/** "2.4 MB", "812 kB". */
export function formatBytes(bytes: number): string {
  if (bytes >= 1_048_576) return `${(bytes / 1_048_576).toFixed(1).replace(/\.0$/, '')} MB`;
  if (bytes >= 1024) return `${Math.round(bytes / 1024)} kB`;
  return `${bytes} bytes`;
}
