import { queryOptions, useQuery } from '@tanstack/react-query';
import { templateDetailSchema, type TemplateDetail } from '../../../../shared/api/templates';
import { apiRequest } from '../../../lib/api-client';

export type { TemplateDetail };

/** One template version; without `version`, the latest published one. */
export function getTemplate(slug: string, version: string | undefined, signal?: AbortSignal): Promise<TemplateDetail> {
  const query = version ? `?version=${encodeURIComponent(version)}` : '';
  return apiRequest(`/api/templates/${encodeURIComponent(slug)}${query}`, { schema: templateDetailSchema, signal });
}

export function templateQueryOptions(slug: string, version: string | undefined) {
  return queryOptions({
    queryKey: ['templates', slug, version ?? 'latest'],
    queryFn: ({ signal }) => getTemplate(slug, version, signal),
    // A published version never changes; the latest may move on, so look again now and then.
    staleTime: version ? Infinity : 60_000,
  });
}

export function useTemplate(slug: string, version: string | undefined) {
  return useQuery(templateQueryOptions(slug, version));
}
