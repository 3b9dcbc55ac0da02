import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  updateWorkshopRequest,
  workshopResponse,
  type WorkshopResponse,
  type WorkshopSettings,
} from '@/shared/schemas';
import { request } from './client';
import { STALE } from './query-client';

export type UpdateWorkshopRequest = z.input<typeof updateWorkshopRequest>;

export const workshopKeys = {
  root: ['workshops'] as const,
  detail: (wid: string) => [...workshopKeys.root, wid] as const,
};

export const workshopQueries = {
  detail: (wid: string) =>
    queryOptions({
      queryKey: workshopKeys.detail(wid),
      queryFn: ({ signal }) =>
        request('GET', `/api/workshops/${wid}`, { schema: workshopResponse, signal }),
      staleTime: STALE.medium,
    }),
};

export function useWorkshop(wid: string) {
  return useQuery(workshopQueries.detail(wid));
}

/** Units, rates and wood settings (the server fills defaults for anything never saved). */
export function useWorkshopSettings(wid: string) {
  return useQuery({
    ...workshopQueries.detail(wid),
    select: (w: WorkshopResponse): WorkshopSettings => w.settings,
  });
}

export function useUpdateWorkshop(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateWorkshopRequest) =>
      request('PATCH', `/api/workshops/${wid}`, {
        body: updateWorkshopRequest.parse(body),
        schema: workshopResponse,
      }),
    onSuccess: (workshop) => {
      queryClient.setQueryData(workshopKeys.detail(wid), workshop);
      return queryClient.invalidateQueries({ queryKey: workshopKeys.detail(wid) });
    },
  });
}
