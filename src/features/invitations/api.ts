import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { sessionKey } from '@/features/auth/api';
import type { Session } from '@/features/auth/types';
import type { AcceptInvitationInput } from '@/validation';

import type { InvitationDetails } from './types';

const invitationPath = (token: string) => `/invitations/${encodeURIComponent(token)}`;

export const invitationKey = (token: string) => ['invitations', token] as const;

export function useInvitation(token: string) {
  return useQuery({
    queryKey: invitationKey(token),
    queryFn: async () => (await api.get<{ invitation: InvitationDetails }>(invitationPath(token))).data.invitation,
  });
}

/** Accepting signs in as the invited account, so the cache of whoever was signed in is dropped. */
export function useAcceptInvitation(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: AcceptInvitationInput) =>
      (await api.post<Session>(`${invitationPath(token)}/accept`, input)).data,
    onSuccess: (session) => {
      // The invitation itself stays: refetching it now would answer "used" under the open page.
      queryClient.removeQueries({ predicate: (query) => !['session', 'invitations'].includes(String(query.queryKey[0])) });
      queryClient.setQueryData(sessionKey, session);
    },
  });
}
