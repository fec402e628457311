import { queryOptions, useQuery } from '@tanstack/react-query';
import { meResponseSchema, type MeResponse } from '../../../../shared/api/auth';
import { ApiError, apiRequest } from '../../../lib/api-client';

export type { MeResponse };

/** The signed-in user, or null when nobody is signed in (the server answers 401). */
export async function getMe(signal?: AbortSignal): Promise<MeResponse | null> {
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
