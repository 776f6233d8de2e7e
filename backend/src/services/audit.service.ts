import type { EntityManager } from 'typeorm';
import { AuditEntry } from '../entities/index.js';

const SECRET_KEYS = new Set(['passwordHash', 'tokenHash', 'sessionVersion', 'password', 'token']);

/** A record made safe for the audit trail: secrets dropped, dates as ISO strings. */
export function auditSnapshot(record: object | null): Record<string, unknown> | null {
  if (!record) return null;
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(record)) {
    if (SECRET_KEYS.has(key)) continue;
    out[key] = value instanceof Date ? value.toISOString() : value;
  }
  return out;
}

export interface AuditInput {
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  siteId?: string | null;
  before?: object | null;
  after?: object | null;
  at?: Date;
}

/** Adds one row to the audit trail, in the caller's transaction. */
export async function recordAudit(manager: EntityManager, input: AuditInput): Promise<void> {
  await manager.getRepository(AuditEntry).insert({
    actorId: input.actorId,
    action: input.action,
    entityType: input.entityType,
    entityId: input.entityId,
    siteId: input.siteId ?? null,
    before: auditSnapshot(input.before ?? null),
    after: auditSnapshot(input.after ?? null),
    ...(input.at ? { at: input.at } : {}),
  });
}
