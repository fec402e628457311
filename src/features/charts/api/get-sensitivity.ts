import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { sensitivityResponseSchema, type SensitivityResponse } from '../../../../shared/api/templates';
import { apiRequest } from '../../../lib/api-client';

export type { SensitivityResponse };

export interface SensitivityArgs {
  slug: string;
  version: string;
  inputs: Record<string, number>;
  result: string;
  percent: number;
}

export function getSensitivity(args: SensitivityArgs, signal?: AbortSignal): Promise<SensitivityResponse> {
  return apiRequest(`/api/templates/${encodeURIComponent(args.slug)}/sensitivity`, {
    method: 'POST',
    body: { version: args.version, inputs: args.inputs, tornado: { result: args.result, percent: args.percent } },
    schema: sensitivityResponseSchema,
    signal,
  });
}

export function sensitivityQueryOptions(args: SensitivityArgs) {
  return queryOptions({
    queryKey: ['templates', args.slug, args.version, 'sensitivity', args],
    queryFn: ({ signal }) => getSensitivity(args, signal),
    staleTime: Infinity,
    placeholderData: keepPreviousData,
  });
}

export function useSensitivity(args: SensitivityArgs, enabled: boolean) {
  return useQuery({ ...sensitivityQueryOptions(args), enabled });
}
