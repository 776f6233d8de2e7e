import { ImportJob } from '../../../backend/src/entities/index.js';
import { buildUser } from '../../support/factories.js';
import { buildEquipment } from '../../support/register-factories.js';
import { EDITORS, everyone, only, type Expectations, type Fixtures } from './types.js';

const code = (prefix: string) => `${prefix}-${Math.random().toString(36).slice(2, 10)}`.toUpperCase();

/** A file of one new position at site B, on equipment made for it. */
async function positionsFile(fx: Fixtures): Promise<string> {
  const equipment = await buildEquipment(fx.server.ctx, { siteId: fx.siteB.id });
  return `code,name,equipment,service,size\n${code('P')},Main air supply,${equipment.assetNumber},compressed-air,19 mm\n`;
}

/** An import job of site B in the given state, made straight in the database. */
async function jobOf(fx: Fixtures, status: ImportJob['status'] = 'checked'): Promise<ImportJob> {
  const owner = await buildUser(fx.server.ctx, { role: 'reliability_engineer' });
  return fx.server.ctx.ds.getRepository(ImportJob).save({
    userId: owner.id,
    kind: 'positions',
    siteId: fx.siteB.id,
    fileName: 'positions.csv',
    fileBytes: 100,
    content: await positionsFile(fx),
    status,
    totalRows: 1,
    processedRows: 1,
    errorCount: 0,
    problems: [],
    preview: [],
    writtenRows: 0,
    message: null,
    finishedAt: null,
  });
}

const editors = (ok: number) => only(EDITORS, ok);

export const CSV_EXPECTATIONS: Expectations = {
  'GET /assemblies/export': {
    anonymous: 401,
    roles: everyone(200),
    prepare: async (fx) => ({ path: '/api/assemblies/export', query: { siteId: fx.siteB.id, sort: 'status' } }),
  },
  'GET /imports': { anonymous: 401, roles: editors(200), prepare: async () => ({ path: '/api/imports' }) },
  'GET /imports/templates/:kind': { anonymous: 401, roles: editors(200), prepare: async () => ({ path: '/api/imports/templates/positions' }) },
  'POST /imports': {
    anonymous: 401,
    roles: editors(202),
    outOfScope: 404,
    prepare: async (fx) => ({
      path: '/api/imports',
      body: { kind: 'positions', siteId: fx.siteB.id },
      file: { field: 'file', name: 'positions.csv', content: await positionsFile(fx) },
    }),
  },
  'GET /imports/:id': {
    anonymous: 401,
    roles: editors(200),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/imports/${(await jobOf(fx)).id}` }),
  },
  'POST /imports/:id/write': {
    anonymous: 401,
    roles: editors(202),
    outOfScope: 404,
    prepare: async (fx) => ({ path: `/api/imports/${(await jobOf(fx)).id}/write` }),
  },
};
