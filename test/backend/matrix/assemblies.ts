import { Assembly, AssemblyEvent } from '../../../backend/src/entities/index.js';
import type { AssemblyStatus } from '../../../shared/src/schemas/assemblies.schema.js';
import { buildConstruction, buildFittingType } from '../../support/register-factories.js';
import { buildAirPosition, buildPlace } from '../../support/assembly-factories.js';
import { EDITORS, everyone, FIELD, only, type Expectations, type Fixtures } from './types.js';

let serial = 0;

/** An assembly of site B in the given state, written straight to the database. */
async function assemblyIn(fx: Fixtures, status: AssemblyStatus, options: { routedBendRadiusMm?: number } = {}) {
  const { ctx } = fx.server;
  const { equipment } = await buildPlace(ctx, fx.siteB);
  const construction = await buildConstruction(ctx);
  const fitting = await buildFittingType(ctx);
  const position = await buildAirPosition(ctx, equipment, options);
  const installed = status === 'installed';
  const assembly = await ctx.ds.getRepository(Assembly).save({
    number: `MX${Date.now().toString(36).toUpperCase()}${++serial}`,
    constructionId: construction.id,
    endAFittingTypeId: fitting.id,
    endBFittingTypeId: fitting.id,
    overallLengthMm: 5000,
    builtOn: '2026-01-10',
    status,
    siteId: fx.siteB.id,
    positionId: installed ? position.id : null,
    installedAt: installed ? new Date('2026-02-01T08:00:00Z') : null,
    proofTest: { eventId: '00000000-0000-4000-8000-000000000000', testedOn: '2026-05-01', medium: 'water', requiredPressureKpa: 4000, heldPressureKpa: 4000, holdSeconds: 60, result: 'pass', tester: 'Hose shop' },
  });
  const event = await ctx.ds.getRepository(AssemblyEvent).save({
    assemblyId: assembly.id,
    positionId: assembly.positionId,
    siteId: fx.siteB.id,
    kind: 'proof_test',
    occurredAt: new Date('2026-05-01T12:00:00Z'),
    data: { medium: 'water', requiredPressureKpa: 4000, heldPressureKpa: 4000, holdSeconds: 60, result: 'pass', tester: 'Hose shop' },
  });
  return { assembly, position, construction, fitting, event, equipment };
}

const field = (ok: number) => only(FIELD, ok);
const editors = (ok: number) => only(EDITORS, ok);

export const ASSEMBLY_EXPECTATIONS: Expectations = {
  'GET /assemblies': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/assemblies' }) },
  'GET /assemblies/:id': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/assemblies/${(await assemblyIn(fx, 'in_stock')).assembly.id}` }),
  },
  'GET /assemblies/:id/events': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/assemblies/${(await assemblyIn(fx, 'in_stock')).assembly.id}/events` }),
  },
  'GET /positions/:id/history': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/positions/${(await assemblyIn(fx, 'installed')).position.id}/history` }),
  },
  'POST /assemblies': {
    anonymous: 401,
    roles: field(201),
    outOfScope: 404,
    prepare: async (fx) => {
      const { construction, fitting } = await assemblyIn(fx, 'in_stock');
      return {
        path: '/api/assemblies',
        body: { constructionId: construction.id, siteId: fx.siteB.id, overallLength: { value: 3, unit: 'm' }, endA: { fittingTypeId: fitting.id }, endB: null, builtOn: '2026-03-01' },
      };
    },
  },
  'POST /assemblies/:id/proof-tests': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => ({
      path: `/api/assemblies/${(await assemblyIn(fx, 'built')).assembly.id}/proof-tests`,
      body: { testedOn: '2026-03-01', medium: 'water', heldPressure: { value: 40, unit: 'bar' }, holdSeconds: 60, result: 'pass', tester: 'Hose shop' },
    }),
  },
  'POST /assemblies/:id/install': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => {
      const { assembly, position } = await assemblyIn(fx, 'in_stock');
      return { path: `/api/assemblies/${assembly.id}/install`, body: { positionId: position.id } };
    },
  },
  'POST /assemblies/:id/replace': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => {
      const { assembly } = await assemblyIn(fx, 'installed');
      const spare = await assemblyIn(fx, 'in_stock');
      return { path: `/api/assemblies/${assembly.id}/replace`, body: { newAssemblyId: spare.assembly.id, reason: 'planned-replacement' } };
    },
  },
  'POST /assemblies/:id/tag-out': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/assemblies/${(await assemblyIn(fx, 'installed')).assembly.id}/tag-out`, body: { note: 'Leak at the end B ferrule' } }),
  },
  'POST /assemblies/:id/remove': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/assemblies/${(await assemblyIn(fx, 'installed')).assembly.id}/remove`, body: { reason: 'worn-at-inspection' } }),
  },
  'POST /assemblies/:id/return-to-stock': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/assemblies/${(await assemblyIn(fx, 'removed')).assembly.id}/return-to-stock`, body: { inspectionNote: 'Cover and fittings sound' } }),
  },
  'POST /assemblies/:id/scrap': {
    anonymous: 401,
    roles: field(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/assemblies/${(await assemblyIn(fx, 'removed')).assembly.id}/scrap`, body: { note: 'Reinforcement exposed' } }),
  },
  'POST /assemblies/:id/overrides': {
    anonymous: 401,
    roles: editors(200),
    outOfScope: 404,
    prepare: async (fx) => ({
      path: `/api/assemblies/${(await assemblyIn(fx, 'installed', { routedBendRadiusMm: 100 })).assembly.id}/overrides`,
      body: { checks: ['bend-radius'], reason: 'Temporary routing until the guard is moved', reviewOn: '2026-10-01' },
    }),
  },
  'POST /events/:id/void': {
    anonymous: 401,
    roles: editors(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/events/${(await assemblyIn(fx, 'in_stock')).event.id}/void`, body: { reason: 'Entered against the wrong assembly' } }),
  },
};
