import { Router, type NextFunction, type Request, type Response } from 'express';
import * as yup from 'yup';
import { commentSchema, reviewSchema, studyCreateSchema, studySaveSchema } from '../../src/validation/studies';
import { toleranceSchema } from '../../src/validation/tolerance';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { authOf, requireAuth } from '../middleware/auth';
import type { Study } from '../models';
import { addComment, deleteComment, listComments } from '../services/comments-service';
import { listReviews, reviewStudy, submitForReview } from '../services/review-service';
import { listRevisions, restoreRevision, revisionView } from '../services/revisions-service';
import { rankStudy } from '../services/ranking-service';
import { solveDocument } from '../services/study-document';
import { sweepStudy } from '../services/tolerance-service';
import { createStudy, deleteStudy, duplicateStudy, findStudy, listStudies, saveStudy, studyView } from '../services/studies-service';
import { validateBody } from '../validate';
import { idParam } from './params';

const restoreSchema = yup.object({ baseVersion: yup.number().integer().min(1).required('baseVersion is required') }).noUnknown(true, 'Unknown field: ${unknown}');

/** Resolves `:id` to a study of one of the user's teams, or answers 404. */
function loadStudy(deps: Deps) {
  return async (req: Request, res: Response, next: NextFunction) => {
    res.locals.study = await findStudy(deps.db, authOf(res).memberships, idParam(req.params.id as string));
    next();
  };
}
const studyOf = (res: Response) => res.locals.study as Study;

export function studiesRouter(deps: Deps) {
  const { db } = deps;
  const router = Router();
  router.use(requireAuth(db));
  const load = loadStudy(deps);

  // Studies
  router.get('/', async (_req, res) => {
    res.json({ studies: await listStudies(db, authOf(res).memberships) });
  });
  router.post('/', async (req, res) => {
    const study = await createStudy(db, authOf(res), validateBody(studyCreateSchema, req.body));
    res.status(201).location(`/api/studies/${study.id}`).json({ study });
  });
  router.get('/:id', load, async (_req, res) => {
    res.json({ study: await studyView(db, studyOf(res)) });
  });
  router.put('/:id', load, async (req, res) => {
    res.json({ study: await saveStudy(db, authOf(res), studyOf(res), validateBody(studySaveSchema, req.body)) });
  });
  router.delete('/:id', load, async (_req, res) => {
    await deleteStudy(db, authOf(res), studyOf(res));
    res.status(204).end();
  });
  router.post('/:id/duplicate', load, async (_req, res) => {
    const study = await duplicateStudy(db, authOf(res), studyOf(res));
    res.status(201).location(`/api/studies/${study.id}`).json({ study });
  });

  router.get('/:id/result', load, (_req, res) => {
    const study = studyOf(res);
    if (!study.document) throw new AppError(409, 'no_document', 'This study has no study document to solve yet');
    res.json({ version: study.version, result: solveDocument(study.document) });
  });

  router.get('/:id/ranking', load, async (req, res) => {
    const q = req.query as Record<string, string | undefined>;
    const num = (name: string) => {
      if (q[name] === undefined || q[name] === '') return undefined;
      const v = Number(q[name]);
      if (!Number.isFinite(v)) throw new AppError(400, 'validation_failed', `${name}: must be a number`, [{ path: name, message: 'must be a number' }]);
      return v;
    };
    res.json(await rankStudy(db, studyOf(res), { sinkId: q.sink, sortBy: q.sort, airSpeedMPerS: num('airSpeed'), ambientC: num('ambientC'), marginK: num('marginK') }));
  });

  // Any member may sweep: it reads the study and writes nothing.
  router.post('/:id/tolerance', load, async (req, res) => {
    res.json(await sweepStudy(studyOf(res), validateBody(toleranceSchema, req.body)));
  });

  // Review
  router.post('/:id/submit', load, async (_req, res) => {
    res.json({ study: await submitForReview(deps, authOf(res), studyOf(res)) });
  });
  router.post('/:id/review', load, async (req, res) => {
    res.json({ study: await reviewStudy(deps, authOf(res), studyOf(res), validateBody(reviewSchema, req.body)) });
  });
  router.get('/:id/reviews', load, async (_req, res) => {
    res.json({ reviews: await listReviews(deps, studyOf(res)) });
  });

  // Revisions
  router.get('/:id/revisions', load, async (_req, res) => {
    res.json({ revisions: await listRevisions(db, studyOf(res)) });
  });
  router.get('/:id/revisions/:number', load, async (req, res) => {
    res.json(await revisionView(db, studyOf(res), idParam(req.params.number as string)));
  });
  router.post('/:id/revisions/:number/restore', load, async (req, res) => {
    const { baseVersion } = validateBody(restoreSchema, req.body);
    res.json({ study: await restoreRevision(db, authOf(res), studyOf(res), idParam(req.params.number as string), baseVersion) });
  });

  // Comments
  router.get('/:id/comments', load, async (_req, res) => {
    res.json({ comments: await listComments(db, studyOf(res)) });
  });
  router.post('/:id/comments', load, async (req, res) => {
    res.status(201).json({ comment: await addComment(db, authOf(res), studyOf(res), validateBody(commentSchema, req.body)) });
  });
  router.delete('/:id/comments/:commentId', load, async (req, res) => {
    await deleteComment(db, authOf(res), studyOf(res), idParam(req.params.commentId as string));
    res.status(204).end();
  });

  return router;
}
