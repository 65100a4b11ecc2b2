import express, { Router } from 'express';
import type { Config } from '../config';
import type { Db } from '../db';
import { accountsRouter } from './accounts';
import { sessionRouter } from './session';
import { studiesRouter } from './studies';

/** The JSON API, mounted at /api. Reads top to bottom by resource. */
export function apiRouter(db: Db, config: Config) {
  const api = Router();
  api.use(express.json({ limit: '2mb' }));

  api.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  api.use('/session', sessionRouter(db, config));
  api.use('/accounts', accountsRouter(db, config));
  api.use('/studies', studiesRouter(db));

  return api;
}
