import type { EntityManager } from 'typeorm';
import { pressureLimits, allowablePressure, runSelectionChecks, type SelectionCheckSummary } from '../../../shared/src/checks/selection-checks.js';
import type { CheckOutcome, FittingCheckInput, SelectionCheckInput } from '../../../shared/src/checks/types.js';
import { inspectionIntervalDays } from '../../../shared/src/services/criticality.js';
import { defaultServiceSettings, serviceByCode, type ServiceSettings } from '../../../shared/src/services/service-catalogue.js';
import { Assembly, Construction, FittingType, Position, SiteService } from '../entities/index.js';

/** The inputs of the selection checks for one assembly at one position, loaded in the caller's transaction. */
export interface CheckContext {
  assembly: Assembly;
  position: Position;
  construction: Construction;
  fittings: { endA: FittingType | null; endB: FittingType | null };
  service: ServiceSettings | null;
}

export async function serviceSettingsAt(manager: EntityManager, siteId: string, serviceCode: string): Promise<ServiceSettings | null> {
  const row = await manager.getRepository(SiteService).findOneBy({ siteId, serviceCode });
  if (row) return row.settings;
  const definition = serviceByCode(serviceCode);
  return definition ? defaultServiceSettings(definition) : null;
}

export async function loadCheckContext(manager: EntityManager, assembly: Assembly, position: Position): Promise<CheckContext> {
  const construction = await manager.getRepository(Construction).findOneByOrFail({ id: assembly.constructionId });
  const ids = [assembly.endAFittingTypeId, assembly.endBFittingTypeId].filter((id): id is string => id !== null);
  const fittingRows = ids.length ? await manager.getRepository(FittingType).findBy(ids.map((id) => ({ id }))) : [];
  const byId = new Map(fittingRows.map((f) => [f.id, f]));
  return {
    assembly,
    position,
    construction,
    fittings: {
      endA: assembly.endAFittingTypeId ? (byId.get(assembly.endAFittingTypeId) ?? null) : null,
      endB: assembly.endBFittingTypeId ? (byId.get(assembly.endBFittingTypeId) ?? null) : null,
    },
    service: await serviceSettingsAt(manager, position.siteId, position.serviceCode),
  };
}

/** A fitting as the checks see it: the size of the fitting type that matches the hose, and its rating. */
function fittingInput(fitting: FittingType | null, hoseSizeCode: string): FittingCheckInput | null {
  if (!fitting) return null;
  const size = fitting.sizes.find((s) => s.sizeCode === hoseSizeCode);
  return size ? { sizeCode: size.sizeCode, ratingKpa: size.ratingKpa } : { sizeCode: fitting.sizes[0]?.sizeCode ?? null, ratingKpa: null };
}

export function checkInput(c: CheckContext): SelectionCheckInput {
  const { construction, position, assembly } = c;
  return {
    construction: {
      code: construction.code,
      tubeCompound: construction.tubeCompound,
      reinforcement: construction.reinforcement,
      coverCompound: construction.coverCompound,
      sizeCode: construction.sizeCode,
      workingPressureKpa: construction.workingPressureKpa,
      burstPressureKpa: construction.burstPressureKpa,
      vacuumRatingKpa: construction.vacuumRatingKpa,
      minTempC: construction.minTempC,
      maxTempC: construction.maxTempC,
      minBendRadiusMm: construction.minBendRadiusMm,
      electrical: construction.electrical,
      foodContactCertified: construction.foodContactCertified,
      serviceLifeMonths: construction.serviceLifeMonths,
      shelfLifeMonths: construction.shelfLifeMonths,
      storageLifeMonths: construction.storageLifeMonths,
    },
    fittings: { endA: fittingInput(c.fittings.endA, construction.sizeCode), endB: fittingInput(c.fittings.endB, construction.sizeCode) },
    position: {
      serviceCode: position.serviceCode,
      mediumCode: position.mediumCode,
      maxOperatingPressureKpa: position.maxOperatingPressureKpa,
      minTempC: position.minTempC,
      maxTempC: position.maxTempC,
      sizeCode: position.sizeCode,
      suctionDuty: position.suctionDuty,
      routedBendRadiusMm: position.routedBendRadiusMm,
    },
    service: c.service,
    assembly: {
      hoseManufacturedOn: assembly.hoseManufacturedOn,
      builtOn: assembly.builtOn,
      installedOn: assembly.installedAt?.toISOString() ?? null,
      proofTest: assembly.proofTest
        ? { result: assembly.proofTest.result, heldPressureKpa: assembly.proofTest.heldPressureKpa, requiredPressureKpa: assembly.proofTest.requiredPressureKpa }
        : null,
    },
  };
}

export function runChecks(c: CheckContext, now: Date): SelectionCheckSummary {
  return runSelectionChecks(checkInput(c), { now });
}

/** The allowable pressure of an assembly at a position, kPa, or null when a limit is unknown. */
export function allowablePressureKpa(c: CheckContext): number | null {
  const input = checkInput(c);
  return allowablePressure(pressureLimits(input, input.position.maxOperatingPressureKpa))?.pressureKpa ?? null;
}

/** The inspection interval in force at a position, days. */
export function effectiveInterval(position: Pick<Position, 'inspectionIntervalDays' | 'criticality'>, service: ServiceSettings | null): number {
  if (position.inspectionIntervalDays) return position.inspectionIntervalDays;
  return inspectionIntervalDays(service?.defaultInspectionIntervalDays ?? 90, position.criticality);
}

function addDays(date: Date, days: number): string {
  return new Date(date.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}

/** The stored outcome: a fail that a competent person accepted counts as a warning. */
function storedOutcome(summary: SelectionCheckSummary, overridden: Set<string>): CheckOutcome {
  const outcomes = summary.results.map((r) => (r.outcome === 'fail' && r.overridable && overridden.has(r.check) ? 'warn' : r.outcome));
  return outcomes.includes('fail') ? 'fail' : outcomes.includes('warn') ? 'warn' : 'pass';
}

/** Recomputes and stores the check outcome and next inspection due date of one installed assembly. */
export async function refreshStoredOutcome(manager: EntityManager, c: CheckContext, now: Date): Promise<void> {
  const summary = runChecks(c, now);
  const overrides: Array<{ check_code: string }> = await manager.query(
    `SELECT check_code FROM check_overrides WHERE assembly_id = $1 AND position_id = $2`,
    [c.assembly.id, c.position.id],
  );
  const base = c.assembly.lastInspectedAt ?? c.assembly.installedAt ?? now;
  const due = addDays(base, effectiveInterval(c.position, c.service));
  await manager.query(
    `UPDATE assemblies SET check_outcome = $2, check_results = $3, next_inspection_due = $4 WHERE id = $1`,
    [c.assembly.id, storedOutcome(summary, new Set(overrides.map((o) => o.check_code))), JSON.stringify(summary.results), due],
  );
}

/** What changed, to find the installed assemblies whose stored outcomes depend on it. */
export type CheckInputChange =
  | { assemblyIds: string[] }
  | { positionIds: string[] }
  | { constructionIds: string[] }
  | { fittingTypeIds: string[] }
  | { siteId: string; serviceCode: string };

/**
 * Recomputes the stored outcomes of every installed or tagged-out assembly that the change
 * touches, in the caller's transaction, so lists can filter and sort on them in SQL.
 */
export async function recomputeStoredOutcomes(manager: EntityManager, change: CheckInputChange, now: Date): Promise<number> {
  let where: string;
  let params: unknown[];
  if ('assemblyIds' in change) [where, params] = ['a.id = ANY($1::uuid[])', [change.assemblyIds]];
  else if ('positionIds' in change) [where, params] = ['a.position_id = ANY($1::uuid[])', [change.positionIds]];
  else if ('constructionIds' in change) [where, params] = ['a.construction_id = ANY($1::uuid[])', [change.constructionIds]];
  else if ('fittingTypeIds' in change)
    [where, params] = ['(a.end_a_fitting_type_id = ANY($1::uuid[]) OR a.end_b_fitting_type_id = ANY($1::uuid[]))', [change.fittingTypeIds]];
  else [where, params] = ['p.site_id = $1 AND p.service_code = $2', [change.siteId, change.serviceCode]];
  const rows: Array<{ id: string }> = await manager.query(
    `SELECT a.id FROM assemblies a JOIN positions p ON p.id = a.position_id
      WHERE a.status IN ('installed', 'tagged_out') AND ${where} ORDER BY a.id FOR UPDATE OF a`,
    params,
  );
  for (const { id } of rows) {
    const assembly = await manager.getRepository(Assembly).findOneByOrFail({ id });
    const position = await manager.getRepository(Position).findOneByOrFail({ id: assembly.positionId! });
    await refreshStoredOutcome(manager, await loadCheckContext(manager, assembly, position), now);
  }
  return rows.length;
}
