import { useQuery } from '@tanstack/react-query';

import { api } from '@/api';

import type { OutboxMessage } from './types';

export const outboxKey = ['outbox'] as const;

export function useOutbox() {
  return useQuery({
    queryKey: outboxKey,
    queryFn: async () => (await api.get<{ messages: OutboxMessage[] }>('/outbox')).data.messages,
    // New mail arrives as others act; a short stale time keeps the list close to live.
    staleTime: 5_000,
  });
}
