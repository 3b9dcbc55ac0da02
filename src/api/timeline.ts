import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { timelineItem, type TimelineKind } from '@/shared/schemas/recheck';
import { request } from './client';
import { queryString } from './ids';

const timelineList = z.object({ items: z.array(timelineItem) });

export const timelineKeys = {
  root: ['timeline'] as const,
  workshop: (wid: string) => [...timelineKeys.root, wid] as const,
  vehicle: (wid: string, vid: string, kinds: readonly TimelineKind[]) =>
    [...timelineKeys.workshop(wid), vid, kinds.join(',')] as const,
};

export const timelineQueries = {
  /** Newest first; `kinds` empty means every kind. */
  vehicle: (wid: string, vid: string, kinds: readonly TimelineKind[]) =>
    queryOptions({
      queryKey: timelineKeys.vehicle(wid, vid, kinds),
      queryFn: async ({ signal }) =>
        (
          await request(
            'GET',
            `/api/workshops/${wid}/vehicles/${vid}/timeline${queryString({ kinds: kinds.join(',') })}`,
            { schema: timelineList, signal },
          )
        ).items,
    }),
};

/** A new filter keeps the previous list on screen (marked as updating) until its answer arrives. */
export function useTimeline(wid: string, vid: string, kinds: readonly TimelineKind[]) {
  return useQuery({
    ...timelineQueries.vehicle(wid, vid, kinds),
    placeholderData: keepPreviousData,
  });
}
