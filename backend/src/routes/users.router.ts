import { z } from 'zod';
import { idParamsSchema, pageQuerySchema, uuidSchema } from '../../../shared/src/schemas/common.schema.js';
import { userInviteSchema, userListQuerySchema, userUpdateSchema } from '../../../shared/src/schemas/users.schema.js';
import { presentUser } from '../presenters/user.presenter.js';
import { listAudit } from '../services/audit-read.service.js';
import { siteDirectory, listVisibleSites } from '../services/sites.service.js';
import * as users from '../services/users.service.js';
import type { RouteDef } from './route.js';

const auditQuerySchema = pageQuerySchema.extend({ entityType: z.literal('user'), entityId: uuidSchema });

export const userRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/sites',
    action: 'sites.list',
    async handler({ ctx, res, actor }) {
      res.json({ data: await listVisibleSites(ctx, actor) });
    },
  },
  {
    method: 'get',
    path: '/users',
    action: 'users.list',
    schemas: { query: userListQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { rows, total } = await users.listUsers(ctx, actor, query);
      const sites = await siteDirectory(ctx);
      res.json({ data: rows.map((u) => presentUser(u, actor, sites)), pagination: { page: query.page, pageSize: query.pageSize, total } });
    },
  },
  {
    method: 'post',
    path: '/users',
    action: 'users.invite',
    schemas: { body: userInviteSchema },
    async handler({ ctx, res, actor, body }) {
      const user = await users.inviteUser(ctx, actor, body);
      res.status(201).json({ data: presentUser(user, actor, await siteDirectory(ctx)) });
    },
  },
  {
    method: 'get',
    path: '/users/:id',
    action: 'users.read',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentUser(await users.getUser(ctx, actor, params.id), actor, await siteDirectory(ctx)) });
    },
  },
  {
    method: 'patch',
    path: '/users/:id',
    action: 'users.update',
    schemas: { params: idParamsSchema, body: userUpdateSchema },
    async handler({ ctx, res, actor, params, body }) {
      res.json({ data: presentUser(await users.updateUser(ctx, actor, params.id, body), actor, await siteDirectory(ctx)) });
    },
  },
  {
    method: 'post',
    path: '/users/:id/deactivate',
    action: 'users.deactivate',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentUser(await users.setUserActive(ctx, actor, params.id, false), actor, await siteDirectory(ctx)) });
    },
  },
  {
    method: 'post',
    path: '/users/:id/reactivate',
    action: 'users.reactivate',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      res.json({ data: presentUser(await users.setUserActive(ctx, actor, params.id, true), actor, await siteDirectory(ctx)) });
    },
  },
  {
    method: 'post',
    path: '/users/:id/resend-invite',
    action: 'users.resend-invite',
    schemas: { params: idParamsSchema },
    async handler({ ctx, res, actor, params }) {
      await users.resendInvitation(ctx, actor, params.id);
      res.status(202).json({ data: { message: 'Invitation sent' } });
    },
  },
  {
    method: 'get',
    path: '/audit',
    action: 'audit.read',
    schemas: { query: auditQuerySchema },
    async handler({ ctx, res, actor, query }) {
      const { data, total } = await listAudit(ctx, actor, query);
      res.json({ data, pagination: { page: query.page, pageSize: query.pageSize, total } });
    },
  },
];
