import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import type { AppContext } from '../context.js';
import { NotFoundError, ValidationError } from '../errors.js';
import { actorOf, authenticate } from '../middleware/authenticate.js';
import { validate, type Parsed } from '../middleware/validate.js';
import { authorize } from '../policies/authorize.js';
import { assemblyRoutes } from './assemblies.router.js';
import { authRoutes } from './auth.router.js';
import { catalogueRoutes } from './catalogue.router.js';
import { csvRoutes } from './csv.router.js';
import { registerRoutes } from './register.router.js';
import type { RouteDef } from './route.js';
import { userRoutes } from './users.router.js';

/** Every API route in one list: the routers are built from it and the route × role matrix test reads it. */
export const ROUTES: readonly RouteDef[] = [...authRoutes, ...userRoutes, ...registerRoutes, ...catalogueRoutes, ...csvRoutes, ...assemblyRoutes];

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
    if (route.upload) chain.push(uploadOne(route.upload.field, route.upload.maxBytes));
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

/** Takes one file from a multipart body into memory, refusing a larger one with a 400 on its field. */
function uploadOne(field: string, maxBytes: number): RequestHandler {
  const parse = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 20 } }).single(field);
  return (req, res, next) => {
    parse(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        const message = err.code === 'LIMIT_FILE_SIZE' ? `The file is larger than ${Math.round(maxBytes / 1_048_576)} MB` : `The upload was refused: ${err.message}`;
        return next(new ValidationError(message, field, err.code === 'LIMIT_FILE_SIZE' ? 'file_too_large' : 'bad_upload'));
      }
      next(err);
    });
  };
}
