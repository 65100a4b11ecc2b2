import { Router, type NextFunction, type Request, type Response } from 'express';
import { invitationSchema, roleChangeSchema } from '../../src/validation/team';
import { teamSettingsSchema } from '../../src/validation/team-settings';
import type { Deps } from '../deps';
import { authOf, requireAuth } from '../middleware/auth';
import type { Role } from '../models';
import { listEvents } from '../services/audit-service';
import { invite, listInvitations, revokeInvitation } from '../services/invitation-service';
import { membershipIn, requireRole } from '../services/permissions';
import { changeRole, listMembers, removeMember } from '../services/team-service';
import { getTeamSettings, updateTeamSettings } from '../services/team-settings-service';
import { AppError } from '../errors';
import { validateBody } from '../validate';
import { idParam } from './params';

/** Resolves `:teamId` to one of the user's teams, or answers 404. */
function loadTeam(req: Request, res: Response, next: NextFunction) {
  res.locals.teamId = membershipIn(authOf(res), idParam(req.params.teamId as string)).teamId;
  next();
}
const teamOf = (res: Response) => res.locals.teamId as number;

/**
 * `baseVersion` of a settings save (the version the owner read), kept apart from the settings:
 * when given, the save must be on top of it. A body that is not an object is left to validateBody.
 */
function splitBaseVersion(raw: unknown): { baseVersion: number | undefined; body: unknown } {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw) || !('baseVersion' in raw)) return { baseVersion: undefined, body: raw };
  const { baseVersion, ...body } = raw as Record<string, unknown>;
  if (typeof baseVersion !== 'number' || !Number.isInteger(baseVersion) || baseVersion < 0) {
    const message = 'must be a whole number ≥ 0: the version of the settings the change was made on';
    throw AppError.badRequest(`baseVersion: ${message}`, [{ path: 'baseVersion', message }]);
  }
  return { baseVersion, body };
}

export function teamsRouter(deps: Deps) {
  const { db } = deps;
  const router = Router();
  router.use(requireAuth(db));

  router.get('/', (_req, res) => {
    res.json({ teams: authOf(res).memberships });
  });

  // Members
  router.get('/:teamId/members', loadTeam, async (_req, res) => {
    res.json({ members: await listMembers(db, teamOf(res)) });
  });
  router.patch('/:teamId/members/:userId', loadTeam, async (req, res) => {
    const { role } = validateBody(roleChangeSchema, req.body);
    await changeRole(db, authOf(res), teamOf(res), idParam(req.params.userId as string), role as Role);
    res.json({ members: await listMembers(db, teamOf(res)) });
  });
  router.delete('/:teamId/members/:userId', loadTeam, async (req, res) => {
    await removeMember(db, authOf(res), teamOf(res), idParam(req.params.userId as string));
    res.status(204).end();
  });

  // Invitations
  router.get('/:teamId/invitations', loadTeam, async (_req, res) => {
    res.json({ invitations: await listInvitations(deps, authOf(res), teamOf(res)) });
  });
  router.post('/:teamId/invitations', loadTeam, async (req, res) => {
    res.status(201).json({ invitation: await invite(deps, authOf(res), teamOf(res), validateBody(invitationSchema, req.body)) });
  });
  router.delete('/:teamId/invitations/:invitationId', loadTeam, async (req, res) => {
    await revokeInvitation(deps, authOf(res), teamOf(res), idParam(req.params.invitationId as string));
    res.status(204).end();
  });

  // Defaults for new studies: every member reads them, owners change them
  router.get('/:teamId/settings', loadTeam, async (_req, res) => {
    res.json(await getTeamSettings(db, authOf(res), teamOf(res)));
  });
  router.put('/:teamId/settings', loadTeam, async (req, res) => {
    requireRole(membershipIn(authOf(res), teamOf(res)), ['owner'], 'Only owners change the team settings');
    const { baseVersion, body } = splitBaseVersion(req.body);
    res.json(await updateTeamSettings(db, authOf(res), teamOf(res), validateBody(teamSettingsSchema, body), baseVersion));
  });

  // Activity
  router.get('/:teamId/activity', loadTeam, async (_req, res) => {
    requireRole(membershipIn(authOf(res), teamOf(res)), ['owner'], 'Only owners read the activity log');
    res.json({ events: await listEvents(db, teamOf(res)) });
  });

  return router;
}
