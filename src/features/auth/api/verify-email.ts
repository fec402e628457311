import { queryOptions, useQuery } from '@tanstack/react-query';
import { verifyEmailResponseSchema, type VerifyEmailResponse } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export function verifyEmail(token: string, signal?: AbortSignal): Promise<VerifyEmailResponse> {
  return apiRequest(`/api/auth/verify-email?token=${encodeURIComponent(token)}`, { schema: verifyEmailResponseSchema, signal });
}

export function verifyEmailQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['auth', 'verify-email', token],
    queryFn: ({ signal }) => verifyEmail(token, signal),
    // A token works once: never ask again for the same one.
    staleTime: Infinity,
    gcTime: Infinity,
    retry: false,
  });
}

export function useVerifyEmail(token: string) {
  return useQuery({ ...verifyEmailQueryOptions(token), enabled: token.length > 0 });
}
