import type { Request, Response } from 'express';
import type { Action } from '../../../shared/src/permissions.js';
import type { AppContext } from '../context.js';
import type { RequestSchemas } from '../middleware/validate.js';
import type { Actor } from '../policies/actor.js';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface HandlerInput<P = any, Q = any, B = any> {
  ctx: AppContext;
  req: Request;
  res: Response;
  params: P;
  query: Q;
  body: B;
  /** Present on every route that names an action. */
  actor: Actor;
}

/**
 * One API route: its method, path under /api, the action it takes (null for the few public
 * routes), the schemas of its input and its handler. The registry builds the routers from these.
 */
export interface RouteDef {
  method: Method;
  path: string;
  action: Action | null;
  schemas?: RequestSchemas;
  /** Only answered in demo mode. */
  demoOnly?: boolean;
  /** A multipart upload of one file under `field`, at most `maxBytes`; it arrives as `req.file`. */
  upload?: { field: string; maxBytes: number };
  handler: (input: HandlerInput) => Promise<void> | void;
}

export function requestMeta(req: Request) {
  return { ip: req.ip ?? null, userAgent: req.get('user-agent') ?? null };
}
