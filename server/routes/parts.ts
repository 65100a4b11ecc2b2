import { Router } from 'express';
import type { Deps } from '../deps';
import { requireAuth } from '../middleware/auth';
import { fitZthCsv, parts, soaCurvesCsv } from '../services/parts';
import { catalogueRouter, parseMapping, receiveFile } from './catalogue';

/**
 * The parts library (the catalogue routes), plus two helpers for entering datasheet curves:
 * a Zth(t) CSV fitted to a Foster set, and SOA boundary points grouped by pulse width. Both
 * answer without saving; the client shows them and saves the part.
 */
export function partsRouter(deps: Deps) {
  const router = Router();
  const tools = Router();
  tools.use(requireAuth(deps.db));

  tools.post('/zth-fit', async (req, res) => {
    const buffer = await receiveFile(req, res);
    const body = (req.body ?? {}) as Record<string, unknown>;
    const mapping = body.mapping ? parseMapping(body.mapping) : undefined;
    const perDecade = body.perDecade === undefined ? undefined : Number(body.perDecade);
    res.json(fitZthCsv(buffer, mapping as never, perDecade));
  });
  tools.post('/soa-points', async (req, res) => {
    const buffer = await receiveFile(req, res);
    const body = (req.body ?? {}) as Record<string, unknown>;
    res.json({ curves: soaCurvesCsv(buffer, body.mapping ? (parseMapping(body.mapping) as never) : undefined) });
  });

  router.use('/', tools);
  router.use('/', catalogueRouter(deps, parts as never, 'parts.csv'));
  return router;
}
