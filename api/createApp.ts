import { OpenAPIHono } from '@hono/zod-openapi';
import { bodyLimit } from 'hono/body-limit';
import { secureHeaders } from 'hono/secure-headers';
import { transactionalWrites } from './transactionalWrites.ts';
import { utf8JsonBodies } from './utf8JsonBodies.ts';
import type { Db } from '../db/Db.ts';
import type { AppEnv } from './AppEnv.ts';
import { authenticate } from './auth/authenticate.ts';
import { failedKeyLimiter } from './auth/failedKeyLimiter.ts';
import type { AppConfig } from './env.ts';
import { handleError } from './problem/handleError.ts';
import { problemResponse } from './problem/problemResponse.ts';
import { validationHook } from './problem/validationHook.ts';
import { labPages } from './pages/labPages.tsx';
import { annealingRoutes } from './routes/annealingRoutes.ts';
import { analysisRoutes } from './routes/analysisRoutes.ts';
import { calcRoutes } from './routes/calcRoutes.ts';
import { docsRoutes } from './routes/docsRoutes.ts';
import { keyRoutes } from './routes/keyRoutes.ts';
import { labArchiveRoutes } from './routes/labArchiveRoutes.ts';
import { materialRoutes } from './routes/materialRoutes.ts';
import { modelRoutes } from './routes/modelRoutes.ts';
import { readingRoutes } from './routes/readingRoutes.ts';
import { readingTransferRoutes } from './routes/readingTransferRoutes.ts';
import { trendRoutes } from './routes/trendRoutes.ts';

export interface AppDependencies {
  db: Db;
  config: AppConfig;
}

/** The whole HTTP surface; the database is passed in so tests can hand it a transaction. */
export function createApp({ db, config }: AppDependencies): OpenAPIHono<AppEnv> {
  const app = new OpenAPIHono<AppEnv>({ defaultHook: validationHook });
  app.onError(handleError);
  app.notFound((c) => problemResponse(404, 'not_found', `No route ${c.req.method} ${c.req.path}.`));
  app.use('*', secureHeaders());
  const keyLimiter = failedKeyLimiter({ limit: config.AUTH_FAILURE_LIMIT, windowS: config.AUTH_FAILURE_WINDOW_S });
  app.use('*', async (c, next) => {
    c.set('db', db);
    c.set('config', config);
    c.set('keyLimiter', keyLimiter);
    await next();
  });
  const importPaths = /\/import$/;
  const limitTo = (maxSize: number) => bodyLimit({ maxSize, onError: () => problemResponse(413, 'payload_too_large', `The body exceeds ${maxSize} bytes.`) });
  const importLimit = limitTo(config.IMPORT_LIMIT_BYTES);
  const otherLimit = limitTo(config.BODY_LIMIT_BYTES);
  app.use('/v1/*', async (c, next) => {
    // No route reads a GET body, and looking for one makes the adapter build a full Request.
    if (c.req.method === 'GET' || c.req.method === 'HEAD') return next();
    return (importPaths.test(c.req.path) ? importLimit : otherLimit)(c, next);
  });
  app.use('/v1/*', authenticate(keyLimiter));
  app.use('/v1/*', utf8JsonBodies(importPaths));
  app.use('/v1/*', transactionalWrites());

  app.get('/health', (c) => c.json({ status: 'ok' }));
  docsRoutes(app);
  keyRoutes(app);
  labArchiveRoutes(app);
  materialRoutes(app);
  modelRoutes(app);
  // Before readingRoutes: /v1/readings/export must not be taken for /v1/readings/{id}.
  readingTransferRoutes(app);
  readingRoutes(app);
  analysisRoutes(app);
  calcRoutes(app);
  trendRoutes(app);
  annealingRoutes(app);
  app.route('/lab', labPages());
  return app;
}
