import { Router } from 'express';
import { acceptInvitationSchema } from '../../src/validation/team';
import type { Deps } from '../deps';
import { authRateLimit } from '../middleware/rate-limit';
import { acceptInvitation, describeInvitation } from '../services/invitation-service';
import { sessionView } from '../services/auth-service';
import { validateBody } from '../validate';
import { establishSession } from './session';

/** Invitation links work without a session: the token is the credential. */
export function invitationsRouter(deps: Deps) {
  const router = Router();

  router.get('/:token', async (req, res) => {
    res.json({ invitation: await describeInvitation(deps, String(req.params.token)) });
  });
  router.post('/:token/accept', authRateLimit(deps, 'invitation'), async (req, res) => {
    const input = validateBody(acceptInvitationSchema, req.body);
    const userId = await acceptInvitation(deps, String(req.params.token), input, req.session.userId);
    await establishSession(req, userId);
    res.json(await sessionView(deps.db, userId));
  });

  return router;
}
