import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { sweepResponseSchema, type SweepResponse } from '../../../../shared/api/templates';
import { apiRequest } from '../../../lib/api-client';

export type { SweepResponse };

export interface SweepArgs {
  slug: string;
  version: string;
  inputs: Record<string, number>;
  input: string;
  steps: number;
  results: string[];
}

export function sweepTemplate(args: SweepArgs, signal?: AbortSignal): Promise<SweepResponse> {
  return apiRequest(`/api/templates/${encodeURIComponent(args.slug)}/sweep`, {
    method: 'POST',
    body: { version: args.version, inputs: args.inputs, sweep: { input: args.input, steps: args.steps, results: args.results } },
    schema: sweepResponseSchema,
    signal,
  });
}

export function sweepQueryOptions(args: SweepArgs) {
  return queryOptions({
    queryKey: ['templates', args.slug, args.version, 'sweep', args],
    queryFn: ({ signal }) => sweepTemplate(args, signal),
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });
}

export function useSweep(args: SweepArgs, enabled: boolean) {
  return useQuery({ ...sweepQueryOptions(args), enabled });
}
