import type { ArchivedFilter } from '@shared/schemas/register.schema';

export const ARCHIVED_OPTIONS: Array<{ value: ArchivedFilter; label: string }> = [
  { value: 'exclude', label: 'Current only' },
  { value: 'include', label: 'Current and archived' },
  { value: 'only', label: 'Archived only' },
];

export const isArchivedFilter = (value: string): value is ArchivedFilter => ARCHIVED_OPTIONS.some((o) => o.value === value);
