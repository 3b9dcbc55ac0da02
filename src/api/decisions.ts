import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  decisionResponse,
  saveDecisionRequest,
  type DecisionResponse,
  type SaveDecisionRequest,
} from '@/shared/schemas/decision';
import { request } from './client';

const decisionList = z.object({ items: z.array(decisionResponse) });
const base = (wid: string, vid: string) => `/api/workshops/${wid}/vehicles/${vid}/decisions`;
const zonePath = (wid: string, vid: string, zoneKey: string) =>
  `${base(wid, vid)}/${encodeURIComponent(zoneKey)}`;

export const decisionKeys = {
  root: ['decisions'] as const,
  workshop: (wid: string) => [...decisionKeys.root, wid] as const,
  list: (wid: string, vid: string) => [...decisionKeys.workshop(wid), 'vehicle', vid] as const,
};

export const decisionQueries = {
  /** Every member decision of one vehicle; a zone's decision is read from this one list. */
  list: (wid: string, vid: string) =>
    queryOptions({
      queryKey: decisionKeys.list(wid, vid),
      queryFn: async ({ signal }) =>
        (await request('GET', base(wid, vid), { schema: decisionList, signal })).items,
    }),
};

export function useDecisions(wid: string, vid: string) {
  return useQuery(decisionQueries.list(wid, vid));
}

/**
 * Create or replace a zone's decision. Send the loaded `version` when one exists (stale → 409);
 * the server recomputes the recommendation and refuses an override without a reason (400).
 */
export function useSaveDecision(wid: string, vid: string, zoneKey: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SaveDecisionRequest) =>
      request('PUT', zonePath(wid, vid, zoneKey), {
        body: saveDecisionRequest.parse(body),
        schema: decisionResponse,
      }),
    onSuccess: (saved) => {
      queryClient.setQueryData<DecisionResponse[]>(decisionKeys.list(wid, vid), (items) =>
        items ? [...items.filter((d) => d.zoneKey !== saved.zoneKey), saved] : items,
      );
      return queryClient.invalidateQueries({ queryKey: decisionKeys.list(wid, vid) });
    },
  });
}

/** Withdraw the zone's decision (the member goes back to undecided). */
export function useDeleteDecision(wid: string, vid: string, zoneKey: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => request<void>('DELETE', zonePath(wid, vid, zoneKey)),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: decisionKeys.list(wid, vid) }),
  });
}
