import { useMutation } from '@tanstack/react-query';
import { resetPasswordResponseSchema, type ResetPasswordRequest } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function resetPassword(body: ResetPasswordRequest): Promise<{ status: 'password-changed' }> {
  return apiRequest('/api/auth/reset-password', { method: 'POST', body, schema: resetPasswordResponseSchema });
}

export function useResetPassword() {
  return useMutation({ mutationFn: resetPassword });
}
