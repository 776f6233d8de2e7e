import { once } from 'node:events';
import type { Response } from 'express';
import type { QueryRunner } from 'typeorm';
import { DEFAULT_PREFERENCES, type Preferences } from '../../../shared/src/schemas/auth.schema.js';
import { ASSEMBLY_STATUS_LABELS, type AssemblyStatus, type ProofTestRecord } from '../../../shared/src/schemas/assemblies.schema.js';
import { EXPORT_COLUMNS, type AssemblyExportQuery } from '../../../shared/src/schemas/csv.schema.js';
import { serviceByCode, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { sizeLabel } from '../../../shared/src/sizes/nominal-sizes.js';
import { formatTagCode } from '../../../shared/src/tags/tag-code.js';
import { fromKpa, fromMm } from '../../../shared/src/units/units.js';
import type { AppContext } from '../context.js';
import { Assembly, Construction, FittingType, Position } from '../entities/index.js';
import type { Actor } from '../policies/actor.js';
import { allowablePressureKpa, serviceSettingsAt } from './assembly-checks.service.js';
import { REGISTER_SORTS, registerWhere } from './assembly-queries.service.js';

// The register as a CSV file: the rows of the register's view (the same filters and scoping as
// GET /api/assemblies, in the same order, without paging), read through a cursor a few thousand
// at a time and written out as they come, so a large register never sits in memory.

/** Rows fetched from the cursor at a time. */
export const EXPORT_BATCH = 2000;


const EXPORT_SQL = `SELECT a.number, a.status, a.site_id AS "siteId", s.name AS "siteName", s.time_zone AS "timeZone",
    ar.name AS "areaName", e.asset_number AS "assetNumber", e.name AS "equipmentName",
    p.id AS "positionId", p.code AS "positionCode", p.name AS "positionName", p.service_code AS "serviceCode", p.medium_code AS "mediumCode",
    p.max_operating_pressure_kpa AS "maxOperatingPressureKpa", p.min_temp_c AS "positionMinTempC", p.max_temp_c AS "positionMaxTempC",
    p.size_code AS "positionSizeCode", p.suction_duty AS "suctionDuty", p.routed_bend_radius_mm AS "routedBendRadiusMm",
    c.id AS "constructionId", c.code AS "constructionCode", c.name AS "constructionName", c.size_code AS "sizeCode",
    a.end_a_fitting_type_id AS "endAFittingTypeId", a.end_b_fitting_type_id AS "endBFittingTypeId",
    a.check_outcome AS "checkOutcome",
    EXISTS (SELECT 1 FROM check_overrides o WHERE o.assembly_id = a.id AND o.position_id = a.position_id) AS overridden,
    a.next_inspection_due::text AS "nextInspectionDue", a.installed_at AS "installedAt", a.installed_at_estimated AS "installedAtEstimated",
    a.predates_records AS "predatesRecords", a.overall_length_mm AS "overallLengthMm", a.built_on::text AS "builtOn",
    a.hose_manufactured_on::text AS "hoseManufacturedOn", a.hose_batch AS "hoseBatch", a.store_location AS "storeLocation", a.proof_test AS "proofTest"
  FROM assemblies a
  JOIN sites s ON s.id = a.site_id
  JOIN constructions c ON c.id = a.construction_id
  LEFT JOIN positions p ON p.id = a.position_id
  LEFT JOIN equipment e ON e.id = p.equipment_id
  LEFT JOIN areas ar ON ar.id = e.area_id`;

interface ExportRow {
  number: string;
  status: AssemblyStatus;
  siteId: string;
  siteName: string;
  timeZone: string;
  areaName: string | null;
  assetNumber: string | null;
  equipmentName: string | null;
  positionId: string | null;
  positionCode: string | null;
  positionName: string | null;
  serviceCode: string | null;
  mediumCode: string | null;
  maxOperatingPressureKpa: number | null;
  positionMinTempC: number | null;
  positionMaxTempC: number | null;
  positionSizeCode: string | null;
  suctionDuty: boolean | null;
  routedBendRadiusMm: number | null;
  constructionId: string;
  constructionCode: string;
  constructionName: string;
  sizeCode: string;
  endAFittingTypeId: string | null;
  endBFittingTypeId: string | null;
  checkOutcome: string | null;
  overridden: boolean;
  nextInspectionDue: string | null;
  installedAt: Date | null;
  installedAtEstimated: boolean;
  predatesRecords: boolean;
  overallLengthMm: number | null;
  builtOn: string | null;
  hoseManufacturedOn: string | null;
  hoseBatch: string | null;
  storeLocation: string | null;
  proofTest: ProofTestRecord | null;
}

const PLAIN_NUMBER = /^-?\d+(\.\d+)?$/;

/**
 * A cell as a spreadsheet will read it safely: one starting with =, +, -, @, a tab or a carriage
 * return would be taken as a formula, so it gets a leading apostrophe; a plain number such as -10
 * stays a number. Quoted when it holds the separator, a quote or a line break.
 */
export function csvCell(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return '';
  let text = typeof value === 'boolean' ? (value ? 'yes' : 'no') : String(value);
  if (/^[=+\-@\t\r]/.test(text) && !PLAIN_NUMBER.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** A stored quantity in the reader's unit, to four decimal places: enough for any gauge. */
const round = (value: number | null) => (value == null ? null : Number(value.toFixed(4)));

const dayFormats = new Map<string, Intl.DateTimeFormat>();
/** The calendar day of an instant at the site (YYYY-MM-DD). */
function dayAt(at: Date, timeZone: string): string {
  let format = dayFormats.get(timeZone);
  if (!format) {
    try {
      format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    } catch {
      format = new Intl.DateTimeFormat('en-CA', { timeZone: 'UTC', year: 'numeric', month: '2-digit', day: '2-digit' });
    }
    dayFormats.set(timeZone, format);
  }
  return format.format(at);
}

/** The header line: quantities carry the reader's unit, e.g. allowable_pressure_psi. */
export function exportHeader(prefs: Preferences): string[] {
  return EXPORT_COLUMNS.map((c) => {
    if (!('quantity' in c)) return c.key;
    return `${c.key}_${(c.quantity === 'pressure' ? prefs.pressureUnit : prefs.lengthUnit).toLowerCase()}`;
  });
}

interface Catalogue {
  constructions: Map<string, Construction>;
  fittings: Map<string, FittingType>;
  services: Map<string, ServiceSettings | null>;
}

/** The allowable pressure as the assembly's page shows it, kPa: at its position, or of the hose and fittings alone. */
async function allowableOf(runner: QueryRunner, catalogue: Catalogue, r: ExportRow): Promise<number | null> {
  const construction = catalogue.constructions.get(r.constructionId);
  if (!construction) return null;
  const fitting = (id: string | null) => (id ? (catalogue.fittings.get(id) ?? null) : null);
  const endA = fitting(r.endAFittingTypeId);
  const endB = fitting(r.endBFittingTypeId);
  if (!r.positionId || !r.serviceCode) {
    const limits = [construction.workingPressureKpa, ...[r.endAFittingTypeId, r.endBFittingTypeId].filter(Boolean).map((id) => fitting(id)?.sizes.find((s) => s.sizeCode === construction.sizeCode)?.ratingKpa ?? null)];
    return limits.some((l) => l == null) ? null : Math.min(...(limits as number[]));
  }
  const key = `${r.siteId} ${r.serviceCode}`;
  if (!catalogue.services.has(key)) catalogue.services.set(key, await serviceSettingsAt(runner.manager, r.siteId, r.serviceCode));
  const position = Object.assign(new Position(), {
    id: r.positionId,
    siteId: r.siteId,
    serviceCode: r.serviceCode,
    mediumCode: r.mediumCode,
    maxOperatingPressureKpa: r.maxOperatingPressureKpa,
    minTempC: r.positionMinTempC,
    maxTempC: r.positionMaxTempC,
    sizeCode: r.positionSizeCode,
    suctionDuty: r.suctionDuty,
    routedBendRadiusMm: r.routedBendRadiusMm,
  });
  const assembly = Object.assign(new Assembly(), {
    constructionId: construction.id,
    endAFittingTypeId: r.endAFittingTypeId,
    endBFittingTypeId: r.endBFittingTypeId,
    hoseManufacturedOn: r.hoseManufacturedOn,
    builtOn: r.builtOn,
    installedAt: r.installedAt,
    proofTest: r.proofTest,
  });
  return allowablePressureKpa({ assembly, position, construction, fittings: { endA, endB }, service: catalogue.services.get(key) ?? null });
}

async function rowCells(runner: QueryRunner, catalogue: Catalogue, prefs: Preferences, r: ExportRow): Promise<Array<string | number | boolean | null>> {
  const allowable = await allowableOf(runner, catalogue, r);
  const values: Record<(typeof EXPORT_COLUMNS)[number]['key'], string | number | boolean | null> = {
    tag_code: formatTagCode(r.number),
    status: ASSEMBLY_STATUS_LABELS[r.status] ?? r.status,
    site: r.siteName,
    area: r.areaName,
    equipment: r.assetNumber,
    equipment_name: r.equipmentName,
    position: r.positionCode,
    position_name: r.positionName,
    service: r.serviceCode ? (serviceByCode(r.serviceCode)?.name ?? r.serviceCode) : null,
    construction: r.constructionCode,
    construction_name: r.constructionName,
    size: sizeLabel(r.sizeCode, prefs.lengthUnit),
    check_outcome: r.checkOutcome,
    overridden: r.positionId ? r.overridden : null,
    next_inspection_due: r.nextInspectionDue,
    installed_on: r.installedAt ? dayAt(r.installedAt, r.timeZone) : null,
    installed_on_estimated: r.installedAt ? r.installedAtEstimated : null,
    predates_records: r.installedAt ? r.predatesRecords : null,
    allowable_pressure: round(allowable == null ? null : fromKpa(allowable, prefs.pressureUnit)),
    max_operating_pressure: round(r.maxOperatingPressureKpa == null ? null : fromKpa(r.maxOperatingPressureKpa, prefs.pressureUnit)),
    overall_length: round(r.overallLengthMm == null ? null : fromMm(r.overallLengthMm, prefs.lengthUnit)),
    built_on: r.builtOn,
    hose_batch: r.hoseBatch,
    store_location: r.storeLocation,
    proof_test_on: r.proofTest?.testedOn ?? null,
    proof_test_result: r.proofTest?.result ?? null,
  };
  return EXPORT_COLUMNS.map((c) => values[c.key]);
}

async function preferencesOf(ctx: AppContext, actor: Actor): Promise<Preferences> {
  const [row] = await ctx.ds.query(`SELECT preferences FROM users WHERE id = $1`, [actor.id]);
  return { ...DEFAULT_PREFERENCES, ...((row?.preferences as Partial<Preferences> | undefined) ?? {}) };
}

/** Streams the register's view as CSV (UTF-8 with a byte-order mark, for spreadsheets) to `res`. */
export async function streamAssemblyExport(ctx: AppContext, actor: Actor, query: AssemblyExportQuery, res: Response): Promise<void> {
  const today = ctx.clock.now().toISOString().slice(0, 10);
  const prefs = await preferencesOf(ctx, actor);
  const { sql, params } = registerWhere(actor, query, today);
  const dir = query.dir === 'desc' ? 'DESC' : 'ASC';
  const order = `${REGISTER_SORTS[query.sort]} ${dir} NULLS LAST, a.number ${dir}`;
  const catalogue: Catalogue = {
    constructions: new Map((await ctx.ds.getRepository(Construction).find()).map((c) => [c.id, c])),
    fittings: new Map((await ctx.ds.getRepository(FittingType).find()).map((f) => [f.id, f])),
    services: new Map(),
  };

  let closed = false;
  res.on('close', () => {
    closed = true;
  });
  const runner = ctx.ds.createQueryRunner();
  await runner.connect();
  let started = false;
  try {
    await runner.startTransaction();
    await runner.query(`DECLARE register_export NO SCROLL CURSOR FOR ${EXPORT_SQL} ${sql} ORDER BY ${order}`, params);
    res.status(200);
    res.set({
      'Content-Type': 'text/csv; charset=utf-8',
      'Content-Disposition': `attachment; filename="ferrule-register-${today}.csv"`,
      'Cache-Control': 'no-store',
    });
    started = true;
    res.write(`\uFEFF${exportHeader(prefs).map(csvCell).join(',')}\r\n`);
    while (!closed) {
      const rows: ExportRow[] = await runner.query(`FETCH FORWARD ${EXPORT_BATCH} FROM register_export`);
      if (rows.length === 0) break;
      let chunk = '';
      for (const r of rows) chunk += `${(await rowCells(runner, catalogue, prefs, r)).map(csvCell).join(',')}\r\n`;
      if (!res.write(chunk) && !closed) await Promise.race([once(res, 'drain'), once(res, 'close')]);
    }
    await runner.query(`CLOSE register_export`);
    await runner.commitTransaction();
    if (!closed) res.end();
  } catch (err) {
    if (runner.isTransactionActive) await runner.rollbackTransaction().catch(() => undefined);
    if (!started) throw err;
    // The header is out: all that can be done is to cut the file short, so it is not taken as complete.
    ctx.logger.error({ err }, 'register export stopped');
    res.destroy(err as Error);
  } finally {
    await runner.release();
  }
}
