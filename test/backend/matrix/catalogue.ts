import { defaultServiceSettings, serviceByCode } from '../../../shared/src/services/service-catalogue.js';
import { buildConstruction, buildFittingType } from '../../support/register-factories.js';
import { EDITORS, everyone, only, type Expectations } from './types.js';

const code = (prefix: string) => `${prefix}-${Math.random().toString(36).slice(2, 10)}`.toUpperCase();
const airSettings = () => defaultServiceSettings(serviceByCode('compressed-air')!);

export const CATALOGUE_EXPECTATIONS: Expectations = {
  'GET /services': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/services', query: { siteId: fx.siteB.id } }),
  },
  'PUT /sites/:siteId/services/:serviceCode': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/sites/${fx.siteB.id}/services/compressed-air`, body: { ...airSettings(), defaultInspectionIntervalDays: 60 } }),
  },
  'POST /sites/:siteId/services/:serviceCode/reset': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/sites/${fx.siteB.id}/services/compressed-air/reset` }),
  },

  'GET /constructions': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/constructions' }) },
  'GET /constructions/:id': {
    anonymous: 401,
    roles: everyone(200),
    prepare: async (fx) => ({ path: `/api/constructions/${(await buildConstruction(fx.server.ctx)).id}` }),
  },
  'POST /constructions': {
    anonymous: 401,
    roles: only(EDITORS, 201),
    prepare: async () => ({
      path: '/api/constructions',
      body: {
        code: code('C'),
        name: 'Air hose 19 mm',
        sizeCode: 'bore-19',
        tubeCompound: 'NBR',
        workingPressure: { value: 20, unit: 'bar' },
        burstPressure: { value: 80, unit: 'bar' },
      },
    }),
  },
  'PATCH /constructions/:id': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    prepare: async (fx) => ({ path: `/api/constructions/${(await buildConstruction(fx.server.ctx)).id}`, body: { name: 'Air hose, heavy cover' } }),
  },
  'POST /constructions/:id/archive': {
    anonymous: 401,
    roles: only(EDITORS, 204),
    prepare: async (fx) => ({ path: `/api/constructions/${(await buildConstruction(fx.server.ctx)).id}/archive` }),
  },

  'GET /fitting-types': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/fitting-types' }) },
  'GET /fitting-types/:id': {
    anonymous: 401,
    roles: everyone(200),
    prepare: async (fx) => ({ path: `/api/fitting-types/${(await buildFittingType(fx.server.ctx)).id}` }),
  },
  'POST /fitting-types': {
    anonymous: 401,
    roles: only(EDITORS, 201),
    prepare: async () => ({
      path: '/api/fitting-types',
      body: { code: code('F'), name: 'Claw coupling', style: 'claw', material: 'malleable iron', sizes: [{ sizeCode: 'bore-19', rating: { value: 10, unit: 'bar' } }] },
    }),
  },
  'PATCH /fitting-types/:id': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    prepare: async (fx) => ({ path: `/api/fitting-types/${(await buildFittingType(fx.server.ctx)).id}`, body: { material: 'stainless steel' } }),
  },
  'POST /fitting-types/:id/archive': {
    anonymous: 401,
    roles: only(EDITORS, 204),
    prepare: async (fx) => ({ path: `/api/fitting-types/${(await buildFittingType(fx.server.ctx)).id}/archive` }),
  },

  'GET /reference': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/reference' }) },
  'GET /removal-outcomes': { anonymous: 401, roles: everyone(200), prepare: async () => ({ path: '/api/removal-outcomes' }) },
  'PUT /removal-outcomes': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    // Writing the defaults back leaves the plant's mapping as the other tests expect it.
    prepare: async () => ({
      path: '/api/removal-outcomes',
      body: { outcomes: { failure: 'failure', damaged: 'failure', 'worn-at-inspection': 'failure', 'planned-replacement': 'suspension', relocated: 'suspension', obsolete: 'suspension' } },
    }),
  },
};
