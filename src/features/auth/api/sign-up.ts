import { useMutation } from '@tanstack/react-query';
import { signUpResponseSchema, type SignUpRequest, type SignUpResponse } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function signUp(body: SignUpRequest): Promise<SignUpResponse> {
  return apiRequest('/api/auth/sign-up/email', { method: 'POST', body, schema: signUpResponseSchema });
}

export function useSignUp() {
  return useMutation({ mutationFn: signUp });
}
