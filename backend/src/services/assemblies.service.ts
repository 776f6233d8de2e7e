import type { EntityManager } from 'typeorm';
import { defaultProofTestPressureKpa } from '../../../shared/src/checks/selection-checks.js';
import type { CheckResult, SelectionCheckCode } from '../../../shared/src/checks/types.js';
import { roleMay } from '../../../shared/src/permissions.js';
import { defaultLifeOutcome, type LifeOutcome, type RemovalReason } from '../../../shared/src/services/removal-reasons.js';
import type {
  AssemblyBuildInput,
  AssemblyStatus,
  EventKind,
  InstallInput,
  OverrideInput,
  ProofTestInput,
  ProofTestRecord,
  RemoveInput,
  ReplaceInput,
  ReturnToStockInput,
  ScrapInput,
  TagOutInput,
} from '../../../shared/src/schemas/assemblies.schema.js';
import { REMOVAL_CAUTIONS } from '../../../shared/src/schemas/assemblies.schema.js';
import { tagCodeForSerial } from '../../../shared/src/tags/tag-code.js';
import type { AppContext } from '../context.js';
import { Assembly, AssemblyEvent, CheckOverride, Construction, Equipment, FittingType, Position } from '../entities/index.js';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { loadCheckContext, refreshStoredOutcome, runChecks } from './assembly-checks.service.js';
import { recordAudit } from './audit.service.js';

const inScope = (actor: Actor, siteId: string) => actor.allSites || actor.siteIds.includes(siteId);

/** Loads an assembly of the actor's sites, locked for the rest of the transaction. */
export async function lockAssembly(manager: EntityManager, actor: Actor, id: string): Promise<Assembly> {
  const assembly = await manager.getRepository(Assembly).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!assembly || !inScope(actor, assembly.siteId)) throw new NotFoundError('Assembly');
  return assembly;
}

async function lockPosition(manager: EntityManager, actor: Actor, id: string): Promise<Position> {
  const position = await manager.getRepository(Position).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!position || !inScope(actor, position.siteId)) throw new NotFoundError('Position');
  return position;
}

/** A 409 saying the assembly is not where the action needs it. */
function wrongStatus(assembly: Assembly, action: string, allowed: AssemblyStatus[]): AppError {
  return new ConflictError(
    'wrong_status',
    `Assembly ${assembly.number} is ${assembly.status.replace('_', ' ')}; it can be ${action} only when ${allowed.map((s) => s.replace('_', ' ')).join(' or ')}. Someone may have just changed it: reload to see.`,
  );
}

function requireStatus(assembly: Assembly, action: string, allowed: AssemblyStatus[]): void {
  if (!allowed.includes(assembly.status)) throw wrongStatus(assembly, action, allowed);
}

interface EventInput {
  occurredAt?: string;
  occurredAtEstimated?: boolean;
  workOrder?: string | null;
  hourMeterHours?: number | null;
  note?: string | null;
}

async function addEvent(
  ctx: AppContext,
  manager: EntityManager,
  actor: Actor,
  assembly: Assembly,
  kind: EventKind,
  input: EventInput,
  extra: { positionId?: string | null; siteId?: string; data?: Record<string, unknown> } = {},
): Promise<AssemblyEvent> {
  return manager.getRepository(AssemblyEvent).save({
    assemblyId: assembly.id,
    positionId: extra.positionId === undefined ? assembly.positionId : extra.positionId,
    siteId: extra.siteId ?? assembly.siteId,
    kind,
    occurredAt: input.occurredAt ? new Date(input.occurredAt) : ctx.clock.now(),
    occurredAtEstimated: input.occurredAtEstimated ?? false,
    recordedAt: ctx.clock.now(),
    actorId: actor.id,
    workOrder: input.workOrder ?? null,
    hourMeterHours: input.hourMeterHours ?? null,
    note: input.note ?? null,
    data: extra.data ?? {},
  });
}

/** Keeps the equipment's latest hour-meter reading when an event brings a newer one. */
async function recordHourMeter(manager: EntityManager, position: Position, hours: number | null | undefined, at: Date): Promise<void> {
  if (hours == null) return;
  await manager
    .createQueryBuilder()
    .update(Equipment)
    .set({ hourMeterHours: hours, hourMeterReadAt: at })
    .where('id = :id AND has_hour_meter AND (hour_meter_read_at IS NULL OR hour_meter_read_at <= :at)', { id: position.equipmentId, at })
    .execute();
}

// ── Build and proof test ──────────────────────────────────────────────────────────────────────

export async function buildAssembly(ctx: AppContext, manager: EntityManager, actor: Actor, input: AssemblyBuildInput): Promise<Assembly> {
  if (!inScope(actor, input.siteId)) throw new NotFoundError('Site');
  const construction = await manager.getRepository(Construction).findOneBy({ id: input.constructionId });
  if (!construction || construction.archivedAt) throw new ValidationError('Choose a construction from the catalogue', 'constructionId');
  for (const [field, end] of [['endA', input.endA], ['endB', input.endB]] as const) {
    if (!end) continue;
    const fitting = await manager.getRepository(FittingType).findOneBy({ id: end.fittingTypeId });
    if (!fitting || fitting.archivedAt) throw new ValidationError('Choose a fitting type from the catalogue', `${field}.fittingTypeId`);
  }
  if (input.cutLength != null && input.cutLength > input.overallLength) {
    throw new ValidationError('The cut length cannot be longer than the overall length', 'cutLength');
  }
  const [{ serial }] = await manager.query(`SELECT nextval('assembly_serial_seq')::int AS serial`);
  const assembly = await manager.getRepository(Assembly).save({
    number: tagCodeForSerial(serial),
    constructionId: construction.id,
    hoseBatch: input.hoseBatch,
    hoseManufacturedOn: input.hoseManufacturedOn,
    overallLengthMm: input.overallLength,
    cutLengthMm: input.cutLength,
    endAFittingTypeId: input.endA?.fittingTypeId ?? null,
    endBFittingTypeId: input.endB?.fittingTypeId ?? null,
    endACrimpMm: input.endA?.crimpDiameter ?? null,
    endBCrimpMm: input.endB?.crimpDiameter ?? null,
    builtOn: input.builtOn,
    builtOnEstimated: input.builtOnEstimated,
    builder: input.builder,
    cost: input.cost,
    status: 'built',
    siteId: input.siteId,
    storeLocation: input.storeLocation,
    positionId: null,
    notes: input.note,
  });
  await addEvent(ctx, manager, actor, assembly, 'build', { occurredAt: `${input.builtOn}T12:00:00Z`, occurredAtEstimated: input.builtOnEstimated, note: input.note }, { positionId: null });
  await recordAudit(manager, { actorId: actor.id, action: 'assembly.built', entityType: 'assembly', entityId: assembly.id, siteId: assembly.siteId, after: assembly });
  return assembly;
}

export async function recordProofTest(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: ProofTestInput): Promise<Assembly> {
  const assembly = await lockAssembly(manager, actor, id);
  requireStatus(assembly, 'proof-tested', ['built', 'in_stock', 'removed']);
  const construction = await manager.getRepository(Construction).findOneByOrFail({ id: assembly.constructionId });
  const requiredKpa = input.requiredPressure ?? (construction.burstPressureKpa != null ? defaultProofTestPressureKpa(construction.burstPressureKpa) : null);
  if (requiredKpa == null) {
    throw new ValidationError('The construction has no burst pressure: enter the required test pressure', 'requiredPressure');
  }
  const event = await addEvent(ctx, manager, actor, assembly, 'proof_test', { occurredAt: `${input.testedOn}T12:00:00Z`, note: input.note }, {
    data: { medium: input.medium, requiredPressureKpa: requiredKpa, heldPressureKpa: input.heldPressure, holdSeconds: input.holdSeconds, result: input.result, tester: input.tester },
  });
  const proofTest: ProofTestRecord = {
    eventId: event.id,
    testedOn: input.testedOn,
    medium: input.medium,
    requiredPressureKpa: requiredKpa,
    heldPressureKpa: input.heldPressure,
    holdSeconds: input.holdSeconds,
    result: input.result,
    tester: input.tester,
  };
  const passedAtPressure = input.result === 'pass' && input.heldPressure >= requiredKpa * (1 - 1e-9);
  const status: AssemblyStatus = assembly.status === 'built' && passedAtPressure ? 'in_stock' : assembly.status;
  await manager.getRepository(Assembly).update({ id }, { proofTest, status });
  await recordAudit(manager, { actorId: actor.id, action: 'assembly.proof_tested', entityType: 'assembly', entityId: id, siteId: assembly.siteId, after: proofTest });
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

// ── Install, with the selection checks ─────────────────────────────────────────────────────────

/** The checks refused the install: the answer carries every result so the screen can show why. */
export class ChecksFailedError extends AppError {
  constructor(
    message: string,
    readonly results: CheckResult[],
    readonly overridable: boolean,
  ) {
    super(409, 'checks_failed', message);
  }

  override details() {
    return { results: this.results, overridable: this.overridable };
  }
}

async function recordOverrides(
  ctx: AppContext,
  manager: EntityManager,
  actor: Actor,
  assembly: Assembly,
  position: Position,
  override: OverrideInput,
  checks: SelectionCheckCode[],
  at: Date = ctx.clock.now(),
) {
  for (const check of checks) {
    await manager.getRepository(CheckOverride).insert({
      assemblyId: assembly.id,
      positionId: position.id,
      checkCode: check,
      reason: override.reason,
      reviewOn: override.reviewOn,
      actorId: actor.id,
      createdAt: at,
    });
  }
  await addEvent(ctx, manager, actor, assembly, 'override', { note: override.reason, occurredAt: at.toISOString() }, { positionId: position.id, siteId: position.siteId, data: { checks, reviewOn: override.reviewOn } });
  await recordAudit(manager, { actorId: actor.id, action: 'assembly.check_overridden', entityType: 'assembly', entityId: assembly.id, siteId: position.siteId, after: { checks, reason: override.reason, reviewOn: override.reviewOn, positionId: position.id } });
}

/**
 * Decides whether failed checks may be passed: never for allowable pressure or the proof test;
 * for the others only with an override, given by a role that may override, covering every fail.
 */
function assertChecksAllowInstall(actor: Actor, results: CheckResult[], override: OverrideInput | undefined): SelectionCheckCode[] {
  const fails = results.filter((r) => r.outcome === 'fail');
  if (fails.length === 0) return [];
  const hard = fails.filter((r) => !r.overridable);
  if (hard.length) {
    throw new ChecksFailedError(
      `${hard.map((r) => r.sentence).join(' ')} This cannot be overridden: change the position's design conditions (audited) or record a new proof test.`,
      results,
      false,
    );
  }
  if (!override) {
    throw new ChecksFailedError(`${fails.map((r) => r.sentence).join(' ')} A reliability engineer or administrator may accept this with a reason and a review date.`, results, true);
  }
  if (!roleMay(actor.role, 'checks.override')) {
    throw new ChecksFailedError('Only a reliability engineer or administrator can accept a failed check.', results, true);
  }
  const missing = fails.filter((r) => !override.checks.includes(r.check));
  if (missing.length) {
    throw new ChecksFailedError(`The override does not name every failed check: ${missing.map((r) => r.check).join(', ')}.`, results, true);
  }
  return fails.map((r) => r.check);
}

async function installInto(ctx: AppContext, manager: EntityManager, actor: Actor, assembly: Assembly, position: Position, input: InstallInput | ReplaceInput): Promise<void> {
  if (position.archivedAt) throw new ConflictError('position_archived', `Position ${position.code} is archived`);
  const occupied: Array<{ number: string }> = await manager.query(
    `SELECT number FROM assemblies WHERE position_id = $1 AND status IN ('installed', 'tagged_out') AND id <> $2`,
    [position.id, assembly.id],
  );
  if (occupied[0]) {
    throw new ConflictError('position_occupied', `Position ${position.code} already holds assembly ${occupied[0].number}. Replace it instead, or remove it first.`);
  }
  const at = input.occurredAt ? new Date(input.occurredAt) : ctx.clock.now();
  const candidate = Object.assign(new Assembly(), assembly, { installedAt: at, positionId: position.id });
  const context = await loadCheckContext(manager, candidate, position);
  const summary = runChecks(context, at);
  const overridden = assertChecksAllowInstall(actor, summary.results, input.override);
  const crossSite = assembly.siteId !== position.siteId;
  await manager.getRepository(Assembly).update(
    { id: assembly.id },
    { status: 'installed', positionId: position.id, siteId: position.siteId, installedAt: at, installedAtEstimated: input.occurredAtEstimated ?? false, lastInspectedAt: null, storeLocation: null },
  );
  const installed = await manager.getRepository(Assembly).findOneByOrFail({ id: assembly.id });
  await addEvent(ctx, manager, actor, installed, 'install', input, {
    positionId: position.id,
    siteId: position.siteId,
    data: { checkOutcome: summary.outcome, ...(crossSite ? { crossSite: true, fromSiteId: assembly.siteId, toSiteId: position.siteId } : {}) },
  });
  if (overridden.length) await recordOverrides(ctx, manager, actor, installed, position, input.override!, overridden, at);
  await recordHourMeter(manager, position, input.hourMeterHours, at);
  await refreshStoredOutcome(manager, { ...context, assembly: installed }, ctx.clock.now());
  await recordAudit(manager, {
    actorId: actor.id,
    action: crossSite ? 'assembly.installed_from_other_site' : 'assembly.installed',
    entityType: 'assembly',
    entityId: assembly.id,
    siteId: position.siteId,
    before: { status: assembly.status, siteId: assembly.siteId, positionId: null },
    after: { status: 'installed', siteId: position.siteId, positionId: position.id },
  });
}

export async function installAssembly(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: InstallInput): Promise<Assembly> {
  const position = await lockPosition(manager, actor, input.positionId);
  const assembly = await lockAssembly(manager, actor, id);
  requireStatus(assembly, 'installed', ['in_stock']);
  await installInto(ctx, manager, actor, assembly, position, input);
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

// ── Removal, replacement, tag-out ─────────────────────────────────────────────────────────────

/** How a removal reason counts in life data: the plant's mapping, or the default. */
export async function lifeOutcomeOf(manager: EntityManager, reason: RemovalReason): Promise<LifeOutcome> {
  const [row] = await manager.query(`SELECT value FROM app_settings WHERE key = 'removal_outcomes'`);
  const mapping = (row?.value ?? {}) as Partial<Record<RemovalReason, LifeOutcome>>;
  return mapping[reason] ?? defaultLifeOutcome(reason);
}

async function removeFrom(ctx: AppContext, manager: EntityManager, actor: Actor, assembly: Assembly, input: RemoveInput | ReplaceInput): Promise<Position> {
  requireStatus(assembly, 'removed', ['installed', 'tagged_out']);
  const position = await manager.getRepository(Position).findOneByOrFail({ id: assembly.positionId! });
  const at = input.occurredAt ? new Date(input.occurredAt) : ctx.clock.now();
  if (assembly.installedAt && at < assembly.installedAt) {
    throw new ValidationError('The removal cannot be before the install', 'occurredAt');
  }
  const lifeOutcome = await lifeOutcomeOf(manager, input.reason);
  await addEvent(ctx, manager, actor, assembly, 'remove', input, {
    positionId: position.id,
    data: { reason: input.reason, lifeOutcome, installedAt: assembly.installedAt?.toISOString() ?? null },
  });
  await manager.getRepository(Assembly).update({ id: assembly.id }, { status: 'removed', positionId: null, checkOutcome: null, checkResults: null, nextInspectionDue: null });
  await recordHourMeter(manager, position, input.hourMeterHours, at);
  await recordAudit(manager, {
    actorId: actor.id,
    action: 'assembly.removed',
    entityType: 'assembly',
    entityId: assembly.id,
    siteId: assembly.siteId,
    before: { status: assembly.status, positionId: position.id },
    after: { status: 'removed', reason: input.reason, lifeOutcome },
  });
  return position;
}

export async function removeAssembly(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: RemoveInput): Promise<Assembly> {
  const assembly = await lockAssembly(manager, actor, id);
  if (assembly.positionId) await lockPosition(manager, actor, assembly.positionId);
  await removeFrom(ctx, manager, actor, assembly, input);
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

/** Removes an installed assembly with a reason and installs another at the same position, in one step. */
export async function replaceAssembly(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: ReplaceInput): Promise<{ removed: Assembly; installed: Assembly }> {
  const current = await manager.getRepository(Assembly).findOneBy({ id });
  if (!current || !inScope(actor, current.siteId)) throw new NotFoundError('Assembly');
  if (!current.positionId) throw wrongStatus(current, 'replaced', ['installed', 'tagged_out']);
  // Position first, then assemblies, the same order as an install, so two replacements queue rather than deadlock.
  const position = await lockPosition(manager, actor, current.positionId);
  const old = await lockAssembly(manager, actor, id);
  if (old.positionId !== position.id) throw wrongStatus(old, 'replaced', ['installed', 'tagged_out']);
  if (input.newAssemblyId === id) throw new ValidationError('Choose a different assembly to put in', 'newAssemblyId');
  const replacement = await lockAssembly(manager, actor, input.newAssemblyId).catch(() => {
    throw new ValidationError('Choose an assembly in stock at one of your sites', 'newAssemblyId');
  });
  if (replacement.status !== 'in_stock') {
    throw new ConflictError('wrong_status', `Assembly ${replacement.number} is ${replacement.status.replace('_', ' ')}, not in stock. Choose another.`, 'newAssemblyId');
  }
  await removeFrom(ctx, manager, actor, old, input);
  await installInto(ctx, manager, actor, replacement, position, input);
  return {
    removed: await manager.getRepository(Assembly).findOneByOrFail({ id }),
    installed: await manager.getRepository(Assembly).findOneByOrFail({ id: replacement.id }),
  };
}

export async function tagOutAssembly(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: TagOutInput): Promise<Assembly> {
  const assembly = await lockAssembly(manager, actor, id);
  requireStatus(assembly, 'tagged out', ['installed']);
  await addEvent(ctx, manager, actor, assembly, 'tag_out', input);
  await manager.getRepository(Assembly).update({ id }, { status: 'tagged_out' });
  await recordAudit(manager, { actorId: actor.id, action: 'assembly.tagged_out', entityType: 'assembly', entityId: id, siteId: assembly.siteId, before: { status: assembly.status }, after: { status: 'tagged_out', note: input.note } });
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

/** Back into stock after a removal: only with an inspection note and a proof test passed since it came out. */
export async function returnToStock(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: ReturnToStockInput): Promise<Assembly> {
  const assembly = await lockAssembly(manager, actor, id);
  requireStatus(assembly, 'returned to stock', ['removed']);
  const siteId = input.siteId ?? assembly.siteId;
  if (!inScope(actor, siteId)) throw new NotFoundError('Site');
  const [removal] = await manager.query(`SELECT occurred_at AS "at" FROM assembly_events WHERE assembly_id = $1 AND kind = 'remove' ORDER BY occurred_at DESC LIMIT 1`, [id]);
  const test = assembly.proofTest;
  const removedOn = removal ? (removal.at as Date).toISOString().slice(0, 10) : null;
  if (!test || test.result !== 'pass' || (removedOn && test.testedOn < removedOn)) {
    throw new ConflictError('retest_required', 'Record a passed proof test made since the removal before it goes back into stock.');
  }
  const crossSite = siteId !== assembly.siteId;
  await addEvent(ctx, manager, actor, assembly, 'return_to_stock', { ...input, note: input.inspectionNote }, {
    positionId: null,
    siteId,
    data: crossSite ? { crossSite: true, fromSiteId: assembly.siteId, toSiteId: siteId } : {},
  });
  await manager.getRepository(Assembly).update({ id }, { status: 'in_stock', siteId, storeLocation: input.storeLocation });
  await recordAudit(manager, { actorId: actor.id, action: crossSite ? 'assembly.moved_to_other_site' : 'assembly.returned_to_stock', entityType: 'assembly', entityId: id, siteId, before: { status: 'removed', siteId: assembly.siteId }, after: { status: 'in_stock', siteId } });
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

export async function scrapAssembly(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: ScrapInput): Promise<Assembly> {
  const assembly = await lockAssembly(manager, actor, id);
  requireStatus(assembly, 'scrapped', ['built', 'in_stock', 'removed']);
  await addEvent(ctx, manager, actor, assembly, 'scrap', input, { positionId: null });
  await manager.getRepository(Assembly).update({ id }, { status: 'scrapped' });
  await recordAudit(manager, { actorId: actor.id, action: 'assembly.scrapped', entityType: 'assembly', entityId: id, siteId: assembly.siteId, before: { status: assembly.status }, after: { status: 'scrapped', note: input.note } });
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

/** Accepts failed checks of an installed assembly (after a change of its inputs) with a reason and review date. */
export async function overrideChecks(ctx: AppContext, manager: EntityManager, actor: Actor, id: string, input: OverrideInput): Promise<Assembly> {
  const assembly = await lockAssembly(manager, actor, id);
  requireStatus(assembly, 'overridden', ['installed', 'tagged_out']);
  const position = await manager.getRepository(Position).findOneByOrFail({ id: assembly.positionId! });
  const context = await loadCheckContext(manager, assembly, position);
  const results = runChecks(context, ctx.clock.now()).results;
  const named = results.filter((r) => input.checks.includes(r.check));
  const notFailing = named.filter((r) => r.outcome !== 'fail');
  if (notFailing.length) throw new ValidationError(`These checks do not fail: ${notFailing.map((r) => r.check).join(', ')}`, 'checks');
  const hard = named.filter((r) => !r.overridable);
  if (hard.length) {
    throw new ChecksFailedError(`${hard.map((r) => r.sentence).join(' ')} This cannot be overridden: change the position's design conditions (audited) or record a new proof test.`, results, false);
  }
  await recordOverrides(ctx, manager, actor, assembly, position, input, input.checks);
  await refreshStoredOutcome(manager, context, ctx.clock.now());
  return manager.getRepository(Assembly).findOneByOrFail({ id });
}

export { REMOVAL_CAUTIONS };
