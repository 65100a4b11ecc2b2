import type { Role } from '@/features/auth/types';

/** Body of `GET /api/invitations/:token`: what the link offers, readable without a session. */
export type InvitationDetails = {
  teamName: string;
  role: Role;
  email: string;
  invitedBy: string | null;
  expiresAt: string;
  accountExists: boolean;
};
