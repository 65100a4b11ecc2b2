import { Op, type Transaction } from 'sequelize';
import type { Db } from '../db';
import { AppError } from '../errors';
import type { Role } from '../models';
import { recordEvent } from './audit-service';
import type { SessionView } from './auth-service';
import { membershipIn, requireRole } from './permissions';

export async function listMembers(db: Db, teamId: number) {
  const rows = await db.models.Membership.findAll({
    where: { teamId },
    include: [{ association: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['id', 'ASC']],
  });
  return rows.map((m) => ({ userId: m.userId, name: m.user!.name, email: m.user!.email, role: m.role, since: m.createdAt.toISOString() }));
}

async function findMembership(db: Db, teamId: number, userId: number) {
  const m = Number.isSafeInteger(userId) ? await db.models.Membership.findOne({ where: { teamId, userId } }) : null;
  if (!m) throw AppError.notFound('Member');
  return m;
}

async function otherOwners(db: Db, teamId: number, userId: number, transaction?: Transaction) {
  return db.models.Membership.count({ where: { teamId, role: 'owner', userId: { [Op.ne]: userId } }, transaction });
}

/**
 * Re-reads the membership inside the transaction after locking the team's row, so two owners
 * stepping down at once (from any server process) cannot both pass the last-owner check. On
 * PostgreSQL the row lock orders them; SQLite runs write transactions one at a time anyway.
 */
async function lockedMembership(db: Db, teamId: number, userId: number, transaction: Transaction) {
  await db.models.Team.findByPk(teamId, { transaction, lock: transaction.LOCK.UPDATE });
  const m = await db.models.Membership.findOne({ where: { teamId, userId }, transaction });
  if (!m) throw AppError.notFound('Member');
  return m;
}

const lastOwner = () => new AppError(409, 'last_owner', 'A team keeps at least one owner: make someone else owner first');

export async function changeRole(db: Db, auth: SessionView, teamId: number, userId: number, role: Role) {
  requireRole(membershipIn(auth, teamId), ['owner'], 'Only owners change roles');
  await findMembership(db, teamId, userId);
  const user = await db.models.User.findByPk(userId);
  await db.sequelize.transaction(async (transaction) => {
    const m = await lockedMembership(db, teamId, userId, transaction);
    if (m.role === 'owner' && role !== 'owner' && (await otherOwners(db, teamId, userId, transaction)) === 0) throw lastOwner();
    const from = m.role;
    await m.update({ role }, { transaction });
    await recordEvent(db, { teamId, actorId: auth.user.id, action: 'member.role_changed', subjectType: 'user', subjectId: userId, details: { name: user?.name, from, to: role } }, transaction);
  });
}

/** Owners remove anyone; anyone may leave. The last owner can do neither. */
export async function removeMember(db: Db, auth: SessionView, teamId: number, userId: number) {
  const mine = membershipIn(auth, teamId);
  if (userId !== auth.user.id) requireRole(mine, ['owner'], 'Only owners remove members');
  await findMembership(db, teamId, userId);
  const user = await db.models.User.findByPk(userId);
  await db.sequelize.transaction(async (transaction) => {
    const m = await lockedMembership(db, teamId, userId, transaction);
    if (m.role === 'owner' && (await otherOwners(db, teamId, userId, transaction)) === 0) throw lastOwner();
    await m.destroy({ transaction });
    await recordEvent(
      db,
      { teamId, actorId: auth.user.id, action: 'member.removed', subjectType: 'user', subjectId: userId, details: { name: user?.name, email: user?.email, role: m.role } },
      transaction,
    );
  });
}
