import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { z } from 'zod';

/** The fields every list query of the catalogue has. */
export interface BaseListQuery {
  q?: string | undefined;
  sort: string;
  dir: 'asc' | 'desc';
  page: number;
  pageSize: number;
  archived: 'exclude' | 'include' | 'only';
}

/** Reads a list's search, filters, sort and page from the address; a bad value falls back to its default. */
export function parseListSearch<Q extends BaseListQuery>(schema: z.ZodType<Q>, keys: readonly string[], params: URLSearchParams): Q {
  const raw: Record<string, string> = {};
  for (const key of keys) {
    const value = params.get(key);
    if (value !== null && value.trim() !== '') raw[key] = value;
  }
  let result = schema.safeParse(raw);
  if (!result.success) {
    for (const issue of result.error.issues) delete raw[String(issue.path[0])];
    result = schema.safeParse(raw);
  }
  const query = result.success ? result.data : schema.parse({});
  return { ...query, q: query.q ? query.q : undefined };
}

/** Writes a query to the address, leaving out what is already the default and keeping keys the list does not own. */
export function listSearchToParams<Q extends BaseListQuery>(schema: z.ZodType<Q>, keys: readonly string[], query: Q, keep?: URLSearchParams): URLSearchParams {
  const defaults = schema.parse({}) as unknown as Record<string, unknown>;
  const params = new URLSearchParams();
  keep?.forEach((value, key) => {
    if (!keys.includes(key)) params.set(key, value);
  });
  const values = query as unknown as Record<string, unknown>;
  for (const key of keys) {
    const value = values[key];
    if (value === undefined || value === null || value === '' || value === defaults[key]) continue;
    params.set(key, String(value));
  }
  return params;
}

/**
 * A list's state lives in the address, so a filtered list can be bookmarked, shared and returned to.
 * `filterKeys` are the ones "clear search and filters" empties.
 */
export function useListSearch<Q extends BaseListQuery>(schema: z.ZodType<Q>, keys: readonly string[], filterKeys: readonly (keyof Q)[]) {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = useMemo(() => parseListSearch(schema, keys, searchParams), [schema, keys, searchParams]);

  const setQuery = useCallback(
    (patch: Partial<Q>, options: { replace?: boolean } = {}) => {
      setSearchParams(
        (previous) => {
          const next = { ...parseListSearch(schema, keys, previous), ...patch };
          // A new search, filter or sort starts again from the first page.
          if (!('page' in patch)) next.page = 1;
          return listSearchToParams(schema, keys, next, previous);
        },
        { replace: options.replace },
      );
    },
    [schema, keys, setSearchParams],
  );

  const defaults = useMemo(() => schema.parse({}), [schema]);
  const filtered = filterKeys.some((key) => query[key] !== undefined && query[key] !== defaults[key]);
  const clearFilters = useCallback(() => {
    const patch: Partial<Q> = {};
    for (const key of filterKeys) patch[key] = defaults[key];
    setQuery(patch);
  }, [filterKeys, defaults, setQuery]);

  return { query, setQuery, clearFilters, filtered };
}
