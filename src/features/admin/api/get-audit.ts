import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { AUDIT_CSV_PATH, auditPageSchema, type AuditPage } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';
import { toQueryString } from '../../../lib/query-string';

/** Filters as the server reads them; `from` / `to` are ISO 8601 instants. */
export interface AuditQuery {
  action?: string;
  actor?: string;
  target?: string;
  from?: string;
  to?: string;
  page?: number;
  pageSize?: number;
}

export function getAudit(query: AuditQuery, signal?: AbortSignal): Promise<AuditPage> {
  return apiRequest(`/api/admin/audit${toQueryString({ ...query })}`, { schema: auditPageSchema, signal });
}

/** The same filters as a CSV download (no paging: the server caps the rows). */
export function auditCsvHref(query: AuditQuery): string {
  const { page: _page, pageSize: _pageSize, ...filters } = query;
  return `${AUDIT_CSV_PATH}${toQueryString({ ...filters })}`;
}

export function auditQueryOptions(query: AuditQuery) {
  return queryOptions({
    queryKey: ['admin', 'audit', query],
    queryFn: ({ signal }) => getAudit(query, signal),
    placeholderData: keepPreviousData,
    staleTime: 5_000,
  });
}

export function useAudit(query: AuditQuery) {
  return useQuery(auditQueryOptions(query));
}
