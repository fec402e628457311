import { useMutation, useQueryClient } from '@tanstack/react-query';
import { changePasswordResponseSchema, type ChangePasswordRequest, type ChangePasswordResponse } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { sessionsQueryKey } from './get-sessions';

export function changePassword(body: ChangePasswordRequest): Promise<ChangePasswordResponse> {
  return apiRequest('/api/auth/change-password', { method: 'POST', body, schema: changePasswordResponseSchema });
}

export function useChangePassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changePassword,
    // Other sessions may have ended; the list must say so.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionsQueryKey }),
  });
}
