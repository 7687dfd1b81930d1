import express from 'express';
import fs from 'node:fs';
import path from 'node:path';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Sequelize } from 'sequelize';
import type { ServerConfig } from '@/server/config';
import { logger } from '@/server/lib/logger';
import { errorHandler, notFoundApi } from '@/server/middleware/error-handler';
import { authRoutes } from '@/server/routes/auth.routes';
import { healthRoutes } from '@/server/routes/health.routes';
import { usersRoutes } from '@/server/routes/users.routes';

export interface AppContext {
  sequelize: Sequelize;
  config: ServerConfig;
}

/** Builds the Express app; never listens (server/index.ts does). */
export function createApp(ctx: AppContext) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        // Only our own origin may supply scripts, styles, fonts, wasm and data; no third party is ever loaded.
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'", "'wasm-unsafe-eval'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'"],
          'media-src': ["'self'", 'blob:'],
          'worker-src': ["'self'", 'blob:'],
          'object-src': ["'none'"],
          'base-uri': ["'self'"],
          'frame-ancestors': ["'none'"],
          'form-action': ["'self'"],
        },
      },
      // Served over plain HTTP on loopback in development; a TLS proxy in front sets HSTS.
      strictTransportSecurity: false,
    }),
  );
  if (process.env.NODE_ENV !== 'test') app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));

  const api = express.Router();
  api.use(express.json({ limit: '256kb' }));
  api.use(healthRoutes(ctx));
  api.use(authRoutes(ctx));
  api.use(usersRoutes(ctx));
  api.use(notFoundApi);
  app.use('/api', api);

  const webDir = ctx.config.webDir;
  if (webDir && fs.existsSync(path.join(webDir, 'index.html'))) {
    app.use(express.static(webDir, { index: false, maxAge: '1h' }));
    // Client-side routes (e.g. /sites/3, /l/CODE) load the app shell on a hard refresh.
    app.get(/^(?!\/api\/).*/, (_req, res) => {
      res.set('Cache-Control', 'no-cache').sendFile(path.join(webDir, 'index.html'));
    });
  }
  app.use(errorHandler);
  return app;
}
