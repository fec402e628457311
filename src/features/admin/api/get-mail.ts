import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { mailPageSchema, type MailPage } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { toQueryString } from '../../../lib/query-string';

export interface MailQuery {
  to?: string;
  page?: number;
  pageSize?: number;
}

export function getMail(query: MailQuery, signal?: AbortSignal): Promise<MailPage> {
  return apiRequest(`/api/dev/mail${toQueryString({ ...query })}`, { schema: mailPageSchema, signal });
}

export function mailQueryOptions(query: MailQuery) {
  return queryOptions({
    queryKey: ['admin', 'mail', query],
    queryFn: ({ signal }) => getMail(query, signal),
    placeholderData: keepPreviousData,
    staleTime: 2_000,
  });
}

export function useMail(query: MailQuery) {
  return useQuery(mailQueryOptions(query));
}
