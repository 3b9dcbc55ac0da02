import { queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { outboxMessage } from '@/shared/schemas';
import { ApiRequestError, request } from './client';
import { STALE } from './query-client';

const outboxList = z.object({ items: z.array(outboxMessage) });

export const outboxKeys = {
  root: ['outbox'] as const,
  list: () => [...outboxKeys.root, 'list'] as const,
};

/** Development-only mail sink; the server answers 404 in production. */
export const outboxQueries = {
  list: () =>
    queryOptions({
      queryKey: outboxKeys.list(),
      queryFn: async ({ signal }) =>
        (await request('GET', '/api/dev/outbox', { schema: outboxList, signal })).items,
    }),
};

/** While the outbox screen is open, new invitation mail should appear without a reload. */
export function useOutbox() {
  return useQuery({ ...outboxQueries.list(), refetchInterval: 5000 });
}

export function isOutboxOff(error: unknown): boolean {
  return error instanceof ApiRequestError && error.status === 404;
}

/** Whether to offer the "Mail" entry at all: only once the outbox has answered. */
export function useOutboxAvailable(): boolean {
  return useQuery({ ...outboxQueries.list(), staleTime: STALE.medium, refetchOnWindowFocus: false })
    .isSuccess;
}
