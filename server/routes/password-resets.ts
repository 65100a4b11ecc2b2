import { Router } from 'express';
import { passwordResetRequestSchema, passwordResetSchema } from '../../src/validation/team';
import type { Deps } from '../deps';
import { authRateLimit } from '../middleware/rate-limit';
import { requestPasswordReset, resetPassword } from '../services/password-service';
import { validateBody } from '../validate';

export function passwordResetsRouter(deps: Deps) {
  const router = Router();
  router.use(authRateLimit(deps, 'password-reset'));

  // Same answer whether or not the address has an account.
  router.post('/', async (req, res) => {
    const { email } = validateBody(passwordResetRequestSchema, req.body);
    await requestPasswordReset(deps, email);
    res.status(202).json({ message: 'If this address has an account, a reset link is on its way.' });
  });
  router.post('/:token', async (req, res) => {
    const { password } = validateBody(passwordResetSchema, req.body);
    await resetPassword(deps, String(req.params.token), password);
    res.status(204).end();
  });

  return router;
}
