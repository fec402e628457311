import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailMessageSchema, type MailMessage } from '../../../../shared/api/auth';
import { apiRequest } from '../../../lib/api-client';

export type { MailMessage };

export function getMailMessage(mailId: number, signal?: AbortSignal): Promise<MailMessage> {
  return apiRequest(`/api/dev/mail/${mailId}`, { schema: mailMessageSchema, signal });
}

/** The HTML part alone, served by the server under its own sandboxing policy, for an iframe. */
export function mailHtmlHref(mailId: number): string {
  return `/api/dev/mail/${mailId}/html`;
}

export function mailMessageQueryOptions(mailId: number) {
  return queryOptions({
    queryKey: ['admin', 'mail', 'message', mailId],
    queryFn: ({ signal }) => getMailMessage(mailId, signal),
    // A received message never changes.
    staleTime: Infinity,
  });
}

export function useMailMessage(mailId: number | null) {
  return useQuery({ ...mailMessageQueryOptions(mailId ?? 0), enabled: mailId !== null });
}
