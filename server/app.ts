import compression from 'compression';
import express from 'express';
import fs from 'node:fs';
import path from 'node:path';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Sequelize } from 'sequelize';
import type { ServerConfig } from '@/server/config';
import { logger, redactUrl } from '@/server/lib/logger';
import type { Logger } from 'pino';
import { errorHandler, notFoundApi } from '@/server/middleware/error-handler';
import { authRoutes } from '@/server/routes/auth.routes';
import { calcRoutes } from '@/server/routes/calc.routes';
import { heatingSystemsRoutes } from '@/server/routes/heating-systems.routes';
import { readingsRoutes } from '@/server/routes/readings.routes';
import { healthRoutes } from '@/server/routes/health.routes';
import { labelsRoutes } from '@/server/routes/labels.routes';
import { tagsRoutes } from '@/server/routes/tags.routes';
import { procedureReviewsRoutes } from '@/server/routes/procedure-reviews.routes';
import { usersRoutes } from '@/server/routes/users.routes';
import { createPhotoStorage } from '@/server/lib/create-photo-storage';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import type { LauncherStatus } from '@/server/services/health.service';
import { assetsRoutes } from '@/server/routes/assets.routes';
import { photosRoutes } from '@/server/routes/photos.routes';
import { plantRoomsRoutes } from '@/server/routes/plant-rooms.routes';
import { sitesRoutes } from '@/server/routes/sites.routes';
import { boardRoutes } from '@/server/routes/board.routes';
import { auditRoutes } from '@/server/routes/audit.routes';
import { connectionsRoutes } from '@/server/routes/connections.routes';
import { meRoutes } from '@/server/routes/me.routes';
import { visitsRoutes } from '@/server/routes/visits.routes';
import { webStatic } from '@/server/lib/web-static';

export interface AppContext {
  sequelize: Sequelize;
  config: ServerConfig;
  /** Photo files; made from config.storage when not given. */
  storage?: PhotoStorage;
  /** The state of the private mariadbd when this process launched it, for /api/health. */
  launcher?: () => LauncherStatus;
  /** Where request lines go; by default the server's logger (none under NODE_ENV=test). */
  requestLog?: Logger;
}

/** Builds the Express app; never listens (server/index.ts does). */
export function createApp(ctx: AppContext) {
  ctx = { ...ctx, storage: ctx.storage ?? createPhotoStorage(ctx.config) };
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
  const log = ctx.requestLog ?? (process.env.NODE_ENV === 'test' ? null : logger);
  if (log) app.use(
      pinoHttp({
        logger: log,
        autoLogging: { ignore: (req) => req.url === '/api/health' },
        // One short line per request: no headers, and one-time tokens cut out of the URL.
        serializers: { req: (req) => ({ method: req.method, url: redactUrl(req.url) }), res: (res) => ({ statusCode: res.statusCode }) },
      }),
    );

  // gzip or brotli for JSON, CSV and the app shell when the browser asks; built files come precompressed (web-static).
  app.use(compression());

  const api = express.Router();
  api.use(express.json({ limit: '256kb' }));
  api.use(healthRoutes(ctx));
  api.use(authRoutes(ctx));
  api.use(usersRoutes(ctx));
  api.use(sitesRoutes(ctx));
  api.use(plantRoomsRoutes(ctx));
  api.use(assetsRoutes(ctx));
  api.use(connectionsRoutes(ctx));
  api.use(photosRoutes(ctx));
  api.use(calcRoutes(ctx));
  api.use(readingsRoutes(ctx));
  api.use(heatingSystemsRoutes(ctx));
  api.use(labelsRoutes(ctx));
  api.use(tagsRoutes(ctx));
  api.use(procedureReviewsRoutes(ctx));
  api.use(boardRoutes(ctx));
  api.use(auditRoutes(ctx));
  api.use(visitsRoutes(ctx));
  api.use(meRoutes(ctx));
  api.use(notFoundApi);
  app.use('/api', api);

  const webDir = ctx.config.webDir;
  if (webDir && fs.existsSync(path.join(webDir, 'index.html'))) app.use(webStatic(webDir));
  app.use(errorHandler);
  return app;
}
