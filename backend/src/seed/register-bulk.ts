import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { defaultProofTestPressureKpa } from '../../../shared/src/checks/selection-checks.js';
import type { AssemblyStatus, EventKind, ProofTestRecord } from '../../../shared/src/schemas/assemblies.schema.js';
import type { ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { defaultLifeOutcome } from '../../../shared/src/services/removal-reasons.js';
import { tagCodeForSerial } from '../../../shared/src/tags/tag-code.js';
import { Assembly, Construction, FittingType, Position } from '../entities/index.js';
import { runChecks } from '../services/assembly-checks.service.js';
import type { AssemblyPlan, AssemblyStep } from './register-plan.js';

// The demo's past written in bulk: assemblies with every step they took (built, proof-tested,
// fitted, inspected, removed, re-tested, scrapped), as multi-row INSERTs with the same columns and
// the same `data` the lifecycle functions write, so the register, the events and the life data
// read them as if each step had been taken through the API. The installs of the hoses in place at
// the anchor are left to the lifecycle functions; their inspections since then go in afterwards
// the same way, since no lifecycle function records inspections.

/** What the bulk writer needs to turn codes into rows: ids, and the catalogue rows the checks read. */
export interface BulkContext {
  siteId: (code: string) => string;
  positions: Map<string, Position>;
  constructions: Map<string, Construction>;
  fittings: Map<string, FittingType>;
  /** Service settings by `${siteId}:${serviceCode}`. */
  services: Map<string, ServiceSettings>;
  /** Who recorded what happened at each site: its technicians, in a fixed order. */
  recorders: Map<string, string[]>;
  fallbackActorId: string;
  /** When records began: the register was set up then, so anything earlier was recorded that day. */
  recordsBegan: Date;
  anchor: Date;
}

interface EventRow {
  id: string;
  assemblyId: string;
  positionId: string | null;
  siteId: string;
  kind: EventKind;
  occurredAt: string;
  occurredAtEstimated: boolean;
  recordedAt: string;
  actorId: string;
  workOrder: string | null;
  hourMeterHours: number | null;
  note: string | null;
  data: Record<string, unknown>;
}

const EVENT_COLUMNS: ReadonlyArray<[string, string]> = [
  ['id', 'uuid'], ['assembly_id', 'uuid'], ['position_id', 'uuid'], ['site_id', 'uuid'], ['kind', 'text'], ['occurred_at', 'timestamptz'],
  ['occurred_at_estimated', 'boolean'], ['recorded_at', 'timestamptz'], ['actor_id', 'uuid'], ['work_order', 'text'], ['hour_meter_hours', 'double precision'],
  ['note', 'text'], ['data', 'jsonb'],
];

const ASSEMBLY_COLUMNS: ReadonlyArray<[string, string]> = [
  ['id', 'uuid'], ['number', 'text'], ['construction_id', 'uuid'], ['hose_batch', 'text'], ['hose_manufactured_on', 'date'], ['overall_length_mm', 'double precision'],
  ['cut_length_mm', 'double precision'], ['end_a_fitting_type_id', 'uuid'], ['end_b_fitting_type_id', 'uuid'], ['end_a_crimp_mm', 'double precision'],
  ['end_b_crimp_mm', 'double precision'], ['built_on', 'date'], ['built_on_estimated', 'boolean'], ['builder', 'text'], ['cost', 'double precision'], ['status', 'text'],
  ['site_id', 'uuid'], ['store_location', 'text'], ['position_id', 'uuid'], ['installed_at', 'timestamptz'], ['installed_at_estimated', 'boolean'],
  ['predates_records', 'boolean'], ['proof_test', 'jsonb'], ['check_outcome', 'text'], ['check_results', 'jsonb'], ['last_inspected_at', 'timestamptz'],
  ['next_inspection_due', 'date'], ['notes', 'text'], ['version', 'integer'],
];

/** Inserts rows in as few statements as the parameter limit allows, each value cast to its column's type. */
async function insertRows(manager: EntityManager, table: string, columns: ReadonlyArray<[string, string]>, rows: unknown[][]): Promise<void> {
  const perStatement = Math.floor(60_000 / columns.length);
  for (let from = 0; from < rows.length; from += perStatement) {
    const params: unknown[] = [];
    const values = rows.slice(from, from + perStatement).map(
      (row) => `(${row.map((value, i) => `$${params.push(value)}::${columns[i]![1]}`).join(', ')})`,
    );
    await manager.query(`INSERT INTO ${table} (${columns.map(([name]) => name).join(', ')}) VALUES ${values.join(', ')}`, params);
  }
}

async function insertEvents(manager: EntityManager, events: EventRow[]): Promise<void> {
  await insertRows(
    manager,
    'assembly_events',
    EVENT_COLUMNS,
    events.map((e) => [
      e.id, e.assemblyId, e.positionId, e.siteId, e.kind, e.occurredAt, e.occurredAtEstimated, e.recordedAt, e.actorId, e.workOrder, e.hourMeterHours, e.note,
      JSON.stringify(e.data),
    ]),
  );
}

/** Steps take effect in this order when they share a moment. */
const STEP_ORDER: Record<AssemblyStep['kind'], number> = { proof_test: 1, remove: 2, scrap: 3, return_to_stock: 4, install: 5, inspection: 6, tag_out: 7 };

/** When a step happened, as an ISO time. */
export function stepAtOf(step: AssemblyStep): string {
  return step.kind === 'proof_test' ? `${step.testedOn}T12:00:00.000Z` : step.at;
}

/** An assembly's steps in the order they happened. */
export function stepsInOrder(plan: AssemblyPlan): AssemblyStep[] {
  return plan.steps
    .map((step, i) => ({ step, i, at: Date.parse(stepAtOf(step)) }))
    .sort((a, b) => a.at - b.at || STEP_ORDER[a.step.kind] - STEP_ORDER[b.step.kind] || a.i - b.i)
    .map((s) => s.step);
}

/** Who recorded an event, and when: one of the site's technicians, soon after it happened (or on the day records began). */
function recorder(context: BulkContext, siteId: string, ref: number, index: number, occurredAt: string): { actorId: string; recordedAt: string } {
  const people = context.recorders.get(siteId) ?? [];
  const actorId = people.length ? people[(ref * 7 + index * 3) % people.length]! : context.fallbackActorId;
  const base = Math.max(Date.parse(occurredAt), context.recordsBegan.getTime());
  return { actorId, recordedAt: new Date(Math.min(base + 25 * 60_000, context.anchor.getTime())).toISOString() };
}

/** An inspection step as the event an inspection service would write. */
function inspectionEvent(context: BulkContext, plan: AssemblyPlan, assemblyId: string, step: Extract<AssemblyStep, { kind: 'inspection' }>, index: number): EventRow {
  const position = context.positions.get(step.positionCode)!;
  return {
    id: randomUUID(),
    assemblyId,
    positionId: position.id,
    siteId: position.siteId,
    kind: 'inspection',
    occurredAt: step.at,
    occurredAtEstimated: false,
    ...recorder(context, position.siteId, plan.ref, index, step.at),
    workOrder: null,
    hourMeterHours: step.hourMeterHours,
    note: step.note,
    data: { result: step.result, findings: step.findings },
  };
}

/** The index of an assembly's last install among its ordered steps, or -1. */
export function lastInstallIndex(steps: readonly AssemblyStep[]): number {
  return steps.map((s) => s.kind).lastIndexOf('install');
}

/**
 * Writes every assembly of the plan in bulk, each with its events: the whole story of one not in
 * a position at the anchor, and the story up to its last install of one that is (the lifecycle
 * functions install it). Returns the new ids by plan ref. An install whose checks would have
 * failed is a mistake in the plan: nothing was installed against a failed check but the one
 * accepted at the anchor, and that one is left to the lifecycle functions.
 */
export async function writeAssemblies(manager: EntityManager, context: BulkContext, plans: readonly AssemblyPlan[], inPlace: (plan: AssemblyPlan) => boolean): Promise<Map<number, string>> {
  const ordered = [...plans].sort((a, b) => a.builtOn.localeCompare(b.builtOn) || a.ref - b.ref);
  const serials: Array<{ serial: number }> = await manager.query(`SELECT nextval('assembly_serial_seq')::int AS serial FROM generate_series(1, $1)`, [ordered.length]);
  const numbers = serials.map((s) => s.serial).sort((a, b) => a - b);
  const assemblyRows: unknown[][] = [];
  const events: EventRow[] = [];
  const ids = new Map<number, string>();

  ordered.forEach((plan, n) => {
    const id = randomUUID();
    ids.set(plan.ref, id);
    const steps = stepsInOrder(plan);
    const partial = inPlace(plan);
    const written = partial ? steps.slice(0, lastInstallIndex(steps)) : steps;
    const expected: AssemblyStatus = partial ? 'in_stock' : plan.status;
    const construction = context.constructions.get(plan.constructionCode)!;
    const endA = context.fittings.get(plan.endA.fittingCode)!;
    const endB = context.fittings.get(plan.endB.fittingCode)!;
    let status: AssemblyStatus = 'built';
    let siteId = context.siteId(plan.siteCode);
    let positionId: string | null = null;
    let storeLocation = plan.storeLocation;
    let installedAt: string | null = null;
    let installedAtEstimated = false;
    let lastInspectedAt: string | null = null;
    let proofTest: ProofTestRecord | null = null;
    let version = 1;
    const event = (kind: EventKind, occurredAt: string, fields: Partial<EventRow> = {}) => {
      const row: EventRow = {
        id: randomUUID(), assemblyId: id, positionId, siteId, kind, occurredAt, occurredAtEstimated: false,
        ...recorder(context, fields.siteId ?? siteId, plan.ref, events.length, occurredAt),
        workOrder: null, hourMeterHours: null, note: null, data: {}, ...fields,
      };
      events.push(row);
      return row;
    };

    let predatesRecords = false;
    event('build', `${plan.builtOn}T12:00:00.000Z`, { positionId: null, occurredAtEstimated: plan.builtOnEstimated, note: plan.note });
    for (const step of written) {
      version += 1;
      switch (step.kind) {
        case 'proof_test': {
          const requiredPressureKpa = defaultProofTestPressureKpa(construction.burstPressureKpa!);
          const data = { medium: step.medium, requiredPressureKpa, heldPressureKpa: step.heldPressureKpa, holdSeconds: step.holdSeconds, result: step.result, tester: step.tester };
          const row = event('proof_test', `${step.testedOn}T12:00:00.000Z`, { note: step.note, data });
          const { medium, heldPressureKpa, holdSeconds, result, tester } = data;
          proofTest = { eventId: row.id, testedOn: step.testedOn, medium, requiredPressureKpa, heldPressureKpa, holdSeconds, result, tester };
          if (status === 'built' && result === 'pass' && heldPressureKpa >= requiredPressureKpa * (1 - 1e-9)) status = 'in_stock';
          break;
        }
        case 'install': {
          const position = context.positions.get(step.positionCode)!;
          const candidate = Object.assign(new Assembly(), {
            id, constructionId: construction.id, endAFittingTypeId: endA.id, endBFittingTypeId: endB.id, hoseManufacturedOn: plan.hoseManufacturedOn,
            builtOn: plan.builtOn, installedAt: new Date(step.at), positionId: position.id, proofTest,
          });
          const summary = runChecks(
            { assembly: candidate, position, construction, fittings: { endA, endB }, service: context.services.get(`${position.siteId}:${position.serviceCode}`) ?? null },
            new Date(step.at),
          );
          if (status !== 'in_stock' || summary.outcome === 'fail') {
            throw new Error(`The demo's past installs assembly ${plan.ref} at ${step.positionCode} on ${step.at} while ${status}, checks ${summary.outcome}`);
          }
          [status, positionId, siteId, installedAt, installedAtEstimated, lastInspectedAt, storeLocation] = ['installed', position.id, position.siteId, step.at, step.estimated, null, null];
          event('install', step.at, {
            occurredAtEstimated: step.estimated, workOrder: step.workOrder, hourMeterHours: step.hourMeterHours, note: step.note, data: { checkOutcome: summary.outcome },
          });
          // The register marks a hose from before records began after its install, as the lifecycle does.
          if (step.estimated) [predatesRecords, version] = [true, version + 1];
          break;
        }
        case 'inspection':
          events.push(inspectionEvent(context, plan, id, step, events.length));
          lastInspectedAt = step.at;
          break;
        case 'tag_out':
          event('tag_out', step.at, { workOrder: step.workOrder, note: step.note });
          status = 'tagged_out';
          break;
        case 'remove':
          event('remove', step.at, {
            workOrder: step.workOrder, hourMeterHours: step.hourMeterHours, note: step.note,
            data: { reason: step.reason, lifeOutcome: defaultLifeOutcome(step.reason), installedAt },
          });
          [status, positionId] = ['removed', null];
          break;
        case 'scrap':
          event('scrap', step.at, { positionId: null, note: step.note });
          status = 'scrapped';
          break;
        case 'return_to_stock':
          event('return_to_stock', step.at, { positionId: null, note: step.inspectionNote });
          [status, storeLocation] = ['in_stock', step.storeLocation];
          break;
      }
    }
    if (status !== expected) throw new Error(`The demo's past leaves assembly ${plan.ref} ${status}, not ${expected}`);
    assemblyRows.push([
      id, tagCodeForSerial(numbers[n]!), construction.id, plan.hoseBatch, plan.hoseManufacturedOn, plan.overallLengthMm, plan.cutLengthMm, endA.id, endB.id,
      plan.endA.crimpMm, plan.endB.crimpMm, plan.builtOn, plan.builtOnEstimated, plan.builder, plan.cost, status, siteId, storeLocation, positionId, installedAt,
      installedAtEstimated, predatesRecords, proofTest ? JSON.stringify(proofTest) : null, null, null, lastInspectedAt, null, plan.note, version,
    ]);
  });
  await insertRows(manager, 'assemblies', ASSEMBLY_COLUMNS, assemblyRows);
  await insertEvents(manager, events);
  return ids;
}

/**
 * Writes the inspections since their last install of assemblies the lifecycle functions installed,
 * and sets each one's `last_inspected_at` to the latest.
 */
export async function writeInspections(manager: EntityManager, context: BulkContext, plans: ReadonlyArray<{ plan: AssemblyPlan; id: string }>): Promise<void> {
  const events: EventRow[] = [];
  const lastInspected: Array<[string, string]> = [];
  for (const { plan, id } of plans) {
    const steps = stepsInOrder(plan);
    let last: string | null = null;
    for (const step of steps.slice(lastInstallIndex(steps))) {
      if (step.kind !== 'inspection') continue;
      events.push(inspectionEvent(context, plan, id, step, events.length));
      last = step.at;
    }
    if (last) lastInspected.push([id, last]);
  }
  await insertEvents(manager, events);
  if (lastInspected.length === 0) return;
  const params = lastInspected.flat();
  const values = lastInspected.map((_, i) => `($${2 * i + 1}::uuid, $${2 * i + 2}::timestamptz)`).join(', ');
  await manager.query(
    `UPDATE assemblies a SET last_inspected_at = v.at, version = a.version + 1 FROM (VALUES ${values}) AS v(id, at) WHERE a.id = v.id`,
    params,
  );
}
