import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponseSchema, type MeResponse } from '../../../../shared/api/auth';
import { ApiError, apiRequest } from '../../../lib/api-client';

export type { MeResponse };

/**
 * The signed-in user, or null when nobody is signed in. The auth library's own session probe
 * answers a visitor with 200 and `null`, so a visitor's every page load does not log a failed
 * request in the console the way a 401 from /api/me would; /api/me follows only for a session.
 */
export async function getMe(signal?: AbortSignal): Promise<MeResponse | null> {
  const session = await apiRequest<unknown>('/api/auth/get-session', { signal });
  if (session === null || session === undefined) return null;
  try {
    return await apiRequest('/api/me', { schema: meResponseSchema, signal });
  } catch (error) {
    if (error instanceof ApiError && error.status === 401) return null;
    throw error;
  }
}

export const meQueryKey = ['me'] as const;

export function meQueryOptions() {
  return queryOptions({
    queryKey: meQueryKey,
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 60_000,
  });
}

export function useMe() {
  return useQuery(meQueryOptions());
}
