import { useMutation } from '@tanstack/react-query';
import { mailAcceptedResponseSchema, type MailAcceptedResponse } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function resendVerification(email: string): Promise<MailAcceptedResponse> {
  return apiRequest('/api/auth/send-verification-email', { method: 'POST', body: { email }, schema: mailAcceptedResponseSchema });
}

export function useResendVerification() {
  return useMutation({ mutationFn: resendVerification });
}
