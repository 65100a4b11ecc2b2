import { Op } from 'sequelize';
import type { Deps } from '../deps';
import { AppError } from '../errors';
import { passwordResetMail } from '../mail/templates';
import { hashPassword } from './auth-service';
import { hashToken, newToken } from './tokens';

export const RESET_TTL_MS = 60 * 60 * 1000;

/** Mails a reset link when the address has an account; answers the same either way. */
export async function requestPasswordReset(deps: Deps, email: string, now = new Date()) {
  const user = await deps.db.models.User.findOne({ where: { email } });
  if (!user) return;
  const { token, hash } = newToken();
  const expiresAt = new Date(now.getTime() + RESET_TTL_MS);
  await deps.db.models.PasswordReset.create({ userId: user.id, tokenHash: hash, expiresAt });
  await deps.mailer.send(passwordResetMail(user.email, { link: `${deps.config.appUrl}/reset-password/${token}`, expiresAt }));
}

/** Sets the new password once per link, and ends every session of that account. */
export async function resetPassword(deps: Deps, token: string, password: string, now = new Date()) {
  const { db } = deps;
  const reset = await db.models.PasswordReset.findOne({ where: { tokenHash: hashToken(token) } });
  if (!reset || reset.usedAt || reset.expiresAt <= now) {
    throw new AppError(410, 'reset_gone', 'This reset link has been used or has expired: ask for a new one');
  }
  const passwordHash = await hashPassword(password, deps.config.bcryptCost);
  await db.sequelize.transaction(async (transaction) => {
    const [claimed] = await db.models.PasswordReset.update({ usedAt: now }, { where: { id: reset.id, usedAt: null }, transaction });
    if (claimed === 0) throw new AppError(410, 'reset_gone', 'This reset link has already been used');
    await db.models.User.update({ passwordHash }, { where: { id: reset.userId }, transaction });
    // Sessions are JSON text; the user id is stored as "userId":<n> in it. The query interface
    // quotes the mixed-case table name (PostgreSQL folds unquoted names to lower case), and
    // LIKE compares case-sensitively on PostgreSQL, which is what this exact key needs.
    const userId = reset.userId;
    await db.sequelize
      .getQueryInterface()
      .bulkDelete('Sessions', { data: { [Op.or]: [{ [Op.like]: `%"userId":${userId}}%` }, { [Op.like]: `%"userId":${userId},%` }] } }, { transaction });
  });
}
