import { queryOptions, useQuery } from '@tanstack/react-query';
import { myOrganisationListSchema, type MyOrganisation } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export type { MyOrganisation };

export function getMyOrganisations(signal?: AbortSignal): Promise<{ items: MyOrganisation[] }> {
  return apiRequest('/api/organisations/mine', { schema: myOrganisationListSchema, signal });
}

export function myOrganisationsQueryOptions() {
  return queryOptions({ queryKey: ['organisations', 'mine'], queryFn: ({ signal }) => getMyOrganisations(signal) });
}

export function useMyOrganisations() {
  return useQuery(myOrganisationsQueryOptions());
}
