import { Router } from 'express';
import { signUpSchema } from '../../src/validation/auth';
import type { Deps } from '../deps';
import { authRateLimit } from '../middleware/rate-limit';
import { signUp } from '../services/auth-service';
import { validateBody } from '../validate';
import { establishSession } from './session';

export function accountsRouter({ db, config }: Deps) {
  const router = Router();

  router.post('/', authRateLimit({ db, config }, 'sign-up'), async (req, res) => {
    const input = validateBody(signUpSchema, req.body);
    const view = await signUp(db, input, config.bcryptCost);
    await establishSession(req, view.user.id);
    res.status(201).json(view);
  });

  return router;
}
