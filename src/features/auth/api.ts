import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';

import { api, errorStatus } from '@/api';
import type { SignInInput, SignUpInput } from '@/validation';

import type { Session } from './types';

export const sessionKey = ['session'] as const;

/**
 * Drops cached data of the previous user. The session query itself stays, so the
 * layouts observing it see the change (clearing the whole cache would orphan them).
 */
function forgetAllButSession(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKey[0] });
}

/** The signed-in session, or null when the server answers 401 (signed out). */
async function fetchSession(): Promise<Session | null> {
  try {
    const { data } = await api.get<Session>('/session');
    return data;
  } catch (error) {
    if (errorStatus(error) === 401) return null;
    throw error;
  }
}

export function useSession() {
  return useQuery({ queryKey: sessionKey, queryFn: fetchSession });
}

/** Call only where a session is known to exist (inside the workspace layout). */
export function useSignedInSession(): Session {
  const { data } = useSession();
  if (!data) throw new Error('useSignedInSession used outside the signed-in workspace');
  return data;
}

function useStartSession<TInput>(request: (input: TInput) => Promise<Session>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: request,
    onSuccess: (session) => {
      // A different person may have signed in: drop everything cached for the previous one.
      forgetAllButSession(queryClient);
      // The route layouts watch this query and move to the workspace.
      queryClient.setQueryData(sessionKey, session);
    },
  });
}

export function useSignIn() {
  return useStartSession(async (input: SignInInput) => (await api.post<Session>('/session', input)).data);
}

export function useSignUp() {
  return useStartSession(async (input: SignUpInput) => (await api.post<Session>('/accounts', input)).data);
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => {
      await api.delete('/session');
    },
    onSuccess: () => {
      queryClient.setQueryData(sessionKey, null);
      forgetAllButSession(queryClient);
    },
  });
}
