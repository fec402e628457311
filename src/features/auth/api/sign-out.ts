import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { signOutResponseSchema } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { meQueryKey } from './get-me';

export function signOut(): Promise<{ success: true }> {
  return apiRequest('/api/auth/sign-out', { method: 'POST', body: {}, schema: signOutResponseSchema });
}

/** Drops everything the signed-in person loaded and asks the server who is signed in now. */
export function forgetSession(queryClient: QueryClient) {
  queryClient.removeQueries({ predicate: (q) => q.queryKey[0] !== meQueryKey[0] });
  return queryClient.invalidateQueries({ queryKey: meQueryKey });
}

/**
 * Only ends the session on the server. The page the person lands on afterwards (outside every
 * guard) calls `forgetSession`: cleared while a guarded page is still on screen, its guard would
 * send the person to sign in "to open that page" they are leaving.
 */
export function useSignOut() {
  return useMutation({ mutationFn: signOut });
}

export function useForgetSession() {
  const queryClient = useQueryClient();
  return () => forgetSession(queryClient);
}
