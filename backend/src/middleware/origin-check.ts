import type { RequestHandler } from 'express';
import { ForbiddenError } from '../errors.js';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Refuses a mutating request whose Origin (or, failing that, Referer) is not one of ours. */
export function originCheck(allowed: string[]): RequestHandler {
  const origins = new Set(allowed);
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    const origin = req.get('origin') ?? originOf(req.get('referer'));
    if (!origin || !origins.has(origin)) {
      return next(new ForbiddenError('This request did not come from Ferrule’s own pages', 'origin_refused'));
    }
    next();
  };
}

function originOf(url: string | undefined): string | undefined {
  if (!url) return undefined;
  try {
    return new URL(url).origin;
  } catch {
    return undefined;
  }
}
