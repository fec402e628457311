import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { adminOrganisationPageSchema, type AdminOrganisationPage } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { toQueryString } from '../../../lib/query-string';

export interface AdminOrganisationQuery {
  q?: string;
  kind?: 'engineering' | 'supplier';
  page?: number;
  pageSize?: number;
}

export function getOrganisations(query: AdminOrganisationQuery, signal?: AbortSignal): Promise<AdminOrganisationPage> {
  return apiRequest(`/api/admin/organisations${toQueryString({ ...query })}`, { schema: adminOrganisationPageSchema, signal });
}

export function organisationsQueryOptions(query: AdminOrganisationQuery) {
  return queryOptions({
    queryKey: ['admin', 'organisations', query],
    queryFn: ({ signal }) => getOrganisations(query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useOrganisations(query: AdminOrganisationQuery) {
  return useQuery(organisationsQueryOptions(query));
}
