import { queryOptions, useQuery } from '@tanstack/react-query';
import { templateListSchema, type TemplateList, type TemplateSummary } from '../../../../shared/api/templates';
import { apiRequest } from '../../../lib/api-client';

export type { TemplateSummary };

export function getTemplates(signal?: AbortSignal): Promise<TemplateList> {
  return apiRequest('/api/templates', { schema: templateListSchema, signal });
}

export function templatesQueryOptions() {
  return queryOptions({
    queryKey: ['templates', 'list'],
    queryFn: ({ signal }) => getTemplates(signal),
    staleTime: 60_000,
  });
}

export function useTemplates() {
  return useQuery(templatesQueryOptions());
}
