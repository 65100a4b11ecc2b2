import fs from 'node:fs';
import path from 'node:path';
import connectSessionSequelize from 'connect-session-sequelize';
import cors from 'cors';
import express from 'express';
import session from 'express-session';
import helmet from 'helmet';
import type { Config } from './config';
import { createDb, type Db } from './db';
import type { Deps } from './deps';
import { createMailer } from './mail/mailer';
import { AppError, errorHandler, notFoundHandler } from './errors';
import { sameOrigin } from './middleware/same-origin';
import { apiRouter } from './routes';

const SequelizeStore = connectSessionSequelize(session.Store);

export const SESSION_COOKIE = 'junctura.sid';
// Fixed lifetime: a rolling session would write the session row on every request.
const SESSION_MAX_AGE_MS = 14 * 24 * 3600 * 1000;

/** `stop` ends the app's timers (the session sweep); `close` also closes the database. */
export type AppLocals = { db: Db; stop: () => void; close: () => Promise<void> };

/**
 * Builds the Express app: JSON API under /api and, when it has been exported, the web app.
 * Opens no connection by itself; the database is touched on the first request.
 */
export function createApp(config: Config, db: Db = createDb(config.databaseUrl, { poolMax: config.databasePoolMax })) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);

  const store = new SequelizeStore({ db: db.sequelize, checkExpirationInterval: 15 * 60 * 1000, expiration: SESSION_MAX_AGE_MS });

  // The exported web app's inline bootstrap and react-native-web's style tags need these sources.
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'script-src': ["'self'", "'unsafe-inline'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'"],
          'worker-src': ["'self'", 'blob:'],
        },
      },
    }),
  );

  app.use(
    session({
      name: SESSION_COOKIE,
      secret: config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      rolling: false,
      // With a hop count, Express's own trust proxy rule decides whether the request was secure.
      proxy: typeof config.trustProxy === 'number' ? undefined : config.trustProxy,
      cookie: { httpOnly: true, sameSite: 'lax', secure: 'auto', maxAge: SESSION_MAX_AGE_MS, path: '/' },
    }),
  );

  if (config.corsOrigins.length > 0) app.use('/api', cors({ origin: config.corsOrigins, credentials: true }));
  const deps: Deps = { db, config, mailer: createMailer(db, { smtpUrl: config.smtpUrl, from: config.mailFrom }) };
  app.use('/api', sameOrigin([config.appUrl, ...config.corsOrigins]));
  app.use('/api', apiRouter(deps));
  app.use('/api', (req, _res, next) => next(new AppError(404, 'not_found', `No route for ${req.method} /api${req.path}`)));

  const indexHtml = path.join(config.webDir, 'index.html');
  if (fs.existsSync(indexHtml)) {
    app.use('/_expo', express.static(path.join(config.webDir, '_expo'), { immutable: true, maxAge: '365d' }));
    app.use(express.static(config.webDir, { index: false, maxAge: 0 }));
    // Client-side routes: every other GET gets the single-page app.
    app.get('/{*splat}', (_req, res) => {
      res.sendFile(indexHtml);
    });
  }

  app.use(notFoundHandler);
  app.use(errorHandler);

  const stop = () => (store as unknown as { stopExpiringSessions: () => void }).stopExpiringSessions();
  const locals: AppLocals = {
    db,
    stop,
    close: async () => {
      stop();
      await db.sequelize.close();
    },
  };
  Object.assign(app.locals, locals);
  return app;
}
