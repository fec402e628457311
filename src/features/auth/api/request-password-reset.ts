import { useMutation } from '@tanstack/react-query';
import { mailAcceptedResponseSchema, type MailAcceptedResponse } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function requestPasswordReset(email: string): Promise<MailAcceptedResponse> {
  return apiRequest('/api/auth/request-password-reset', { method: 'POST', body: { email }, schema: mailAcceptedResponseSchema });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
