import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signOutResponseSchema } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from './get-me';

export function signOut(): Promise<{ success: true }> {
  return apiRequest('/api/auth/sign-out', { method: 'POST', body: {}, schema: signOutResponseSchema });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, null);
    },
  });
}
