import { randomInt, randomUUID } from 'node:crypto';
import type { ProofTestRecord } from '../../shared/src/schemas/assemblies.schema.js';
import { tagCodeForSerial } from '../../shared/src/tags/tag-code.js';
import type { AppContext } from '../../backend/src/context.js';
import { Area, Assembly, Construction, Equipment, FittingType, Position } from '../../backend/src/entities/index.js';
import { recomputeStoredOutcomes } from '../../backend/src/services/assembly-checks.service.js';
import { buildSite } from './factories.js';

// Records of the register built straight through the repositories, with defaults that pass the
// selection checks together: a compressed-air position at 7 bar, 19 mm ('bore-19'), and an NBR
// hose rated 20 bar working, 80 bar burst, with crimped fittings rated 40 bar.

let sequence = 0;
const unique = () => `${Date.now().toString(36)}${(++sequence).toString(36)}`.toUpperCase();

async function siteIdOf(ctx: AppContext, siteId: string | undefined): Promise<string> {
  return siteId ?? (await buildSite(ctx)).id;
}

/** An area; in a new site unless `siteId` is given. */
export async function buildArea(ctx: AppContext, overrides: Partial<Area> = {}): Promise<Area> {
  const code = overrides.code ?? `AR-${unique()}`;
  return ctx.ds.getRepository(Area).save({ name: `Area ${code}`, ...overrides, code, siteId: await siteIdOf(ctx, overrides.siteId) });
}

/** Equipment in `areaId`, or in a new area of `siteId` (or of a new site). */
export async function buildEquipment(ctx: AppContext, overrides: Partial<Equipment> = {}): Promise<Equipment> {
  const area = overrides.areaId
    ? await ctx.ds.getRepository(Area).findOneByOrFail({ id: overrides.areaId })
    : await buildArea(ctx, { siteId: await siteIdOf(ctx, overrides.siteId) });
  const assetNumber = overrides.assetNumber ?? `EQ-${unique()}`;
  return ctx.ds.getRepository(Equipment).save({
    name: `Drill rig ${assetNumber}`,
    hasHourMeter: false,
    ...overrides,
    assetNumber,
    areaId: area.id,
    siteId: area.siteId,
  });
}

/** A compressed-air position at 7 bar, 19 mm, −10 to 50 °C, routed at 250 mm; on `equipmentId` or new equipment in `siteId`. */
export async function buildPosition(ctx: AppContext, overrides: Partial<Position> = {}): Promise<Position> {
  const equipment = overrides.equipmentId
    ? await ctx.ds.getRepository(Equipment).findOneByOrFail({ id: overrides.equipmentId })
    : await buildEquipment(ctx, { siteId: await siteIdOf(ctx, overrides.siteId) });
  const code = overrides.code ?? `POS-${unique()}`;
  return ctx.ds.getRepository(Position).save({
    name: 'Main air supply',
    serviceCode: 'compressed-air',
    mediumCode: 'compressed-air-oil-mist',
    maxOperatingPressureKpa: 700,
    minTempC: -10,
    maxTempC: 50,
    sizeCode: 'bore-19',
    requiredLengthMm: 3000,
    endAConnection: 'claw coupling',
    endBConnection: 'claw coupling',
    suctionDuty: null,
    routedBendRadiusMm: 250,
    criticality: 'medium',
    inspectionIntervalDays: null,
    notes: null,
    ...overrides,
    code,
    equipmentId: equipment.id,
    siteId: equipment.siteId,
  });
}

/** An air and multipurpose hose: NBR tube, textile plies, CR cover, 19 mm, 20 bar working, 80 bar burst, −40 to 100 °C. */
export async function buildConstruction(ctx: AppContext, overrides: Partial<Construction> = {}): Promise<Construction> {
  const code = overrides.code ?? `CON-${unique()}`;
  return ctx.ds.getRepository(Construction).save({
    name: 'Air and multipurpose hose 19 mm',
    tubeCompound: 'NBR',
    reinforcement: 'textile',
    coverCompound: 'CR',
    sizeCode: 'bore-19',
    workingPressureKpa: 2000,
    burstPressureKpa: 8000,
    vacuumRatingKpa: null,
    minTempC: -40,
    maxTempC: 100,
    minBendRadiusMm: 125,
    weightKgPerM: 0.45,
    electrical: 'none',
    foodContactCertified: false,
    maker: null,
    partNumber: null,
    serviceLifeMonths: null,
    shelfLifeMonths: null,
    storageLifeMonths: null,
    notes: null,
    ...overrides,
    code,
  });
}

/** A crimped stem and ferrule in zinc-plated steel, 19 mm rated 40 bar. */
export async function buildFittingType(ctx: AppContext, overrides: Partial<FittingType> = {}): Promise<FittingType> {
  const code = overrides.code ?? `FIT-${unique()}`;
  return ctx.ds.getRepository(FittingType).save({
    name: 'Crimped stem and ferrule',
    style: 'crimped',
    material: 'zinc-plated steel',
    sizes: [{ sizeCode: 'bore-19', ratingKpa: 4000, crimpDiameterMm: 27.6, crimpToleranceMm: 0.2 }],
    notes: null,
    ...overrides,
    code,
  });
}

export interface InstalledAssemblyOptions {
  /** The position to install in; a new default position in `siteId` (or a new site) otherwise. */
  position?: Position;
  siteId?: string;
  construction?: Construction;
  endA?: FittingType | null;
  endB?: FittingType | null;
  /** Any column of the assembly row. */
  assembly?: Partial<Assembly>;
}

export interface InstalledAssembly {
  assembly: Assembly;
  position: Position;
  construction: Construction;
  endA: FittingType | null;
  endB: FittingType | null;
}

/**
 * An assembly row with status 'installed' in a position, with a passed proof test at half the
 * burst pressure, and its stored check outcome computed as an install would.
 */
export async function buildInstalledAssembly(ctx: AppContext, options: InstalledAssemblyOptions = {}): Promise<InstalledAssembly> {
  const position = options.position ?? (await buildPosition(ctx, { siteId: options.siteId }));
  const construction = options.construction ?? (await buildConstruction(ctx));
  const endA = options.endA === undefined ? await buildFittingType(ctx) : options.endA;
  const endB = options.endB === undefined ? endA : options.endB;
  const now = ctx.clock.now();
  const testedOn = new Date(now.getTime() - 2 * 86_400_000).toISOString().slice(0, 10);
  const requiredPressureKpa = (construction.burstPressureKpa ?? 8000) / 2;
  const proofTest: ProofTestRecord = {
    eventId: randomUUID(),
    testedOn,
    medium: 'water',
    requiredPressureKpa,
    heldPressureKpa: requiredPressureKpa,
    holdSeconds: 60,
    result: 'pass',
    tester: 'Hose shop',
  };
  const saved = await ctx.ds.getRepository(Assembly).save({
    // A valid tag code from the top half of the serials, clear of numbers the server hands out in order.
    number: tagCodeForSerial(randomInt(2 ** 29, 2 ** 30)),
    constructionId: construction.id,
    hoseBatch: null,
    hoseManufacturedOn: testedOn,
    overallLengthMm: position.requiredLengthMm ?? 3000,
    cutLengthMm: null,
    endAFittingTypeId: endA?.id ?? null,
    endBFittingTypeId: endB?.id ?? null,
    builtOn: testedOn,
    builder: 'Hose shop',
    cost: null,
    status: 'installed',
    siteId: position.siteId,
    storeLocation: null,
    positionId: position.id,
    installedAt: new Date(now.getTime() - 86_400_000),
    proofTest,
    checkOutcome: null,
    checkResults: null,
    lastInspectedAt: null,
    nextInspectionDue: null,
    notes: null,
    ...options.assembly,
  });
  await ctx.ds.transaction((manager) => recomputeStoredOutcomes(manager, { assemblyIds: [saved.id] }, now));
  const assembly = await ctx.ds.getRepository(Assembly).findOneByOrFail({ id: saved.id });
  return { assembly, position, construction, endA, endB };
}
