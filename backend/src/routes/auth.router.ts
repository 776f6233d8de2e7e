import type { Response } from 'express';
import {
  preferencesSchema,
  resetRequestSchema,
  setupSchema,
  signInSchema,
  tokenPasswordSchema,
  type AppMetaDto,
} from '../../../shared/src/schemas/auth.schema.js';
import type { AppContext } from '../context.js';
import { presentMe } from '../presenters/user.presenter.js';
import * as auth from '../services/auth.service.js';
import { SESSION_COOKIE } from '../services/session.service.js';
import { getSetting } from '../services/settings.service.js';
import { siteDirectory } from '../services/sites.service.js';
import { requestMeta, type RouteDef } from './route.js';

function setSessionCookie(ctx: AppContext, res: Response, token: string, expiresAt: Date): void {
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'lax',
    secure: ctx.config.publicBaseUrl.protocol === 'https:',
    path: '/',
    expires: expiresAt,
  });
}

function clearSessionCookie(ctx: AppContext, res: Response): void {
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'lax', secure: ctx.config.publicBaseUrl.protocol === 'https:', path: '/' });
}

export const authRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/meta',
    action: null,
    async handler({ ctx, res }) {
      const data: AppMetaDto = {
        mode: ctx.config.mode === 'production' ? 'production' : 'demo',
        needsSetup: ctx.config.mode === 'production' && (await auth.userCount(ctx)) === 0,
        companyName: await getSetting<string>(ctx, 'company_name'),
      };
      res.json({ data });
    },
  },
  {
    method: 'post',
    path: '/auth/sign-in',
    action: null,
    schemas: { body: signInSchema },
    async handler({ ctx, req, res, body }) {
      const { user, token, expiresAt } = await auth.signIn(ctx, body, requestMeta(req));
      setSessionCookie(ctx, res, token, expiresAt);
      res.json({ data: presentMe(user, await siteDirectory(ctx)) });
    },
  },
  {
    method: 'post',
    path: '/auth/sign-out',
    action: 'session.read',
    async handler({ ctx, res, actor }) {
      await auth.signOut(ctx, actor);
      clearSessionCookie(ctx, res);
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: '/auth/sign-out-everywhere',
    action: 'session.read',
    async handler({ ctx, res, actor }) {
      await auth.signOutEverywhere(ctx, actor);
      clearSessionCookie(ctx, res);
      res.status(204).end();
    },
  },
  {
    method: 'get',
    path: '/auth/me',
    action: 'session.read',
    async handler({ ctx, res, actor }) {
      res.json({ data: presentMe(await auth.getSelf(ctx, actor), await siteDirectory(ctx)) });
    },
  },
  {
    method: 'put',
    path: '/me/preferences',
    action: 'preferences.update',
    schemas: { body: preferencesSchema },
    async handler({ ctx, res, actor, body }) {
      res.json({ data: presentMe(await auth.updatePreferences(ctx, actor, body), await siteDirectory(ctx)) });
    },
  },
  {
    method: 'post',
    path: '/auth/password-reset',
    action: null,
    schemas: { body: resetRequestSchema },
    async handler({ ctx, req, res, body }) {
      await auth.requestPasswordReset(ctx, body.email, requestMeta(req));
      res.status(202).json({ data: { message: 'If an active account has this e-mail, a reset link is on its way. It works for 60 minutes.' } });
    },
  },
  {
    method: 'post',
    path: '/auth/password-reset/complete',
    action: null,
    schemas: { body: tokenPasswordSchema },
    async handler({ ctx, res, body }) {
      await auth.completePasswordReset(ctx, body);
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: '/auth/invitations/accept',
    action: null,
    schemas: { body: tokenPasswordSchema },
    async handler({ ctx, res, body }) {
      await auth.acceptInvitation(ctx, body);
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: '/setup',
    action: null,
    schemas: { body: setupSchema },
    async handler({ ctx, res, body }) {
      await auth.completeSetup(ctx, body);
      res.status(201).json({ data: { message: 'The first administrator is ready. Sign in.' } });
    },
  },
];
