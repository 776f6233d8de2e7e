import type { EntityManager } from 'typeorm';
import type { ProofTestRecord } from '../../../shared/src/schemas/assemblies.schema.js';
import type { AppContext } from '../context.js';
import { Assembly, AssemblyEvent } from '../entities/index.js';
import { ConflictError, NotFoundError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { lockAssembly } from './assemblies.service.js';
import { recomputeStoredOutcomes } from './assembly-checks.service.js';
import { recordAudit } from './audit.service.js';

/** Kinds a void may correct. Moves (install, removal …) are corrected by the next move, never voided. */
const VOIDABLE = new Set(['proof_test', 'inspection', 'note']);

/**
 * Voids an event with a reason: a new `void` event names it; the voided one stays. Voiding a
 * proof test puts back the assembly's latest test that is not voided. Returns the assembly's id.
 */
export async function voidEvent(ctx: AppContext, manager: EntityManager, actor: Actor, eventId: string, reason: string): Promise<string> {
  const target = await manager.getRepository(AssemblyEvent).findOneBy({ id: eventId });
  if (!target || !(actor.allSites || actor.siteIds.includes(target.siteId))) throw new NotFoundError('Event');
  const assembly = await lockAssembly(manager, actor, target.assemblyId);
  if (!VOIDABLE.has(target.kind)) {
    throw new ConflictError('not_voidable', 'Installs, removals and other moves are not voided: record the move that puts it right.');
  }
  const already = await manager.getRepository(AssemblyEvent).existsBy({ voidsEventId: eventId });
  if (already) throw new ConflictError('already_voided', 'This event is already voided');
  await manager.getRepository(AssemblyEvent).insert({
    assemblyId: assembly.id,
    positionId: target.positionId,
    siteId: target.siteId,
    kind: 'void',
    occurredAt: ctx.clock.now(),
    recordedAt: ctx.clock.now(),
    actorId: actor.id,
    note: reason,
    data: { voidedKind: target.kind },
    voidsEventId: eventId,
  });
  if (target.kind === 'proof_test' && assembly.proofTest?.eventId === eventId) {
    const [previous] = await manager.query(
      `SELECT id, occurred_at AS "at", data FROM assembly_events ev
        WHERE assembly_id = $1 AND kind = 'proof_test' AND id <> $2 AND NOT EXISTS (SELECT 1 FROM assembly_events v WHERE v.voids_event_id = ev.id)
        ORDER BY occurred_at DESC, recorded_at DESC LIMIT 1`,
      [assembly.id, eventId],
    );
    const proofTest: ProofTestRecord | null = previous ? { eventId: previous.id, testedOn: (previous.at as Date).toISOString().slice(0, 10), ...previous.data } : null;
    await manager.getRepository(Assembly).update({ id: assembly.id }, { proofTest });
    if (assembly.positionId) await recomputeStoredOutcomes(manager, { assemblyIds: [assembly.id] }, ctx.clock.now());
  }
  await recordAudit(manager, { actorId: actor.id, action: 'event.voided', entityType: 'assembly_event', entityId: eventId, siteId: target.siteId, after: { reason, kind: target.kind } });
  return assembly.id;
}
