import type { StudyDefaults } from '@/core/study';
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

/** Body of `GET /api/teams/:teamId/settings`: the team's defaults for new studies. */
export type TeamSettings = {
  teamId: number;
  settings: StudyDefaults;
  /** 0 while no owner has set any. */
  version: number;
  updatedAt: string | null;
  updatedBy: { id: number; name: string } | null;
};
