import type { AppContext } from '../../backend/src/context.js';
import type { Equipment, Position, Site } from '../../backend/src/entities/index.js';
import { buildSite } from './factories.js';
import { buildArea, buildEquipment, buildPosition } from './register-factories.js';
import { call } from './api.js';
import type { Express } from 'express';

/** A site (new unless given) with one area and one piece of equipment with an hour meter. */
export async function buildPlace(ctx: AppContext, site?: Site) {
  const s = site ?? (await buildSite(ctx));
  const area = await buildArea(ctx, { siteId: s.id });
  const equipment = await buildEquipment(ctx, { areaId: area.id, hasHourMeter: true, hourMeterHours: 1000 });
  return { site: s, area, equipment };
}

/** The default compressed-air position (7 bar, 19 mm) on this equipment. */
export const buildAirPosition = (ctx: AppContext, equipment: Equipment, overrides: Partial<Position> = {}) =>
  buildPosition(ctx, { equipmentId: equipment.id, ...overrides });

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
