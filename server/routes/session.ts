import { Router, type Request } from 'express';
import { signInSchema } from '../../src/validation/auth';
import type { Deps } from '../deps';
import { requireAuth, authOf } from '../middleware/auth';
import { authRateLimit } from '../middleware/rate-limit';
import { signIn } from '../services/auth-service';
import { validateBody } from '../validate';

/** Starts a fresh session id for the signed-in user (no fixation of a pre-sign-in id). */
export function establishSession(req: Request, userId: number): Promise<void> {
  return new Promise((resolve, reject) => {
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = userId;
      req.session.save((e) => (e ? reject(e) : resolve()));
    });
  });
}

export function sessionRouter({ db, config }: Deps) {
  const router = Router();

  router.post('/', authRateLimit({ db, config }, 'sign-in'), async (req, res) => {
    const input = validateBody(signInSchema, req.body);
    const view = await signIn(db, input, config.bcryptCost);
    await establishSession(req, view.user.id);
    res.json(view);
  });

  router.get('/', requireAuth(db), (_req, res) => {
    res.json(authOf(res));
  });

  router.delete('/', async (req, res) => {
    await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
    res.clearCookie('junctura.sid', { path: '/' });
    res.status(204).end();
  });

  return router;
}
