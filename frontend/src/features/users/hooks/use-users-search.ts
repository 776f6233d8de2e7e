import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { userListQuerySchema, type UserListQuery } from '@shared/schemas/users.schema';

const DEFAULTS = userListQuerySchema.parse({});

/** Reads the users list's search, filters, sort and page from the address; bad values fall back to defaults. */
export function parseUsersSearch(params: URLSearchParams): UserListQuery {
  const raw: Record<string, string> = {};
  for (const key of ['q', 'role', 'status', 'sort', 'dir', 'page', 'pageSize'] as const) {
    const value = params.get(key);
    if (value !== null && value.trim() !== '') raw[key] = value;
  }
  let result = userListQuerySchema.safeParse(raw);
  if (!result.success) {
    for (const issue of result.error.issues) delete raw[String(issue.path[0])];
    result = userListQuerySchema.safeParse(raw);
  }
  const query = result.success ? result.data : DEFAULTS;
  return { ...query, q: query.q ? query.q : undefined };
}

/** Writes a query to the address, leaving out what is already the default. */
export function usersSearchToParams(query: UserListQuery, keep?: URLSearchParams): URLSearchParams {
  const params = new URLSearchParams();
  // Keys the list does not own (an open dialog, say) are kept as they are.
  keep?.forEach((value, key) => {
    if (!['q', 'role', 'status', 'sort', 'dir', 'page', 'pageSize'].includes(key)) params.set(key, value);
  });
  if (query.q) params.set('q', query.q);
  if (query.role) params.set('role', query.role);
  if (query.status) params.set('status', query.status);
  if (query.sort !== DEFAULTS.sort) params.set('sort', query.sort);
  if (query.dir !== DEFAULTS.dir) params.set('dir', query.dir);
  if (query.page !== DEFAULTS.page) params.set('page', String(query.page));
  if (query.pageSize !== DEFAULTS.pageSize) params.set('pageSize', String(query.pageSize));
  return params;
}

export function hasUserFilters(query: UserListQuery): boolean {
  return Boolean(query.q || query.role || query.status);
}

/** The list's state lives in the address, so a filtered list can be bookmarked, shared and returned to. */
export function useUsersSearch() {
  const [searchParams, setSearchParams] = useSearchParams();
  const query = useMemo(() => parseUsersSearch(searchParams), [searchParams]);

  const setQuery = useCallback(
    (patch: Partial<UserListQuery>, options: { replace?: boolean } = {}) => {
      setSearchParams(
        (previous) => {
          const next = { ...parseUsersSearch(previous), ...patch };
          // A new search, filter or sort starts again from the first page.
          if (!('page' in patch)) next.page = 1;
          return usersSearchToParams(next, previous);
        },
        { replace: options.replace },
      );
    },
    [setSearchParams],
  );

  const clearFilters = useCallback(() => setQuery({ q: undefined, role: undefined, status: undefined }), [setQuery]);

  return { query, setQuery, clearFilters };
}
