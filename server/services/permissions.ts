import { AppError } from '../errors';
import type { Role, Study } from '../models';
import type { MembershipView, SessionView } from './auth-service';

/** The user's membership in a team, or 404: teams one is not in do not exist for them. */
export function membershipIn(auth: SessionView, teamId: number): MembershipView {
  const m = auth.memberships.find((x) => x.teamId === teamId);
  if (!m) throw AppError.notFound('Team');
  return m;
}

export function requireRole(m: MembershipView, roles: readonly Role[], message: string) {
  if (!roles.includes(m.role)) throw AppError.forbidden(message);
}

/** Owners edit every study of their team; designers edit the studies they wrote. */
export function requireStudyEditor(auth: SessionView, study: Study) {
  const m = membershipIn(auth, study.teamId);
  if (m.role === 'owner') return m;
  if (m.role === 'designer' && study.authorId === auth.user.id) return m;
  throw AppError.forbidden(m.role === 'reviewer' ? 'Reviewers cannot edit studies' : 'Only the author or a team owner can change this study');
}
