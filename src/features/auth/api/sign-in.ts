import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signInResponseSchema, type SignInRequest, type SignInResponse } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from './get-me';

export function signIn(body: SignInRequest): Promise<SignInResponse> {
  return apiRequest('/api/auth/sign-in/email', { method: 'POST', body, schema: signInResponseSchema });
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (me) => {
      // Whatever was cached belonged to the previous visitor.
      queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meQueryKey[0] });
      queryClient.setQueryData(meQueryKey, me);
    },
  });
}
