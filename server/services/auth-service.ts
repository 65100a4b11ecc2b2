import bcrypt from 'bcryptjs';
import { UniqueConstraintError } from 'sequelize';
import type { SignInInput, SignUpInput } from '../../src/validation/auth';
import { AppError } from '../errors';
import type { Db } from '../db';
import type { Role } from '../models';

export type MembershipView = { teamId: number; teamName: string; role: Role };
export type SessionView = { user: { id: number; email: string; name: string }; memberships: MembershipView[] };

// A hash to compare against when the address is unknown, so both paths take the same time.
let dummyHash: string | undefined;

export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

export async function sessionView(db: Db, userId: number): Promise<SessionView | null> {
  const user = await db.models.User.findByPk(userId, {
    include: [{ association: 'memberships', include: [{ association: 'team' }] }],
  });
  if (!user) return null;
  const memberships = ((user as unknown as { memberships: { teamId: number; role: Role; team: { name: string } }[] }).memberships ?? [])
    .map((m) => ({ teamId: m.teamId, teamName: m.team.name, role: m.role }))
    .sort((a, b) => a.teamId - b.teamId);
  return { user: { id: user.id, email: user.email, name: user.name }, memberships };
}

/** Checks the credentials; answers the same 401 whether the address or the password is wrong. */
export async function signIn(db: Db, input: SignInInput, bcryptCost: number): Promise<SessionView> {
  const user = await db.models.User.findOne({ where: { email: input.email } });
  if (!user) {
    dummyHash ??= await bcrypt.hash('not-a-real-password', bcryptCost);
    await bcrypt.compare(input.password, dummyHash);
    throw new AppError(401, 'invalid_credentials', 'E-mail or password is not right');
  }
  const ok = await bcrypt.compare(input.password, user.passwordHash);
  if (!ok) throw new AppError(401, 'invalid_credentials', 'E-mail or password is not right');
  return (await sessionView(db, user.id))!;
}

/** Creates the account and its first team, with the new user as owner. */
export async function signUp(db: Db, input: SignUpInput, bcryptCost: number): Promise<SessionView> {
  const taken = () =>
    new AppError(409, 'email_taken', 'An account with this e-mail already exists: sign in instead', [{ path: 'email', message: 'is already registered' }]);
  if (await db.models.User.findOne({ where: { email: input.email } })) throw taken();
  const passwordHash = await hashPassword(input.password, bcryptCost);
  const userId = await db.sequelize
    .transaction(async (transaction) => {
      const user = await db.models.User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
      const team = await db.models.Team.create({ name: input.teamName }, { transaction });
      await db.models.Membership.create({ userId: user.id, teamId: team.id, role: 'owner' }, { transaction });
      return user.id;
    })
    .catch((err: unknown) => {
      // Two sign-ups with one address at the same moment (perhaps in two server processes)
      // both pass the check above; the unique index lets one in and the other hears the same 409.
      if (err instanceof UniqueConstraintError) throw taken();
      throw err;
    });
  return (await sessionView(db, userId))!;
}
