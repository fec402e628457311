import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { sessionsQueryKey } from './get-sessions';

export async function revokeSession(sessionId: string): Promise<void> {
  await apiRequest(`/api/me/sessions/${encodeURIComponent(sessionId)}`, { method: 'DELETE' });
}

export function useRevokeSession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeSession,
    onSettled: () => queryClient.invalidateQueries({ queryKey: sessionsQueryKey }),
  });
}
