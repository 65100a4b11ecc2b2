import { Op } from 'sequelize';
import type { AcceptInvitationInput, InvitationInput } from '../../src/validation/team';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { invitationMail } from '../mail/templates';
import type { Invitation, Role } from '../models';
import { recordEvent } from './audit-service';
import { hashPassword, verifyPassword, type SessionView } from './auth-service';
import { membershipIn, requireRole } from './permissions';
import { hashToken, newToken } from './tokens';

export const INVITATION_TTL_MS = 7 * 24 * 3600 * 1000;

const view = (i: Invitation) => ({
  id: i.id,
  email: i.email,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  createdAt: i.createdAt.toISOString(),
  invitedBy: i.invitedBy ? { id: i.invitedBy.id, name: i.invitedBy.name } : null,
});

export async function listInvitations(deps: Deps, auth: SessionView, teamId: number) {
  requireRole(membershipIn(auth, teamId), ['owner'], 'Only owners see invitations');
  const rows = await deps.db.models.Invitation.findAll({
    where: { teamId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ association: 'invitedBy', attributes: ['id', 'name'] }],
    order: [['id', 'DESC']],
  });
  return rows.map(view);
}

/** Creates a single-use link and mails it; the token itself is never stored. */
export async function invite(deps: Deps, auth: SessionView, teamId: number, input: InvitationInput, now = new Date()) {
  const { db } = deps;
  const m = membershipIn(auth, teamId);
  requireRole(m, ['owner'], 'Only owners invite members');
  const existing = await db.models.User.findOne({ where: { email: input.email } });
  if (existing && (await db.models.Membership.count({ where: { teamId, userId: existing.id } })) > 0) {
    throw new AppError(409, 'already_member', `${input.email} is already a member of this team`, [{ path: 'email', message: 'is already a member' }]);
  }
  const { token, hash } = newToken();
  const expiresAt = new Date(now.getTime() + INVITATION_TTL_MS);
  const invitation = await db.sequelize.transaction(async (transaction) => {
    const i = await db.models.Invitation.create({ teamId, invitedById: auth.user.id, email: input.email, role: input.role as Role, tokenHash: hash, expiresAt }, { transaction });
    await recordEvent(db, { teamId, actorId: auth.user.id, action: 'invitation.sent', subjectType: 'invitation', subjectId: i.id, details: { email: input.email, role: input.role } }, transaction);
    return i;
  });
  await deps.mailer.send(
    invitationMail(input.email, { teamName: m.teamName, role: input.role, inviter: auth.user.name, link: `${deps.config.appUrl}/invitations/${token}`, expiresAt }),
  );
  return view(invitation);
}

export async function revokeInvitation(deps: Deps, auth: SessionView, teamId: number, invitationId: number) {
  requireRole(membershipIn(auth, teamId), ['owner'], 'Only owners revoke invitations');
  const i = Number.isSafeInteger(invitationId) ? await deps.db.models.Invitation.findOne({ where: { id: invitationId, teamId, acceptedAt: null } }) : null;
  if (!i) throw AppError.notFound('Invitation');
  await deps.db.sequelize.transaction(async (transaction) => {
    await i.update({ revokedAt: new Date() }, { transaction });
    await recordEvent(deps.db, { teamId, actorId: auth.user.id, action: 'invitation.revoked', subjectType: 'invitation', subjectId: i.id, details: { email: i.email, role: i.role } }, transaction);
  });
}

/** Resolves a link to a usable invitation; used, revoked, expired and unknown links are told apart only as "gone". */
async function usableInvitation(deps: Deps, token: string, now = new Date()) {
  const i = await deps.db.models.Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    include: [
      { association: 'team', attributes: ['id', 'name'] },
      { association: 'invitedBy', attributes: ['id', 'name'] },
    ],
  });
  if (!i) throw AppError.notFound('Invitation');
  if (i.acceptedAt || i.revokedAt || i.expiresAt <= now) {
    throw new AppError(410, 'invitation_gone', 'This invitation link has been used, withdrawn or has expired: ask for a new one');
  }
  return i;
}

export async function describeInvitation(deps: Deps, token: string) {
  const i = await usableInvitation(deps, token);
  const accountExists = (await deps.db.models.User.count({ where: { email: i.email } })) > 0;
  return { teamId: i.teamId, teamName: i.team!.name, role: i.role, email: i.email, invitedBy: i.invitedBy?.name ?? null, expiresAt: i.expiresAt.toISOString(), accountExists };
}

/**
 * Accepts the invitation: a new address gives a name and password and gets an account; an
 * existing account proves itself by being signed in as that address or by its password.
 * Answers the user id to sign in.
 */
export async function acceptInvitation(deps: Deps, token: string, input: AcceptInvitationInput, signedInUserId?: number): Promise<number> {
  const { db, config } = deps;
  const i = await usableInvitation(deps, token);
  const user = await db.models.User.findOne({ where: { email: i.email } });
  if (user) {
    const provedBySession = signedInUserId === user.id;
    const provedByPassword = !!input.password && (await verifyPassword(input.password, user.passwordHash));
    if (!provedBySession && !provedByPassword) {
      throw new AppError(401, 'invalid_credentials', `Sign in as ${i.email} or give that account's password to accept`, [
        { path: 'password', message: 'is not the password of the invited account' },
      ]);
    }
  } else {
    const details = [];
    if (!input.name) details.push({ path: 'name', message: 'Name is required' });
    if (!input.password || input.password.length < 10) details.push({ path: 'password', message: 'Password needs at least 10 characters' });
    if (details.length) throw AppError.badRequest(details.map((d) => `${d.path}: ${d.message}`).join('; '), details);
  }
  const passwordHash = user ? null : await hashPassword(input.password!, config.bcryptCost);
  const userId = await db.sequelize.transaction(async (transaction) => {
    // Claim the link first so two simultaneous accepts cannot both succeed.
    const [claimed] = await db.models.Invitation.update({ acceptedAt: new Date() }, { where: { id: i.id, acceptedAt: null }, transaction });
    if (claimed === 0) throw new AppError(410, 'invitation_gone', 'This invitation link has already been used');
    // A local, not `user`: on PostgreSQL a transaction may run again after a deadlock.
    const member = user ?? (await db.models.User.create({ email: i.email, name: input.name!, passwordHash: passwordHash! }, { transaction }));
    const already = await db.models.Membership.findOne({ where: { teamId: i.teamId, userId: member.id }, transaction });
    if (!already) await db.models.Membership.create({ teamId: i.teamId, userId: member.id, role: i.role }, { transaction });
    await recordEvent(db, { teamId: i.teamId, actorId: member.id, action: 'invitation.accepted', subjectType: 'invitation', subjectId: i.id, details: { email: i.email, role: i.role } }, transaction);
    return member.id;
  });
  return userId;
}
