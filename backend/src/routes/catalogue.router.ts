import { removalOutcomesSchema } from '../../../shared/src/schemas/assemblies.schema.js';
import { idParamsSchema } from '../../../shared/src/schemas/common.schema.js';
import {
  constructionCreateSchema,
  constructionListQuerySchema,
  constructionUpdateSchema,
  fittingTypeCreateSchema,
  fittingTypeListQuerySchema,
  fittingTypeUpdateSchema,
  serviceSettingsSchema,
  siteServiceParamsSchema,
  siteServicesQuerySchema,
} from '../../../shared/src/schemas/register.schema.js';
import { presentConstruction, presentFittingType, presentReference, presentSiteService } from '../presenters/register.presenter.js';
import * as constructions from '../services/constructions.service.js';
import * as fittingTypes from '../services/fitting-types.service.js';
import * as removalOutcomes from '../services/removal-outcomes.service.js';
import * as siteServices from '../services/site-services.service.js';
import type { RouteDef } from './route.js';

const page = (query: { page: number; pageSize: number }, total: number) => ({ page: query.page, pageSize: query.pageSize, total });

/** What the register is built from: services and their settings per site, constructions, fitting types, reference lists. */
export const catalogueRoutes: RouteDef[] = [
  // ── Services at a site ──
  {
    method: 'get',
    path: '/services',
    action: 'register.read',
    schemas: { query: siteServicesQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const rows = await siteServices.listSiteServices(ctx, actor, query.siteId);
      // The whole catalogue in one page.
      res.json({ data: rows.map(presentSiteService), pagination: { page: 1, pageSize: rows.length, total: rows.length } });
    },
  },
  {
    method: 'put',
    path: '/sites/:siteId/services/:serviceCode',
    action: 'service-settings.update',
    schemas: { params: siteServiceParamsSchema, body: serviceSettingsSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentSiteService(await siteServices.updateSiteService(ctx, actor, params.siteId, params.serviceCode, body)) });
    },
  },
  {
    method: 'post',
    path: '/sites/:siteId/services/:serviceCode/reset',
    action: 'service-settings.update',
    schemas: { params: siteServiceParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentSiteService(await siteServices.resetSiteService(ctx, actor, params.siteId, params.serviceCode)) });
    },
  },

  // ── Constructions ──
  {
    method: 'get',
    path: '/constructions',
    action: 'register.read',
    schemas: { query: constructionListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await constructions.listConstructions(ctx, actor, query);
      res.json({ data: rows.map((c) => presentConstruction(c, actor)), pagination: page(query, total) });
    },
  },
  {
    method: 'get',
    path: '/constructions/:id',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentConstruction(await constructions.getConstruction(ctx, actor, params.id), actor) });
    },
  },
  {
    method: 'post',
    path: '/constructions',
    action: 'constructions.edit',
    schemas: { body: constructionCreateSchema },
    async handler({ ctx, res, actor, body }) {
      res.status(201).json({ data: presentConstruction(await constructions.createConstruction(ctx, actor, body), actor) });
    },
  },
  {
    method: 'patch',
    path: '/constructions/:id',
    action: 'constructions.edit',
    schemas: { params: idParamsSchema, body: constructionUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentConstruction(await constructions.updateConstruction(ctx, actor, params.id, body), actor) });
    },
  },
  {
    method: 'post',
    path: '/constructions/:id/archive',
    action: 'constructions.edit',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      await constructions.archiveConstruction(ctx, actor, params.id);
      res.status(204).end();
    },
  },

  // ── Fitting types ──
  {
    method: 'get',
    path: '/fitting-types',
    action: 'register.read',
    schemas: { query: fittingTypeListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await fittingTypes.listFittingTypes(ctx, actor, query);
      res.json({ data: rows.map((f) => presentFittingType(f, actor)), pagination: page(query, total) });
    },
  },
  {
    method: 'get',
    path: '/fitting-types/:id',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentFittingType(await fittingTypes.getFittingType(ctx, actor, params.id), actor) });
    },
  },
  {
    method: 'post',
    path: '/fitting-types',
    action: 'fitting-types.edit',
    schemas: { body: fittingTypeCreateSchema },
    async handler({ ctx, res, actor, body }) {
      res.status(201).json({ data: presentFittingType(await fittingTypes.createFittingType(ctx, actor, body), actor) });
    },
  },
  {
    method: 'patch',
    path: '/fitting-types/:id',
    action: 'fitting-types.edit',
    schemas: { params: idParamsSchema, body: fittingTypeUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentFittingType(await fittingTypes.updateFittingType(ctx, actor, params.id, body), actor) });
    },
  },
  {
    method: 'post',
    path: '/fitting-types/:id/archive',
    action: 'fitting-types.edit',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      await fittingTypes.archiveFittingType(ctx, actor, params.id);
      res.status(204).end();
    },
  },

  // ── How removals count in life data ──
  {
    method: 'get',
    path: '/removal-outcomes',
    action: 'register.read',
    async handler({ ctx, res }) {
      res.json({ data: await removalOutcomes.listRemovalOutcomes(ctx) });
    },
  },
  {
    method: 'put',
    path: '/removal-outcomes',
    action: 'removal-outcomes.update',
    schemas: { body: removalOutcomesSchema },
    async handler({ ctx, res, actor, body }) {
      res.json({ data: await removalOutcomes.updateRemovalOutcomes(ctx, actor, body) });
    },
  },

  // ── Reference lists ──
  {
    method: 'get',
    path: '/reference',
    action: 'register.read',
    handler({ res }) {
      // The same for everyone until the server is upgraded: the client may keep it for an hour and revalidate by ETag.
      res.set('Cache-Control', 'private, max-age=3600').json({ data: presentReference() });
    },
  },
];
