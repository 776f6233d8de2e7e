import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { assemblyListQuerySchema, type AssemblyListQuery } from '@shared/schemas/assemblies.schema';

/** The register's columns, in the order they show. */
export const REGISTER_COLUMNS = [
  'number',
  'status',
  'position',
  'equipment',
  'area',
  'site',
  'construction',
  'size',
  'service',
  'checkOutcome',
  'nextInspectionDue',
  'installedAt',
  'updatedAt',
] as const;
export type RegisterColumn = (typeof REGISTER_COLUMNS)[number];

export const DEFAULT_COLUMNS: readonly RegisterColumn[] = ['number', 'status', 'position', 'equipment', 'construction', 'checkOutcome', 'nextInspectionDue'];

/** Columns that always show: a row without its number cannot be opened. */
export const FIXED_COLUMNS: readonly RegisterColumn[] = ['number'];

const isColumn = (value: string): value is RegisterColumn => (REGISTER_COLUMNS as readonly string[]).includes(value);

/** The keys of the address the register owns. */
const QUERY_KEYS = ['q', 'siteId', 'areaId', 'equipmentId', 'positionId', 'serviceCode', 'constructionId', 'sizeCode', 'status', 'checkOutcome', 'due', 'sort', 'dir', 'page', 'pageSize'] as const;
const COLUMNS_KEY = 'cols';
const OWNED_KEYS: readonly string[] = [...QUERY_KEYS, COLUMNS_KEY];

export type RegisterQuery = AssemblyListQuery;
export type RegisterFilters = Omit<RegisterQuery, 'sort' | 'dir' | 'page' | 'pageSize'>;

const DEFAULTS = assemblyListQuerySchema.parse({});

/** The filters of the register that narrow what it holds (not the order or the page). */
export const FILTER_KEYS = ['q', 'siteId', 'areaId', 'equipmentId', 'positionId', 'serviceCode', 'constructionId', 'sizeCode', 'status', 'checkOutcome', 'due'] as const;
type FilterKey = (typeof FILTER_KEYS)[number];

/** Reads the register's query from the address; a bad value falls back to its default and the rest still applies. */
export function parseRegisterQuery(params: URLSearchParams): RegisterQuery {
  const raw: Record<string, string> = {};
  for (const key of QUERY_KEYS) {
    const value = params.get(key);
    if (value !== null && value.trim() !== '') raw[key] = value;
  }
  let result = assemblyListQuerySchema.safeParse(raw);
  // A couple of passes: each drops the keys the last one refused.
  for (let pass = 0; !result.success && pass < 3; pass++) {
    for (const issue of result.error.issues) delete raw[String(issue.path[0])];
    result = assemblyListQuerySchema.safeParse(raw);
  }
  const query = result.success ? result.data : DEFAULTS;
  return { ...query, q: query.q ? query.q : undefined, status: query.status?.length ? [...new Set(query.status)] : undefined };
}

/** The chosen columns in the address, or the default set; the fixed columns are always in. */
export function parseRegisterColumns(params: URLSearchParams): RegisterColumn[] {
  const value = params.get(COLUMNS_KEY);
  if (value === null) return [...DEFAULT_COLUMNS];
  const chosen = new Set(value.split(',').map((c) => c.trim()).filter(isColumn));
  for (const fixed of FIXED_COLUMNS) chosen.add(fixed);
  return REGISTER_COLUMNS.filter((c) => chosen.has(c));
}

const sameColumns = (a: readonly RegisterColumn[], b: readonly RegisterColumn[]) => a.length === b.length && a.every((c) => b.includes(c));

/** Writes the register's view to the address, leaving out what is already the default. */
export function registerSearchToParams(query: RegisterQuery, columns: readonly RegisterColumn[], keep?: URLSearchParams): URLSearchParams {
  const params = new URLSearchParams();
  keep?.forEach((value, key) => {
    if (!OWNED_KEYS.includes(key)) params.set(key, value);
  });
  for (const key of FILTER_KEYS) {
    const value = query[key];
    if (Array.isArray(value)) {
      if (value.length) params.set(key, value.join(','));
    } else if (value) params.set(key, value);
  }
  if (query.sort !== DEFAULTS.sort) params.set('sort', query.sort);
  if (query.dir !== DEFAULTS.dir) params.set('dir', query.dir);
  if (query.page !== DEFAULTS.page) params.set('page', String(query.page));
  if (query.pageSize !== DEFAULTS.pageSize) params.set('pageSize', String(query.pageSize));
  if (!sameColumns(columns, DEFAULT_COLUMNS)) params.set(COLUMNS_KEY, REGISTER_COLUMNS.filter((c) => columns.includes(c)).join(','));
  return params;
}

/** How many filters narrow the view (the search text counts as one). */
export function countFilters(query: RegisterQuery): number {
  return FILTER_KEYS.filter((key) => {
    const value = query[key];
    return Array.isArray(value) ? value.length > 0 : Boolean(value);
  }).length;
}

export const CLEARED_FILTERS: Record<FilterKey, undefined> = Object.fromEntries(FILTER_KEYS.map((k) => [k, undefined])) as Record<FilterKey, undefined>;

/** The register's whole view — filters, order, page, page size and columns — lives in the address, so a link shares it exactly. */
export function useRegisterSearch() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = useMemo(() => parseRegisterQuery(searchParams), [searchParams]);
  const columns = useMemo(() => parseRegisterColumns(searchParams), [searchParams]);

  const setQuery = useCallback(
    (patch: Partial<RegisterQuery>, options: { replace?: boolean } = {}) => {
      setSearchParams(
        (previous) => {
          const next = { ...parseRegisterQuery(previous), ...patch };
          // A new search, filter or order starts again from the first page.
          if (!('page' in patch)) next.page = 1;
          return registerSearchToParams(next, parseRegisterColumns(previous), previous);
        },
        { replace: options.replace },
      );
    },
    [setSearchParams],
  );

  const setColumns = useCallback(
    (next: readonly RegisterColumn[]) => {
      setSearchParams((previous) => registerSearchToParams(parseRegisterQuery(previous), [...new Set([...FIXED_COLUMNS, ...next])], previous), { replace: true });
    },
    [setSearchParams],
  );

  const clearFilters = useCallback(() => setQuery(CLEARED_FILTERS), [setQuery]);

  return { query, columns, setQuery, setColumns, clearFilters };
}
