import { idParamsSchema } from '../../../shared/src/schemas/common.schema.js';
import {
  areaCreateSchema,
  areaListQuerySchema,
  areaUpdateSchema,
  equipmentCreateSchema,
  equipmentListQuerySchema,
  equipmentUpdateSchema,
  positionCreateSchema,
  positionListQuerySchema,
  positionUpdateSchema,
  siteCreateSchema,
  siteUpdateSchema,
} from '../../../shared/src/schemas/register.schema.js';
import { presentArea, presentEquipment, presentPosition, presentSite } from '../presenters/register.presenter.js';
import * as areas from '../services/areas.service.js';
import * as equipment from '../services/equipment.service.js';
import * as positions from '../services/positions.service.js';
import * as sites from '../services/sites-admin.service.js';
import type { RouteDef } from './route.js';

const page = (query: { page: number; pageSize: number }, total: number) => ({ page: query.page, pageSize: query.pageSize, total });

/** The places of the register: sites, their areas, equipment and hose positions. */
export const registerRoutes: RouteDef[] = [
  // ── Sites (the list of sites is with the users' routes) ──
  {
    method: 'get',
    path: '/sites/:id',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentSite(await sites.getSite(ctx, actor, params.id), actor) });
    },
  },
  {
    method: 'post',
    path: '/sites',
    action: 'sites.create',
    schemas: { body: siteCreateSchema },
    async handler({ ctx, res, actor, body }) {
      res.status(201).json({ data: presentSite(await sites.createSite(ctx, actor, body), actor) });
    },
  },
  {
    method: 'patch',
    path: '/sites/:id',
    action: 'sites.update',
    schemas: { params: idParamsSchema, body: siteUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentSite(await sites.updateSite(ctx, actor, params.id, body), actor) });
    },
  },

  // ── Areas ──
  {
    method: 'get',
    path: '/areas',
    action: 'register.read',
    schemas: { query: areaListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await areas.listAreas(ctx, actor, query);
      res.json({ data: rows.map((a) => presentArea(a, actor)), pagination: page(query, total) });
    },
  },
  {
    method: 'post',
    path: '/areas',
    action: 'areas.edit',
    schemas: { body: areaCreateSchema },
    async handler({ ctx, res, actor, body }) {
      res.status(201).json({ data: presentArea(await areas.createArea(ctx, actor, body), actor) });
    },
  },
  {
    method: 'patch',
    path: '/areas/:id',
    action: 'areas.edit',
    schemas: { params: idParamsSchema, body: areaUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentArea(await areas.updateArea(ctx, actor, params.id, body), actor) });
    },
  },
  {
    method: 'post',
    path: '/areas/:id/archive',
    action: 'areas.edit',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      await areas.archiveArea(ctx, actor, params.id);
      res.status(204).end();
    },
  },

  // ── Equipment ──
  {
    method: 'get',
    path: '/equipment',
    action: 'register.read',
    schemas: { query: equipmentListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await equipment.listEquipment(ctx, actor, query);
      res.json({ data: rows.map((e) => presentEquipment(e, actor)), pagination: page(query, total) });
    },
  },
  {
    method: 'get',
    path: '/equipment/:id',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentEquipment(await equipment.getEquipment(ctx, actor, params.id), actor) });
    },
  },
  {
    method: 'post',
    path: '/equipment',
    action: 'equipment.edit',
    schemas: { body: equipmentCreateSchema },
    async handler({ ctx, res, actor, body }) {
      res.status(201).json({ data: presentEquipment(await equipment.createEquipment(ctx, actor, body), actor) });
    },
  },
  {
    method: 'patch',
    path: '/equipment/:id',
    action: 'equipment.edit',
    schemas: { params: idParamsSchema, body: equipmentUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentEquipment(await equipment.updateEquipment(ctx, actor, params.id, body), actor) });
    },
  },
  {
    method: 'post',
    path: '/equipment/:id/archive',
    action: 'equipment.edit',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      await equipment.archiveEquipment(ctx, actor, params.id);
      res.status(204).end();
    },
  },

  // ── Positions ──
  {
    method: 'get',
    path: '/positions',
    action: 'register.read',
    schemas: { query: positionListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await positions.listPositions(ctx, actor, query);
      res.json({ data: rows.map((p) => presentPosition(p, actor)), pagination: page(query, total) });
    },
  },
  {
    method: 'get',
    path: '/positions/:id',
    action: 'register.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentPosition(await positions.getPosition(ctx, actor, params.id), actor) });
    },
  },
  {
    method: 'post',
    path: '/positions',
    action: 'positions.edit',
    schemas: { body: positionCreateSchema },
    async handler({ ctx, res, actor, body }) {
      res.status(201).json({ data: presentPosition(await positions.createPosition(ctx, actor, body), actor) });
    },
  },
  {
    method: 'patch',
    path: '/positions/:id',
    action: 'positions.edit',
    schemas: { params: idParamsSchema, body: positionUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentPosition(await positions.updatePosition(ctx, actor, params.id, body), actor) });
    },
  },
  {
    method: 'post',
    path: '/positions/:id/archive',
    action: 'positions.edit',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      await positions.archivePosition(ctx, actor, params.id);
      res.status(204).end();
    },
  },
];
