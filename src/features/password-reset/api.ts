import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/api';
import { sessionKey } from '@/features/auth/api';

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: async (input: { email: string }) => {
      await api.post('/password-resets', input);
    },
  });
}

export function useResetPassword(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: { password: string }) => {
      await api.post(`/password-resets/${encodeURIComponent(token)}`, input);
    },
    // The server ends every session of the account: re-check this browser's.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionKey }),
  });
}
