import { useQuery } from '@tanstack/react-query';

import { api } from '@/api';

import type { ActivityEvent } from './types';

// Under the team's key, so team changes (roles, invitations) refresh it too.
export const activityKey = (teamId: number) => ['teams', teamId, 'activity'] as const;

/** Only owners may read the log, so the query waits until `enabled`. */
export function useActivity(teamId: number, enabled: boolean) {
  return useQuery({
    queryKey: activityKey(teamId),
    queryFn: async () =>
      (await api.get<{ events: ActivityEvent[] }>(`/teams/${encodeURIComponent(teamId)}/activity`)).data.events,
    staleTime: 5_000,
    enabled,
  });
}
