import type { RequestHandler } from 'express';
import type { AppContext } from '../context.js';
import { UnauthenticatedError } from '../errors.js';
import type { Actor } from '../policies/actor.js';
import { resolveSession, SESSION_COOKIE } from '../services/session.service.js';

/** Requires a live session; puts the actor in `res.locals.actor`. */
export function authenticate(ctx: AppContext): RequestHandler {
  return async (req, res, next) => {
    const actor = await resolveSession(ctx, req.cookies?.[SESSION_COOKIE] as string | undefined);
    if (!actor) return next(new UnauthenticatedError());
    res.locals.actor = actor;
    next();
  };
}

export function actorOf(res: { locals: Record<string, unknown> }): Actor {
  return res.locals.actor as Actor;
}
