import { z } from 'zod';
import {
  assemblyBuildSchema,
  assemblyListQuerySchema,
  installSchema,
  overrideCreateSchema,
  proofTestSchema,
  REMOVAL_CAUTIONS,
  removeSchema,
  replaceSchema,
  returnToStockSchema,
  scrapSchema,
  tagOutSchema,
  voidEventSchema,
} from '../../../shared/src/schemas/assemblies.schema.js';
import { idParamsSchema } from '../../../shared/src/schemas/common.schema.js';
import type { Action } from '../../../shared/src/permissions.js';
import type { EntityManager } from 'typeorm';
import { presentAssembly } from '../presenters/assembly.presenter.js';
import * as lifecycle from '../services/assemblies.service.js';
import { listAssemblies, listEvents, positionHistory } from '../services/assembly-queries.service.js';
import { voidEvent } from '../services/events.service.js';
import { onceForKey } from '../services/idempotency.service.js';
import type { HandlerInput, RouteDef } from './route.js';
import type { Actor } from '../policies/actor.js';
import type { AppContext } from '../context.js';

/**
 * A lifecycle action: done once per submission key, in one transaction, then answered with the
 * assembly as it is now (so a retry gets the same record, not a second change).
 */
function lifecycleRoute(
  path: string,
  action: Action,
  schema: z.ZodType,
  work: (ctx: AppContext, manager: EntityManager, actor: Actor, input: HandlerInput) => Promise<string>,
  options: { created?: boolean; cautions?: boolean } = {},
): RouteDef {
  return {
    method: 'post',
    path,
    action,
    schemas: path.includes(':id') ? { params: idParamsSchema, body: schema } : { body: schema },
    async handler(input) {
      const { ctx, res, actor, body } = input;
      const answer = await onceForKey(ctx, actor, action, body.idempotencyKey, { path: input.req.path, body }, async (manager) => ({
        status: options.created ? 201 : 200,
        body: { assemblyId: await work(ctx, manager, actor, input) },
      }));
      if (answer.replayed) res.set('Idempotent-Replayed', 'true');
      const data = await presentAssembly(ctx, actor, answer.body.assemblyId);
      res.status(answer.status).json({ data, ...(options.cautions ? { cautions: REMOVAL_CAUTIONS } : {}) });
    },
  };
}

export const assemblyRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/assemblies',
    action: 'register.read',
    schemas: { query: assemblyListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await listAssemblies(ctx, actor, query);
      res.json({ data: rows, pagination: { page: query.page, pageSize: query.pageSize, total } });
    },
  },
  {
    method: 'get',
    path: '/assemblies/:id',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: await presentAssembly(ctx, actor, params.id), cautions: REMOVAL_CAUTIONS });
    },
  },
  {
    method: 'get',
    path: '/assemblies/:id/events',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: await listEvents(ctx, actor, params.id) });
    },
  },
  {
    method: 'get',
    path: '/positions/:id/history',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: await positionHistory(ctx, actor, params.id) });
    },
  },
  lifecycleRoute('/assemblies', 'assemblies.build', assemblyBuildSchema, async (ctx, m, actor, { body }) => (await lifecycle.buildAssembly(ctx, m, actor, body)).id, { created: true }),
  lifecycleRoute('/assemblies/:id/proof-tests', 'assemblies.proof-test', proofTestSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.recordProofTest(ctx, m, actor, params.id, body)).id),
  lifecycleRoute('/assemblies/:id/install', 'assemblies.install', installSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.installAssembly(ctx, m, actor, params.id, body)).id),
  lifecycleRoute('/assemblies/:id/replace', 'assemblies.replace', replaceSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.replaceAssembly(ctx, m, actor, params.id, body)).installed.id, { cautions: true }),
  lifecycleRoute('/assemblies/:id/tag-out', 'assemblies.tag-out', tagOutSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.tagOutAssembly(ctx, m, actor, params.id, body)).id, { cautions: true }),
  lifecycleRoute('/assemblies/:id/remove', 'assemblies.remove', removeSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.removeAssembly(ctx, m, actor, params.id, body)).id, { cautions: true }),
  lifecycleRoute('/assemblies/:id/return-to-stock', 'assemblies.return-to-stock', returnToStockSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.returnToStock(ctx, m, actor, params.id, body)).id),
  lifecycleRoute('/assemblies/:id/scrap', 'assemblies.scrap', scrapSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.scrapAssembly(ctx, m, actor, params.id, body)).id),
  lifecycleRoute('/assemblies/:id/overrides', 'checks.override', overrideCreateSchema, async (ctx, m, actor, { params, body }) => (await lifecycle.overrideChecks(ctx, m, actor, params.id, body)).id),
  lifecycleRoute('/events/:id/void', 'events.void', voidEventSchema, async (ctx, m, actor, { params, body }) => voidEvent(ctx, m, actor, params.id, body.reason)),
];
