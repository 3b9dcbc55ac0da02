import {
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
} from '@tanstack/react-query';
import { z } from 'zod';
import {
  correctTreatmentRequest,
  createTreatmentRequest,
  treatmentResponse,
  type CorrectTreatmentRequest,
  type CreateTreatmentRequest,
} from '@/shared/schemas/treatment';
import { zoneStateResponse } from '@/shared/schemas/recheck';
import { request } from './client';
import { invalidateAfterFindingWrite } from './findings';
import { newId } from './ids';
import { recheckKeys } from './rechecks';
import { timelineKeys } from './timeline';

const zoneStateList = z.object({ items: z.array(zoneStateResponse) });
const vehiclePath = (wid: string, vid: string) => `/api/workshops/${wid}/vehicles/${vid}`;

export const treatmentKeys = {
  root: ['treatments'] as const,
  workshop: (wid: string) => [...treatmentKeys.root, wid] as const,
  detail: (wid: string, tid: string) => [...treatmentKeys.workshop(wid), 'detail', tid] as const,
};
/** Zone states are derived on the server from findings, treatments and re-checks together. */
export const zoneStateKeys = {
  root: ['zone-states'] as const,
  workshop: (wid: string) => [...zoneStateKeys.root, wid] as const,
  vehicle: (wid: string, vid: string) => [...zoneStateKeys.workshop(wid), vid] as const,
};

export const treatmentQueries = {
  detail: (wid: string, tid: string) =>
    queryOptions({
      queryKey: treatmentKeys.detail(wid, tid),
      queryFn: ({ signal }) =>
        request('GET', `/api/workshops/${wid}/treatments/${tid}`, {
          schema: treatmentResponse,
          signal,
        }),
    }),
  zoneStates: (wid: string, vid: string) =>
    queryOptions({
      queryKey: zoneStateKeys.vehicle(wid, vid),
      queryFn: async ({ signal }) =>
        (
          await request('GET', `${vehiclePath(wid, vid)}/zone-states`, {
            schema: zoneStateList,
            signal,
          })
        ).items,
    }),
};

export function useTreatment(wid: string, tid: string) {
  return useQuery(treatmentQueries.detail(wid, tid));
}

export function useZoneStates(wid: string, vid: string) {
  return useQuery(treatmentQueries.zoneStates(wid, vid));
}

/**
 * After any treatment or re-check write: treatments, re-checks (a treatment schedules them),
 * zone states, the timeline and findings (fresh evidence logs one) all change.
 */
export function invalidateTreatmentWork(queryClient: QueryClient, wid: string) {
  return Promise.all([
    ...[
      treatmentKeys.workshop(wid),
      recheckKeys.workshop(wid),
      zoneStateKeys.workshop(wid),
      timelineKeys.workshop(wid),
    ].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
    invalidateAfterFindingWrite(queryClient, wid),
  ]);
}

/** The body should carry an id made once per form (see `newId`) so a retry stays one treatment. */
export function useCreateTreatment(wid: string, vid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateTreatmentRequest) =>
      request('POST', `${vehiclePath(wid, vid)}/treatments`, {
        body: createTreatmentRequest.parse({ ...body, id: body.id ?? newId() }),
        schema: treatmentResponse,
      }),
    onSuccess: (t) => {
      queryClient.setQueryData(treatmentKeys.detail(wid, t.id), t);
      return invalidateTreatmentWork(queryClient, wid);
    },
  });
}

/** A correction is a new version with a reason; the old one is kept (stale version → 409). */
export function useCorrectTreatment(wid: string, tid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CorrectTreatmentRequest) =>
      request('POST', `/api/workshops/${wid}/treatments/${tid}/corrections`, {
        body: correctTreatmentRequest.parse(body),
        schema: treatmentResponse,
      }),
    onSuccess: (t) => {
      queryClient.setQueryData(treatmentKeys.detail(wid, t.id), t);
      return invalidateTreatmentWork(queryClient, wid);
    },
  });
}
