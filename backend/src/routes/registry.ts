import { Router, type RequestHandler } from 'express';
import type { AppContext } from '../context.js';
import { NotFoundError } from '../errors.js';
import { actorOf, authenticate } from '../middleware/authenticate.js';
import { validate, type Parsed } from '../middleware/validate.js';
import { authorize } from '../policies/authorize.js';
import { assemblyRoutes } from './assemblies.router.js';
import { authRoutes } from './auth.router.js';
import { catalogueRoutes } from './catalogue.router.js';
import { registerRoutes } from './register.router.js';
import type { RouteDef } from './route.js';
import { userRoutes } from './users.router.js';

/** Every API route in one list: the routers are built from it and the route × role matrix test reads it. */
export const ROUTES: readonly RouteDef[] = [...authRoutes, ...userRoutes, ...registerRoutes, ...catalogueRoutes, ...assemblyRoutes];

export function buildApiRouter(ctx: AppContext): Router {
  const router = Router();
  for (const route of ROUTES) {
    const chain: RequestHandler[] = [];
    if (route.demoOnly && ctx.config.mode === 'production') continue;
    if (route.action) {
      const action = route.action;
      chain.push(authenticate(ctx), (_req, res, next) => {
        authorize(actorOf(res), action);
        next();
      });
    }
    chain.push(validate(route.schemas ?? {}));
    chain.push(async (req, res) => {
      const parsed = res.locals.parsed as Parsed;
      await route.handler({ ctx, req, res, ...parsed, actor: res.locals.actor } as Parameters<RouteDef['handler']>[0]);
    });
    router[route.method](route.path, ...chain);
  }
  router.use((req, _res, next) => next(new NotFoundError(`API route ${req.method} ${req.path}`)));
  return router;
}
