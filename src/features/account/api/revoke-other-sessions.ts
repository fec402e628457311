import { useMutation, useQueryClient } from '@tanstack/react-query';
import { revokeOthersResponseSchema } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { sessionsQueryKey } from './get-sessions';

export function revokeOtherSessions(): Promise<{ revoked: number }> {
  return apiRequest('/api/me/sessions/revoke-others', { method: 'POST', body: {}, schema: revokeOthersResponseSchema });
}

export function useRevokeOtherSessions() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeOtherSessions,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sessionsQueryKey }),
  });
}
