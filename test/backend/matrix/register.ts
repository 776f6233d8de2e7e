import { buildSite } from '../../support/factories.js';
import { buildArea, buildEquipment, buildPosition } from '../../support/register-factories.js';
import { EDITORS, everyone, only, type Expectations } from './types.js';

const code = (prefix: string) => `${prefix}-${Math.random().toString(36).slice(2, 10)}`.toUpperCase();
const onlyAdmin = (ok: number) => only(['administrator'], ok);

export const REGISTER_EXPECTATIONS: Expectations = {
  'GET /sites/:id': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/sites/${(await buildSite(fx.server.ctx)).id}` }),
  },
  'POST /sites': {
    anonymous: 401,
    roles: onlyAdmin(201),
    // An administrator limited to some sites cannot add one: they could not see it.
    outOfScope: 403,
    prepare: async () => ({
      path: '/api/sites',
      body: { code: code('S'), name: 'Lower Quarry', timeZone: 'Europe/London', currency: 'GBP', defaultUnits: { pressureUnit: 'bar', lengthUnit: 'mm', temperatureUnit: 'C' } },
    }),
  },
  'PATCH /sites/:id': {
    anonymous: 401,
    roles: onlyAdmin(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/sites/${(await buildSite(fx.server.ctx)).id}`, body: { currency: 'EUR' } }),
  },

  'GET /areas': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/areas', query: { siteId: fx.siteB.id } }),
  },
  'POST /areas': {
    anonymous: 401,
    roles: only(EDITORS, 201),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/areas', body: { siteId: fx.siteB.id, code: code('AR'), name: 'Wash plant' } }),
  },
  'PATCH /areas/:id': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/areas/${(await buildArea(fx.server.ctx, { siteId: fx.siteB.id })).id}`, body: { name: 'Primary crusher' } }),
  },
  'POST /areas/:id/archive': {
    anonymous: 401,
    roles: only(EDITORS, 204),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/areas/${(await buildArea(fx.server.ctx, { siteId: fx.siteB.id })).id}/archive` }),
  },

  'GET /equipment': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/equipment', query: { siteId: fx.siteB.id } }),
  },
  'GET /equipment/:id': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/equipment/${(await buildEquipment(fx.server.ctx, { siteId: fx.siteB.id })).id}` }),
  },
  'POST /equipment': {
    anonymous: 401,
    roles: only(EDITORS, 201),
    outOfScope: 404,
    prepare: async (fx) => ({
      path: '/api/equipment',
      body: { areaId: (await buildArea(fx.server.ctx, { siteId: fx.siteB.id })).id, assetNumber: code('EQ'), name: 'Dewatering pump 2' },
    }),
  },
  'PATCH /equipment/:id': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/equipment/${(await buildEquipment(fx.server.ctx, { siteId: fx.siteB.id })).id}`, body: { hasHourMeter: true } }),
  },
  'POST /equipment/:id/archive': {
    anonymous: 401,
    roles: only(EDITORS, 204),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/equipment/${(await buildEquipment(fx.server.ctx, { siteId: fx.siteB.id })).id}/archive` }),
  },

  'GET /positions': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: '/api/positions', query: { siteId: fx.siteB.id } }),
  },
  'GET /positions/:id': {
    anonymous: 401,
    roles: everyone(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/positions/${(await buildPosition(fx.server.ctx, { siteId: fx.siteB.id })).id}` }),
  },
  'POST /positions': {
    anonymous: 401,
    roles: only(EDITORS, 201),
    outOfScope: 404,
    prepare: async (fx) => ({
      path: '/api/positions',
      body: {
        equipmentId: (await buildEquipment(fx.server.ctx, { siteId: fx.siteB.id })).id,
        code: code('P'),
        name: 'Main air supply',
        serviceCode: 'compressed-air',
        sizeCode: 'bore-19',
        maxOperatingPressure: { value: 7, unit: 'bar' },
      },
    }),
  },
  'PATCH /positions/:id': {
    anonymous: 401,
    roles: only(EDITORS, 200),
    outOfScope: 404,
    prepare: async (fx) => ({
      path: `/api/positions/${(await buildPosition(fx.server.ctx, { siteId: fx.siteB.id })).id}`,
      body: { maxOperatingPressure: { value: 8, unit: 'bar' }, reason: 'Compressor set-point raised' },
    }),
  },
  'POST /positions/:id/archive': {
    anonymous: 401,
    roles: only(EDITORS, 204),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/positions/${(await buildPosition(fx.server.ctx, { siteId: fx.siteB.id })).id}/archive` }),
  },
};
