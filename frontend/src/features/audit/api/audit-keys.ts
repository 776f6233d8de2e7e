export interface AuditQuery {
  entityType: string;
  entityId: string;
  page: number;
  pageSize: number;
}

export const auditKeys = {
  all: ['audit'] as const,
  lists: () => [...auditKeys.all, 'list'] as const,
  list: (query: AuditQuery) => [...auditKeys.lists(), query] as const,
};
