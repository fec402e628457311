import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { z } from '../../../lib/zod';

// Only what the page itself relies on; the viewer takes the whole document as it came.
export const openApiDocumentSchema = z
  .object({
    openapi: z.string(),
    info: z.object({ title: z.string(), version: z.string() }).loose(),
    paths: z.record(z.string(), z.record(z.string(), z.unknown())),
  })
  .loose();
export type OpenApiDocument = z.infer<typeof openApiDocumentSchema>;

export const openApiUrl = '/api/v1/openapi.json';

export function getOpenApiDocument(signal?: AbortSignal): Promise<OpenApiDocument> {
  return apiRequest(openApiUrl, { schema: openApiDocumentSchema, signal });
}

export function openApiDocumentQueryOptions() {
  return queryOptions({ queryKey: ['v1', 'openapi'], queryFn: ({ signal }) => getOpenApiDocument(signal), staleTime: 5 * 60_000 });
}

export function useOpenApiDocument() {
  return useQuery(openApiDocumentQueryOptions());
}
