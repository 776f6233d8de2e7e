import type { ErrorRequestHandler } from 'express';
import type { Logger } from 'pino';
import { AppError } from '../errors.js';

interface HttpParserError {
  type?: string;
  status?: number;
}

/** The one place errors become HTTP answers: `{ error: { code, message, field? } }`, never a stack. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (err instanceof AppError) {
      const details = err.details();
      res.set(err.headers).status(err.status).json({ error: { code: err.code, message: err.message, ...(err.field ? { field: err.field } : {}), ...(details ? { details } : {}) } });
      return;
    }
    const parser = err as HttpParserError;
    if (parser.type === 'entity.parse.failed') {
      res.status(400).json({ error: { code: 'malformed_json', message: 'The request body is not valid JSON' } });
      return;
    }
    if (parser.type === 'entity.too.large') {
      res.status(400).json({ error: { code: 'body_too_large', message: 'The request body is too large' } });
      return;
    }
    if (parser.type === 'encoding.unsupported' || parser.type === 'charset.unsupported') {
      res.status(415).json({ error: { code: 'unsupported_encoding', message: 'Send the body as UTF-8 JSON' } });
      return;
    }
    logger.error({ err, method: req.method, url: req.originalUrl }, 'unexpected error');
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on the server. The error was logged.' } });
  };
}
