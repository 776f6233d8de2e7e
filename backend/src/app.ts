import { existsSync } from 'node:fs';
import { join } from 'node:path';
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import type { AppContext } from './context.js';
import { errorHandler } from './middleware/error-handler.js';
import { originCheck } from './middleware/origin-check.js';
import { demoMailPage } from './mail/demo-mail-page.js';
import { buildApiRouter } from './routes/registry.js';

export const JSON_BODY_LIMIT = '100kb';

/** The Express application: security headers, the API under /api, and the built client. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', ctx.config.trustProxy);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          mediaSrc: ["'self'", 'blob:'],
          styleSrc: ["'self'", "'unsafe-inline'"],
          scriptSrc: ["'self'"],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          upgradeInsecureRequests: ctx.config.publicBaseUrl.protocol === 'https:' ? [] : null,
        },
      },
      strictTransportSecurity: ctx.config.publicBaseUrl.protocol === 'https:',
    }),
  );
  app.use(cookieParser());
  const origins = [ctx.config.publicBaseUrl.origin, ...ctx.config.extraOrigins];
  app.use('/api', originCheck(origins), express.json({ limit: JSON_BODY_LIMIT, strict: true }), buildApiRouter(ctx));

  if (ctx.config.mode !== 'production' && ctx.config.mailDir) {
    const mailDir = ctx.config.mailDir;
    app.get('/demo/mail', (_req, res) => {
      res.type('html').send(demoMailPage(mailDir));
    });
  }

  const clientDir = ctx.config.clientDir;
  if (clientDir && existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h', setHeaders: noCacheForHtml }));
    app.get('/{*splat}', (_req, res) => {
      res.set('Cache-Control', 'no-cache').sendFile(join(clientDir, 'index.html'));
    });
  }
  app.use(errorHandler(ctx.logger));
  return app;
}

function noCacheForHtml(res: express.Response, path: string): void {
  if (path.endsWith('.html')) res.setHeader('Cache-Control', 'no-cache');
}
