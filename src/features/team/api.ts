import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { isAxiosError } from 'axios';

import { api, errorCode, errorStatus } from '@/api';
import { sessionKey } from '@/features/auth/api';
import type { Role } from '@/features/auth/types';
import type { StudyDefaults } from '@/core/study';
import type { InvitationInput } from '@/validation';

import type { Member, PendingInvitation, TeamSettings } from './types';

export const membersKey = (teamId: number) => ['teams', teamId, 'members'] as const;
export const invitationsKey = (teamId: number) => ['teams', teamId, 'invitations'] as const;
export const teamSettingsKey = (teamId: number) => ['teams', teamId, 'settings'] as const;

const teamPath = (teamId: number) => `/teams/${encodeURIComponent(teamId)}`;

export function useMembers(teamId: number, enabled = true) {
  return useQuery({
    queryKey: membersKey(teamId),
    queryFn: async () => (await api.get<{ members: Member[] }>(`${teamPath(teamId)}/members`)).data.members,
    enabled,
  });
}

/** Pending invitations; only owners may read them, so the query waits until `enabled`. */
export function useInvitations(teamId: number, enabled: boolean) {
  return useQuery({
    queryKey: invitationsKey(teamId),
    queryFn: async () =>
      (await api.get<{ invitations: PendingInvitation[] }>(`${teamPath(teamId)}/invitations`)).data.invitations,
    enabled,
  });
}

function useTeamMutation<TInput, TResult>(teamId: number, request: (input: TInput) => Promise<TResult>, alsoSession = false) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    // Everything cached under the team (members, invitations, activity) may have changed.
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: ['teams', teamId] }),
        // The signed-in user's own role may have changed.
        alsoSession ? queryClient.invalidateQueries({ queryKey: sessionKey }) : undefined,
      ]);
    },
  });
}

export function useChangeRole(teamId: number) {
  return useTeamMutation(
    teamId,
    async ({ userId, role }: { userId: number; role: Role }) =>
      api.patch(`${teamPath(teamId)}/members/${encodeURIComponent(userId)}`, { role }),
    true,
  );
}

export function useRemoveMember(teamId: number) {
  return useTeamMutation(
    teamId,
    async (userId: number) => api.delete(`${teamPath(teamId)}/members/${encodeURIComponent(userId)}`),
    true,
  );
}

export function useInvite(teamId: number) {
  return useTeamMutation(teamId, async (input: InvitationInput) => {
    const { data } = await api.post<{ invitation: PendingInvitation }>(`${teamPath(teamId)}/invitations`, input);
    return data.invitation;
  });
}

export function useRevokeInvitation(teamId: number) {
  return useTeamMutation(teamId, async (invitationId: number) =>
    api.delete(`${teamPath(teamId)}/invitations/${encodeURIComponent(invitationId)}`),
  );
}

/** The team's defaults for new studies; every member may read them. */
export function useTeamSettings(teamId: number | undefined) {
  return useQuery({
    queryKey: teamSettingsKey(teamId ?? 0),
    queryFn: async () => (await api.get<TeamSettings>(`${teamPath(teamId!)}/settings`)).data,
    enabled: teamId !== undefined,
  });
}

/** Owners replace the team's defaults. */
export function useSaveTeamSettings(teamId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    // baseVersion: the version the owner read; another owner's save in between answers 409 (conflictingSettings).
    mutationFn: async ({ settings, baseVersion }: { settings: StudyDefaults; baseVersion: number }) =>
      (await api.put<TeamSettings>(`${teamPath(teamId)}/settings`, { ...settings, baseVersion })).data,
    onSuccess: async (saved) => {
      queryClient.setQueryData(teamSettingsKey(teamId), saved);
      await queryClient.invalidateQueries({ queryKey: ['teams', teamId, 'activity'] });
    },
  });
}

/**
 * The team's settings as they are now when a save was refused because another owner saved
 * first (409 `version_conflict` with `current`), or null for any other failure.
 */
export function conflictingSettings(error: unknown): TeamSettings | null {
  if (errorStatus(error) !== 409 || errorCode(error) !== 'version_conflict' || !isAxiosError(error)) return null;
  const current: unknown = (error.response?.data as { current?: unknown } | undefined)?.current;
  if (typeof current !== 'object' || current === null) return null;
  const c = current as { version?: unknown; settings?: unknown };
  return typeof c.version === 'number' && typeof c.settings === 'object' && c.settings !== null ? (current as TeamSettings) : null;
}
