import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { adminUserPageSchema, type AdminUserPage, type adminUserSortKeys, type UserRole } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { toQueryString } from '../../../lib/query-string';

export type { AdminUserPage };

export interface AdminUserQuery {
  q?: string;
  role?: UserRole;
  sort?: (typeof adminUserSortKeys)[number];
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

export function getUsers(query: AdminUserQuery, signal?: AbortSignal): Promise<AdminUserPage> {
  return apiRequest(`/api/admin/users${toQueryString({ ...query })}`, { schema: adminUserPageSchema, signal });
}

export const usersQueryKeyRoot = ['admin', 'users'] as const;

export function usersQueryOptions(query: AdminUserQuery) {
  return queryOptions({
    queryKey: [...usersQueryKeyRoot, query],
    queryFn: ({ signal }) => getUsers(query, signal),
    // The table keeps its rows while the next page or filter loads, instead of jumping.
    placeholderData: keepPreviousData,
    staleTime: 5_000,
  });
}

export function useUsers(query: AdminUserQuery) {
  return useQuery(usersQueryOptions(query));
}
