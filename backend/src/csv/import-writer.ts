import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { tagCodeForSerial } from '../../../shared/src/tags/tag-code.js';
import type { ImportKind } from '../../../shared/src/schemas/csv.schema.js';
import { auditSnapshot } from '../services/audit.service.js';
import { type AssemblyRecord, type CheckedRow, type ConstructionRecord, type PositionRecord } from './import-rows.js';
import { serialOfTag } from './tag-serials.js';

/** Rows per INSERT: a few hundred keeps each statement well under PostgreSQL's 65,535 parameters. */
export const BATCH_ROWS = 500;

/** One multi-row INSERT … VALUES; `rows` are the values in the order of `columns`. */
async function insertRows(manager: EntityManager, table: string, columns: string[], rows: unknown[][], returning?: string): Promise<Array<Record<string, unknown>>> {
  if (rows.length === 0) return [];
  const params: unknown[] = [];
  const tuples = rows.map((values) => `(${values.map((v) => `$${params.push(v ?? null)}`).join(', ')})`);
  return manager.query(`INSERT INTO ${table} (${columns.map((c) => `"${c}"`).join(', ')}) VALUES ${tuples.join(', ')}${returning ? ` RETURNING ${returning}` : ''}`, params);
}

const json = (value: unknown) => (value == null ? null : JSON.stringify(value));

interface AuditRow {
  action: string;
  entityType: string;
  entityId: string;
  siteId: string | null;
  after: object;
}

async function insertAudits(manager: EntityManager, actorId: string, audits: AuditRow[]): Promise<void> {
  await insertRows(
    manager,
    'audit_entries',
    ['actor_id', 'action', 'entity_type', 'entity_id', 'site_id', 'before', 'after'],
    audits.map((a) => [actorId, a.action, a.entityType, a.entityId, a.siteId, null, json(auditSnapshot(a.after))]),
  );
}

export interface WriteContext {
  manager: EntityManager;
  actorId: string;
  jobId: string;
  kind: ImportKind;
  now: Date;
  /** Called after each batch with the rows written so far. */
  progress: (written: number) => Promise<void>;
}

const CONSTRUCTION_COLUMNS: Array<[string, keyof ConstructionRecord]> = [
  ['code', 'code'],
  ['name', 'name'],
  ['tube_compound', 'tubeCompound'],
  ['reinforcement', 'reinforcement'],
  ['cover_compound', 'coverCompound'],
  ['size_code', 'sizeCode'],
  ['working_pressure_kpa', 'workingPressureKpa'],
  ['burst_pressure_kpa', 'burstPressureKpa'],
  ['vacuum_rating_kpa', 'vacuumRatingKpa'],
  ['min_temp_c', 'minTempC'],
  ['max_temp_c', 'maxTempC'],
  ['min_bend_radius_mm', 'minBendRadiusMm'],
  ['weight_kg_per_m', 'weightKgPerM'],
  ['electrical', 'electrical'],
  ['food_contact_certified', 'foodContactCertified'],
  ['maker', 'maker'],
  ['part_number', 'partNumber'],
  ['service_life_months', 'serviceLifeMonths'],
  ['shelf_life_months', 'shelfLifeMonths'],
  ['storage_life_months', 'storageLifeMonths'],
  ['notes', 'notes'],
];

const POSITION_COLUMNS: Array<[string, keyof PositionRecord]> = [
  ['site_id', 'siteId'],
  ['equipment_id', 'equipmentId'],
  ['code', 'code'],
  ['name', 'name'],
  ['service_code', 'serviceCode'],
  ['medium_code', 'mediumCode'],
  ['max_operating_pressure_kpa', 'maxOperatingPressureKpa'],
  ['min_temp_c', 'minTempC'],
  ['max_temp_c', 'maxTempC'],
  ['size_code', 'sizeCode'],
  ['required_length_mm', 'requiredLengthMm'],
  ['end_a_connection', 'endAConnection'],
  ['end_b_connection', 'endBConnection'],
  ['suction_duty', 'suctionDuty'],
  ['routed_bend_radius_mm', 'routedBendRadiusMm'],
  ['criticality', 'criticality'],
  ['inspection_interval_days', 'inspectionIntervalDays'],
  ['notes', 'notes'],
];

async function writeSimple<T extends object>(
  w: WriteContext,
  records: T[],
  table: string,
  columns: Array<[string, keyof T]>,
  audit: (record: T, id: string) => AuditRow,
): Promise<number> {
  let written = 0;
  for (let i = 0; i < records.length; i += BATCH_ROWS) {
    const batch = records.slice(i, i + BATCH_ROWS);
    const ids = await insertRows(w.manager, table, columns.map(([c]) => c), batch.map((r) => columns.map(([, k]) => r[k])), 'id');
    await insertAudits(w.manager, w.actorId, batch.map((r, n) => audit(r, ids[n]!.id as string)));
    written += batch.length;
    await w.progress(written);
  }
  return written;
}

const ASSEMBLY_COLUMNS = [
  'id',
  'number',
  'construction_id',
  'hose_batch',
  'hose_manufactured_on',
  'overall_length_mm',
  'cut_length_mm',
  'end_a_fitting_type_id',
  'end_b_fitting_type_id',
  'end_a_crimp_mm',
  'end_b_crimp_mm',
  'built_on',
  'built_on_estimated',
  'builder',
  'cost',
  'status',
  'site_id',
  'store_location',
  'position_id',
  'installed_at',
  'installed_at_estimated',
  'predates_records',
  'proof_test',
  'check_outcome',
  'check_results',
  'next_inspection_due',
  'notes',
  'version',
];

const MIDDAY = (day: string) => `((${day})::timestamp + interval '12 hours') AT TIME ZONE 'UTC'`;

/**
 * The history of a batch of imported assemblies, made in the database from the rows just written:
 * a build event; the proof test when there is one (under the id the assembly's record points at);
 * and for a hose already in place its install event, dated when it went in and marked estimated
 * when the file says so.
 */
const EVENTS_SQL = `INSERT INTO assembly_events (id, assembly_id, position_id, site_id, kind, occurred_at, occurred_at_estimated, recorded_at, actor_id, note, data)
  SELECT gen_random_uuid(), a.id, NULL::uuid, a.site_id, 'build', ${MIDDAY('a.built_on')}, a.built_on_estimated, $2::timestamptz, $3::uuid, 'Imported from a CSV file', $4::jsonb
    FROM assemblies a WHERE a.id = ANY($1::uuid[])
  UNION ALL
  SELECT (a.proof_test->>'eventId')::uuid, a.id, NULL::uuid, a.site_id, 'proof_test', ${MIDDAY(`(a.proof_test->>'testedOn')::date`)}, false, $2, $3, NULL::text, (a.proof_test - 'eventId' - 'testedOn') || $4::jsonb
    FROM assemblies a WHERE a.id = ANY($1::uuid[]) AND a.proof_test IS NOT NULL
  UNION ALL
  SELECT gen_random_uuid(), a.id, a.position_id, a.site_id, 'install', a.installed_at, a.installed_at_estimated, $2, $3, NULL::text,
         jsonb_build_object('checkOutcome', a.check_outcome, 'predatesRecords', a.predates_records) || $4::jsonb
    FROM assemblies a WHERE a.id = ANY($1::uuid[]) AND a.position_id IS NOT NULL`;

const AUDITS_SQL = `INSERT INTO audit_entries (actor_id, action, entity_type, entity_id, site_id, before, after)
  SELECT $2::uuid, 'assembly.imported', 'assembly', a.id, a.site_id, NULL::jsonb,
         jsonb_build_object('number', a.number, 'status', a.status, 'constructionId', a.construction_id, 'positionId', a.position_id,
                            'installedAt', a.installed_at, 'predatesRecords', a.predates_records, 'importJobId', $3::text)
    FROM assemblies a WHERE a.id = ANY($1::uuid[])`;

/** Writes imported assemblies with their history. Tags the file brings are kept; the others get the next serial numbers. */
async function writeAssemblies(w: WriteContext, records: AssemblyRecord[]): Promise<number> {
  const given = records.map((r) => (r.tagCode ? serialOfTag(r.tagCode) : null)).filter((s): s is number => s !== null);
  if (given.length) {
    await w.manager.query(`SELECT setval('assembly_serial_seq', GREATEST($1::bigint, (SELECT last_value FROM assembly_serial_seq)))`, [Math.max(...given)]);
  }
  const needed = records.filter((r) => !r.tagCode).length;
  const serials: Array<{ serial: string }> = needed
    ? await w.manager.query(`SELECT nextval('assembly_serial_seq')::text AS serial FROM generate_series(1, $1::int) ORDER BY 1`, [needed])
    : [];
  let nextSerial = 0;
  const importData = json({ importJobId: w.jobId, imported: true });
  let written = 0;
  for (let i = 0; i < records.length; i += BATCH_ROWS) {
    const batch = records.slice(i, i + BATCH_ROWS);
    const ids: string[] = [];
    const assemblies = batch.map((r) => {
      const id = randomUUID();
      ids.push(id);
      const number = r.tagCode ?? tagCodeForSerial(Number(serials[nextSerial++]!.serial));
      const proofTest = r.proofTest ? { eventId: randomUUID(), ...r.proofTest } : null;
      return [
        id,
        number,
        r.constructionId,
        r.hoseBatch,
        r.hoseManufacturedOn,
        r.overallLengthMm,
        r.cutLengthMm,
        r.endAFittingTypeId,
        r.endBFittingTypeId,
        r.endACrimpMm,
        r.endBCrimpMm,
        r.builtOn,
        r.builtOnEstimated,
        r.builder,
        r.cost,
        r.status,
        r.siteId,
        r.storeLocation,
        r.positionId,
        r.installedAt,
        r.installedAtEstimated,
        r.predatesRecords,
        json(proofTest),
        r.checkOutcome,
        json(r.checkResults),
        r.nextInspectionDue,
        r.notes,
        1,
      ];
    });
    await insertRows(w.manager, 'assemblies', ASSEMBLY_COLUMNS, assemblies);
    await w.manager.query(EVENTS_SQL, [ids, w.now, w.actorId, importData]);
    await w.manager.query(AUDITS_SQL, [ids, w.actorId, w.jobId]);
    written += batch.length;
    await w.progress(written);
  }
  return written;
}

/** Writes every checked row, in the caller's transaction, and returns how many were written. */
export async function writeCheckedRows(w: WriteContext, rows: CheckedRow[], siteId: string | null): Promise<number> {
  let written: number;
  if (w.kind === 'constructions') {
    const records = rows.flatMap((r) => (r.kind === 'constructions' ? [r.record] : []));
    written = await writeSimple(w, records, 'constructions', CONSTRUCTION_COLUMNS, (r, id) => ({ action: 'construction.imported', entityType: 'construction', entityId: id, siteId: null, after: { ...r, importJobId: w.jobId } }));
  } else if (w.kind === 'positions') {
    const records = rows.flatMap((r) => (r.kind === 'positions' ? [r.record] : []));
    written = await writeSimple(w, records, 'positions', POSITION_COLUMNS, (r, id) => ({ action: 'position.imported', entityType: 'position', entityId: id, siteId: r.siteId, after: { ...r, importJobId: w.jobId } }));
  } else {
    written = await writeAssemblies(w, rows.flatMap((r) => (r.kind === 'assemblies' ? [r.record] : [])));
  }
  await insertAudits(w.manager, w.actorId, [{ action: 'import.written', entityType: 'import_job', entityId: w.jobId, siteId, after: { kind: w.kind, writtenRows: written } }]);
  return written;
}
