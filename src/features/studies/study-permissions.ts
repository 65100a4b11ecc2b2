import type { Membership, Session } from '@/features/auth/types';

import type { StudySummary } from './types';

/** The user's membership in the study's team (always present for a study they can read). */
export function membershipFor(session: Session, study: StudySummary): Membership | undefined {
  return session.memberships.find((m) => m.teamId === study.teamId);
}

/** Owners edit any study of their team; designers edit the studies they wrote; reviewers never edit. */
export function canEditStudy(session: Session, study: StudySummary): boolean {
  const role = membershipFor(session, study)?.role;
  return role === 'owner' || (role === 'designer' && study.author.id === session.user.id);
}

/** Reviewers and owners decide on reviews (but never on a revision they wrote). */
export function canReviewInTeam(session: Session, study: StudySummary): boolean {
  const role = membershipFor(session, study)?.role;
  return role === 'reviewer' || role === 'owner';
}
