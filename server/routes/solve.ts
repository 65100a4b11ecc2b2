import { Router } from 'express';
import type { Deps } from '../deps';
import { requireAuth } from '../middleware/auth';
import { solveDocument } from '../services/study-document';
import { AppError } from '../errors';

/** Solves a study document that need not be saved (what-if from the editor, the command line's twin). */
export function solveRouter({ db }: Deps) {
  const router = Router();
  router.use(requireAuth(db));

  router.post('/', (req, res) => {
    const body = req.body as { document?: unknown } | undefined;
    if (!body || typeof body !== 'object' || body.document === undefined) {
      throw AppError.badRequest('document: is required', [{ path: 'document', message: 'is required' }]);
    }
    res.json({ result: solveDocument(body.document) });
  });

  return router;
}
