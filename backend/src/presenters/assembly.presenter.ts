import { roleMay } from '../../../shared/src/permissions.js';
import type { AssemblyAbilities, AssemblyDto, FittingEndDto } from '../../../shared/src/schemas/assemblies.schema.js';
import type { AppContext } from '../context.js';
import { Assembly, Construction, FittingType, Position } from '../entities/index.js';
import { NotFoundError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { allowablePressureKpa, checkInput, loadCheckContext } from '../services/assembly-checks.service.js';
import { runSelectionChecks } from '../../../shared/src/checks/selection-checks.js';
import { DEFAULT_PREFERENCES } from '../../../shared/src/schemas/auth.schema.js';
import { overridesOf, presentListRow, registerWhere } from '../services/assembly-queries.service.js';

function abilities(actor: Actor, a: Assembly): AssemblyAbilities {
  const may = (action: Parameters<typeof roleMay>[1]) => roleMay(actor.role, action);
  return {
    proofTest: may('assemblies.proof-test') && ['built', 'in_stock', 'removed'].includes(a.status),
    install: may('assemblies.install') && a.status === 'in_stock',
    tagOut: may('assemblies.tag-out') && a.status === 'installed',
    remove: may('assemblies.remove') && ['installed', 'tagged_out'].includes(a.status),
    replace: may('assemblies.replace') && ['installed', 'tagged_out'].includes(a.status),
    returnToStock: may('assemblies.return-to-stock') && a.status === 'removed',
    scrap: may('assemblies.scrap') && ['built', 'in_stock', 'removed'].includes(a.status),
    override: may('checks.override') && ['installed', 'tagged_out'].includes(a.status),
  };
}

function fittingEnd(fitting: FittingType | null, measuredMm: number | null, sizeCode: string): FittingEndDto | null {
  if (!fitting) return null;
  const size = fitting.sizes.find((s) => s.sizeCode === sizeCode) ?? null;
  const spec = size?.crimpDiameterMm ?? null;
  const tolerance = size?.crimpToleranceMm ?? null;
  return {
    fittingTypeId: fitting.id,
    code: fitting.code,
    name: fitting.name,
    style: fitting.style,
    ratingKpa: size?.ratingKpa ?? null,
    crimpDiameterMm: measuredMm,
    specifiedCrimpDiameterMm: spec,
    crimpToleranceMm: tolerance,
    crimpWithinSpec: measuredMm != null && spec != null && tolerance != null ? Math.abs(measuredMm - spec) <= tolerance + 1e-9 : null,
  };
}

/** The whole record of one assembly of the actor's sites. */
export async function presentAssembly(ctx: AppContext, actor: Actor, id: string): Promise<AssemblyDto> {
  const today = ctx.clock.now().toISOString().slice(0, 10);
  const where = registerWhere(actor, {}, today);
  const params = [...where.params, id];
  const clause = `${where.sql ? `${where.sql} AND` : 'WHERE'} a.id = $${params.length}`;
  const rows = await ctx.ds.query(
    `SELECT a.id, a.number, a.status, a.site_id AS "siteId", s.name AS "siteName",
            c.id AS "constructionId", c.code AS "constructionCode", c.name AS "constructionName", c.size_code AS "sizeCode",
            p.id AS "positionId", p.code AS "positionCode", p.name AS "positionName", e.name AS "equipmentName", e.asset_number AS "equipmentAssetNumber", ar.name AS "areaName", p.service_code AS "serviceCode",
            a.check_outcome AS "checkOutcome",
            EXISTS (SELECT 1 FROM check_overrides o WHERE o.assembly_id = a.id AND o.position_id = a.position_id) AS overridden,
            a.next_inspection_due::text AS "nextInspectionDue", a.installed_at AS "installedAt", a.updated_at AS "updatedAt"
       FROM assemblies a JOIN sites s ON s.id = a.site_id JOIN constructions c ON c.id = a.construction_id
       LEFT JOIN positions p ON p.id = a.position_id LEFT JOIN equipment e ON e.id = p.equipment_id LEFT JOIN areas ar ON ar.id = e.area_id
       ${clause}`,
    params,
  );
  if (!rows[0]) throw new NotFoundError('Assembly');
  const base = presentListRow(rows[0]);
  const assembly = await ctx.ds.getRepository(Assembly).findOneByOrFail({ id });
  const construction = await ctx.ds.getRepository(Construction).findOneByOrFail({ id: assembly.constructionId });
  const ids = [assembly.endAFittingTypeId, assembly.endBFittingTypeId].filter((x): x is string => !!x);
  const fittings = ids.length ? await ctx.ds.getRepository(FittingType).findBy(ids.map((fid) => ({ id: fid }))) : [];
  const fitting = (fid: string | null) => fittings.find((f) => f.id === fid) ?? null;
  let allowable: number | null;
  let checkResults = assembly.checkResults;
  if (assembly.positionId) {
    const position = await ctx.ds.getRepository(Position).findOneByOrFail({ id: assembly.positionId });
    const context = await loadCheckContext(ctx.ds.manager, assembly, position);
    allowable = allowablePressureKpa(context);
    // The same checks as stored, with their sentences in the reader's own units.
    const [me] = await ctx.ds.query(`SELECT preferences FROM users WHERE id = $1`, [actor.id]);
    const units = { ...DEFAULT_PREFERENCES, ...(me?.preferences ?? {}) };
    checkResults = runSelectionChecks(checkInput(context), {
      now: ctx.clock.now(),
      pressureUnit: units.pressureUnit,
      lengthUnit: units.lengthUnit,
      temperatureUnit: units.temperatureUnit,
    }).results;
  } else {
    const limits = [construction.workingPressureKpa, ...[assembly.endAFittingTypeId, assembly.endBFittingTypeId].filter(Boolean).map((fid) => fitting(fid)?.sizes.find((s) => s.sizeCode === construction.sizeCode)?.ratingKpa ?? null)];
    allowable = limits.some((l) => l == null) ? null : Math.min(...(limits as number[]));
  }
  return {
    ...base,
    hoseBatch: assembly.hoseBatch,
    hoseManufacturedOn: assembly.hoseManufacturedOn,
    overallLengthMm: assembly.overallLengthMm,
    cutLengthMm: assembly.cutLengthMm,
    endA: fittingEnd(fitting(assembly.endAFittingTypeId), assembly.endACrimpMm, construction.sizeCode),
    endB: fittingEnd(fitting(assembly.endBFittingTypeId), assembly.endBCrimpMm, construction.sizeCode),
    builtOn: assembly.builtOn,
    builtOnEstimated: assembly.builtOnEstimated,
    builder: assembly.builder,
    cost: assembly.cost,
    storeLocation: assembly.storeLocation,
    installedAtEstimated: assembly.installedAtEstimated,
    predatesRecords: assembly.predatesRecords,
    proofTest: assembly.proofTest,
    allowablePressureKpa: allowable,
    checkResults,
    overrides: await overridesOf(ctx, assembly.id, assembly.positionId),
    lastInspectedAt: assembly.lastInspectedAt?.toISOString() ?? null,
    notes: assembly.notes,
    version: assembly.version,
    abilities: abilities(actor, assembly),
  };
}
