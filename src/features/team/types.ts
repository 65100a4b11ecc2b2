import type { Role } from '@/features/auth/types';

/** One row of `GET /api/teams/:teamId/members`. */
export type Member = { userId: number; name: string; email: string; role: Role; since: string };

/** A pending invitation of `GET /api/teams/:teamId/invitations`. */
export type PendingInvitation = {
  id: number;
  email: string;
  role: Role;
  expiresAt: string;
  createdAt: string;
  invitedBy: { id: number; name: string } | null;
};
