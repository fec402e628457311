import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { solveResponseSchema, type SolveResponse } from '../../../../shared/api/templates';
import { apiRequest } from '../../../lib/api-client';

export type { SolveResponse };

export interface SolveArgs {
  slug: string;
  version: string;
  /** Engine units. */
  inputs: Record<string, number>;
}

export function solveTemplate({ slug, version, inputs }: SolveArgs, signal?: AbortSignal): Promise<SolveResponse> {
  return apiRequest(`/api/templates/${encodeURIComponent(slug)}/solve`, {
    method: 'POST',
    body: { version, inputs },
    schema: solveResponseSchema,
    signal,
  });
}

export function solveQueryOptions(args: SolveArgs) {
  return queryOptions({
    queryKey: ['templates', args.slug, args.version, 'solve', args.inputs],
    queryFn: ({ signal }) => solveTemplate(args, signal),
    // A published version gives the same answer for the same inputs, for ever.
    staleTime: Infinity,
    gcTime: 5 * 60_000,
    // The last answer stays on screen, marked stale, while the next one is on its way.
    placeholderData: keepPreviousData,
  });
}

export function useSolve(args: SolveArgs, enabled: boolean) {
  return useQuery({ ...solveQueryOptions(args), enabled });
}
