import express, { Router } from 'express';
import type { Deps } from '../deps';
import { heatsinks } from '../services/heatsinks';
import { interfaceMaterials } from '../services/interface-materials';
import { accountsRouter } from './accounts';
import { catalogueRouter } from './catalogue';
import { invitationsRouter } from './invitations';
import { outboxRouter } from './outbox';
import { partsRouter } from './parts';
import { passwordResetsRouter } from './password-resets';
import { sessionRouter } from './session';
import { solveRouter } from './solve';
import { studiesRouter } from './studies';
import { teamsRouter } from './teams';

/** The JSON API, mounted at /api. Reads top to bottom by resource. */
export function apiRouter(deps: Deps) {
  const api = Router();
  api.use(express.json({ limit: '2mb' }));

  api.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  api.use('/session', sessionRouter(deps));
  api.use('/accounts', accountsRouter(deps));
  api.use('/password-resets', passwordResetsRouter(deps));
  api.use('/invitations', invitationsRouter(deps));
  api.use('/teams', teamsRouter(deps));
  api.use('/studies', studiesRouter(deps));
  api.use('/parts', partsRouter(deps));
  api.use('/heatsinks', catalogueRouter(deps, heatsinks as never, 'heatsinks.csv'));
  api.use('/interface-materials', catalogueRouter(deps, interfaceMaterials as never, 'interface-materials.csv'));
  api.use('/solve', solveRouter(deps));
  api.use('/outbox', outboxRouter(deps));

  return api;
}
