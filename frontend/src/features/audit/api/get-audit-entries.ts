import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ListResponse } from '@shared/schemas/common.schema';
import type { AuditEntryDto } from '@shared/schemas/users.schema';
import { api } from '@/lib/api-client';
import { auditKeys, type AuditQuery } from './audit-keys';

/** Who changed what on one record, newest first. */
export function getAuditEntries(query: AuditQuery, signal?: AbortSignal): Promise<ListResponse<AuditEntryDto>> {
  return api.get<ListResponse<AuditEntryDto>>(
    '/api/audit',
    { entityType: query.entityType, entityId: query.entityId, page: query.page, pageSize: query.pageSize },
    signal,
  );
}

export const auditEntriesQueryOptions = (query: AuditQuery) =>
  queryOptions({
    queryKey: auditKeys.list(query),
    queryFn: ({ signal }) => getAuditEntries(query, signal),
  });

export function useAuditEntries(query: AuditQuery) {
  return useQuery(auditEntriesQueryOptions(query));
}
