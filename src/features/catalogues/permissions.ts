import type { Membership } from '@/features/auth/types';

/** Owners and designers edit a team's catalogues; reviewers only read them. */
export function canEditCatalogue(memberships: readonly Membership[], teamId: number | undefined): boolean {
  const membership = memberships.find((m) => m.teamId === teamId);
  return membership?.role === 'owner' || membership?.role === 'designer';
}
