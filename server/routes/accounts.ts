import { Router } from 'express';
import { signUpSchema } from '../../src/validation/auth';
import type { Config } from '../config';
import type { Db } from '../db';
import { signUp } from '../services/auth-service';
import { validateBody } from '../validate';
import { establishSession } from './session';

export function accountsRouter(db: Db, config: Config) {
  const router = Router();

  router.post('/', async (req, res) => {
    const input = validateBody(signUpSchema, req.body);
    const view = await signUp(db, input, config.bcryptCost);
    await establishSession(req, view.user.id);
    res.status(201).json(view);
  });

  return router;
}
