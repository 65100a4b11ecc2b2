import { Router, type NextFunction, type Request, type Response } from 'express';
import { studyCreateSchema } from '../../src/validation/studies';
import type { Db } from '../db';
import { authOf, requireAuth } from '../middleware/auth';
import type { Study } from '../models';
import { createStudy, findStudy, listStudies, studyView } from '../services/studies-service';
import { validateBody } from '../validate';

type StudyLocals = { study: Study };

/** Resolves `:id` to a study of one of the user's teams, or answers 404. */
function loadStudy(db: Db) {
  return async (req: Request<{ id: string }>, res: Response, next: NextFunction) => {
    const id = /^\d{1,15}$/.test(req.params.id) ? Number(req.params.id) : NaN;
    (res.locals as StudyLocals).study = await findStudy(db, authOf(res).memberships, id);
    next();
  };
}

export function studiesRouter(db: Db) {
  const router = Router();
  router.use(requireAuth(db));

  router.get('/', async (_req, res) => {
    res.json({ studies: await listStudies(db, authOf(res).memberships) });
  });

  router.post('/', async (req, res) => {
    const input = validateBody(studyCreateSchema, req.body);
    const auth = authOf(res);
    const study = await createStudy(db, auth.user.id, auth.memberships, input);
    res.status(201).location(`/api/studies/${study.id}`).json({ study });
  });

  router.get('/:id', loadStudy(db), (_req, res) => {
    res.json({ study: studyView((res.locals as StudyLocals).study) });
  });

  return router;
}
