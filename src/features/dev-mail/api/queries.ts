import { queryOptions } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';

/** One message the local fake SMTP server received (development and tests only). */
export interface ReceivedMail {
  subject: string;
  recipients: string[];
  from: string;
  receivedAt: string;
  text: string;
}

export const devMailKeys = { all: ['dev-mail'] as const };

/** The development mailbox; absent (404) in production, which hides its link. */
export const devMailQueryOptions = () =>
  queryOptions({
    queryKey: devMailKeys.all,
    queryFn: ({ signal }) => api.get<{ messages: ReceivedMail[] }>('/api/dev/mail', signal),
    retry: false,
    staleTime: 60_000,
  });
