import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { ValidationError } from '../errors.js';

export interface RequestSchemas {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
}

/** The input of a validated request, parsed by its schemas. */
export interface Parsed {
  params: unknown;
  query: unknown;
  body: unknown;
}

function firstIssue(error: z.ZodError, where: string): ValidationError {
  const issue = error.issues[0];
  if (!issue) return new ValidationError(`Invalid ${where}`);
  if (issue.code === 'unrecognized_keys') {
    const key = issue.keys[0] ?? '';
    const field = [...issue.path, key].join('.');
    return new ValidationError(`Unknown field "${field}"`, field, 'unknown_field');
  }
  const field = issue.path.map(String).join('.');
  const message = issue.code === 'invalid_type' && issue.input === undefined && field ? `${field} is required` : issue.message;
  return new ValidationError(message, field || undefined);
}

/** Parses params, query and body with the route's schemas; a failure is a 400 naming the field. */
export function validate(schemas: RequestSchemas): RequestHandler {
  return (req, res, next) => {
    const parsed: Parsed = { params: req.params, query: req.query, body: req.body };
    for (const where of ['params', 'query', 'body'] as const) {
      const schema = schemas[where];
      if (!schema) continue;
      const input = where === 'body' ? (req.body ?? {}) : req[where];
      const result = schema.safeParse(input);
      if (!result.success) return next(firstIssue(result.error, where));
      parsed[where] = result.data;
    }
    res.locals.parsed = parsed;
    next();
  };
}
