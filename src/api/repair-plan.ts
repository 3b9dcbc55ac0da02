import { queryOptions, useQuery } from '@tanstack/react-query';
import { repairPlanResponse } from '@/shared/schemas/repair-plan';
import { request } from './client';

export const repairPlanKeys = {
  root: ['repair-plan'] as const,
  vehicle: (wid: string, vid: string) => [...repairPlanKeys.root, wid, vid] as const,
};

export const repairPlanQueries = {
  /**
   * The repair scope as it stands, built on the server from every decision, finding and
   * treatment. It depends on all of them, so it is read fresh each time the screen opens.
   */
  vehicle: (wid: string, vid: string) =>
    queryOptions({
      queryKey: repairPlanKeys.vehicle(wid, vid),
      queryFn: ({ signal }) =>
        request('GET', `/api/workshops/${wid}/vehicles/${vid}/repair-plan`, {
          schema: repairPlanResponse,
          signal,
        }),
      staleTime: 0,
    }),
};

export function useRepairPlan(wid: string, vid: string) {
  return useQuery(repairPlanQueries.vehicle(wid, vid));
}
