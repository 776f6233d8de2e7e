import type { AppContext } from '../../backend/src/context.js';
import { Area, Construction, Equipment, FittingType, Position, Site } from '../../backend/src/entities/index.js';
import { buildSite } from './factories.js';
import { call } from './api.js';
import type { Express } from 'express';

let n = 0;
const next = () => `${Date.now().toString(36).slice(-4)}${(++n).toString(36)}`.toUpperCase();

/** A site with one area and one piece of equipment (with an hour meter). */
export async function buildPlace(ctx: AppContext, site?: Site) {
  const s = site ?? (await buildSite(ctx));
  const area = await ctx.ds.getRepository(Area).save({ siteId: s.id, code: `AR${next()}`, name: 'Crushing' });
  const equipment = await ctx.ds.getRepository(Equipment).save({ siteId: s.id, areaId: area.id, assetNumber: `EQ-${next()}`, name: 'Cone crusher', hasHourMeter: true, hourMeterHours: 1000 });
  return { site: s, area, equipment };
}

/** A compressed-air position at 7 bar, 19 mm, routed through a 200 mm bend. */
export async function buildAirPosition(ctx: AppContext, equipment: Equipment, overrides: Partial<Position> = {}): Promise<Position> {
  return ctx.ds.getRepository(Position).save({
    siteId: equipment.siteId,
    equipmentId: equipment.id,
    code: `P-${next()}`,
    name: 'Main air supply',
    serviceCode: 'compressed-air',
    mediumCode: 'compressed-air-oil-mist',
    maxOperatingPressureKpa: 700,
    minTempC: -10,
    maxTempC: 50,
    sizeCode: 'bore-19',
    suctionDuty: false,
    routedBendRadiusMm: 200,
    criticality: 'medium',
    ...overrides,
  });
}

/** An NBR air hose, 19 mm, 20 bar working and 80 bar burst, bending to 150 mm. */
export async function buildAirConstruction(ctx: AppContext, overrides: Partial<Construction> = {}): Promise<Construction> {
  return ctx.ds.getRepository(Construction).save({
    code: `AIR-${next()}`,
    name: 'Air hose, textile, NBR tube',
    tubeCompound: 'NBR',
    reinforcement: 'textile',
    coverCompound: 'CR',
    sizeCode: 'bore-19',
    workingPressureKpa: 2000,
    burstPressureKpa: 8000,
    vacuumRatingKpa: null,
    minTempC: -30,
    maxTempC: 80,
    minBendRadiusMm: 150,
    electrical: 'none',
    foodContactCertified: false,
    ...overrides,
  });
}

/** A claw coupling rated 2000 kPa at 19 mm. */
export async function buildClawFitting(ctx: AppContext, ratingKpa = 2000): Promise<FittingType> {
  return ctx.ds.getRepository(FittingType).save({
    code: `CLAW-${next()}`,
    name: 'Claw coupling with locking pin',
    style: 'claw',
    material: 'Ductile iron',
    sizes: [{ sizeCode: 'bore-19', ratingKpa, crimpDiameterMm: null, crimpToleranceMm: null }],
  });
}

export const key = () => `k${Date.now().toString(36)}${Math.random().toString(36).slice(2, 12)}`;

/** Builds an assembly through the API and, unless told not to, proof-tests it into stock. Returns its id. */
export async function stockAssembly(
  app: Express,
  cookie: string,
  args: { siteId: string; constructionId: string; fittingId: string; proofTest?: boolean },
): Promise<string> {
  const built = await call(app, 'post', '/api/assemblies', cookie).send({
    constructionId: args.constructionId,
    siteId: args.siteId,
    overallLength: { value: 5, unit: 'm' },
    endA: { fittingTypeId: args.fittingId },
    endB: { fittingTypeId: args.fittingId },
    builtOn: '2026-01-10',
    idempotencyKey: key(),
  });
  if (built.status !== 201) throw new Error(`build failed: ${JSON.stringify(built.body)}`);
  const id = built.body.data.id as string;
  if (args.proofTest === false) return id;
  const tested = await call(app, 'post', `/api/assemblies/${id}/proof-tests`, cookie).send({
    testedOn: '2026-01-11',
    medium: 'water',
    heldPressure: { value: 40, unit: 'bar' },
    holdSeconds: 60,
    result: 'pass',
    tester: 'Hose shop',
  });
  if (tested.status !== 200) throw new Error(`proof test failed: ${JSON.stringify(tested.body)}`);
  return id;
}
