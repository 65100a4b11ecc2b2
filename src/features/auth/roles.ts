import type { Membership, Role } from './types';

export const ROLE_LABELS: Record<Role, string> = {
  owner: 'Owner',
  designer: 'Designer',
  reviewer: 'Reviewer',
};

const AUTHOR_ROLES: readonly Role[] = ['owner', 'designer'];

/** Teams in which the member may create studies (owners and designers; reviewers only read and review). */
export function teamsWhereCanCreate(memberships: readonly Membership[]): Membership[] {
  return memberships.filter((m) => AUTHOR_ROLES.includes(m.role));
}
