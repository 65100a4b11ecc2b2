import { QueryCache, QueryClient } from '@tanstack/react-query';

import { errorStatus } from './api-error';

const MAX_RETRIES = 2;

/** Key of the signed-in session query (owned by the auth feature). */
const SESSION_KEY = ['session'];

/** Client errors (4xx) will not change on retry; network and server errors might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  const status = errorStatus(error);
  if (status !== undefined && status >= 400 && status < 500) return false;
  return failureCount < MAX_RETRIES;
}

export function createQueryClient(): QueryClient {
  const client: QueryClient = new QueryClient({
    // A 401 on any data request means the session has ended: re-check it so the
    // workspace layout can send the user to sign-in.
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (errorStatus(error) === 401 && query.queryKey[0] !== SESSION_KEY[0]) {
          void client.invalidateQueries({ queryKey: SESSION_KEY });
        }
      },
    }),
    defaultOptions: {
      queries: { retry: shouldRetry, staleTime: 30_000, refetchOnWindowFocus: false },
      mutations: { retry: false },
    },
  });
  return client;
}
