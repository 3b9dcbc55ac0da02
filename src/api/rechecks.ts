import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  assignRecheckRequest,
  dueListResponse,
  moveRecheckRequest,
  recheckResponse,
  recordRecheckRequest,
  type AssignRecheckRequest,
  type MoveRecheckRequest,
  type RecordRecheckRequest,
} from '@/shared/schemas/recheck';
import { updatePreferencesRequest } from '@/shared/schemas/auth';
import { API_BASE, request } from './client';
import { queryString } from './ids';
import { invalidateTreatmentWork } from './treatments';

const recheckList = z.object({ items: z.array(recheckResponse) });
export type DueQuery = { assigneeId?: string; days?: number };

const recheckPath = (wid: string, rid: string) => `/api/workshops/${wid}/rechecks/${rid}`;

export const recheckKeys = {
  root: ['rechecks'] as const,
  workshop: (wid: string) => [...recheckKeys.root, wid] as const,
  list: (wid: string, vid: string) => [...recheckKeys.workshop(wid), 'vehicle', vid] as const,
  due: (wid: string, query: DueQuery) => [...recheckKeys.workshop(wid), 'due', query] as const,
};

export const recheckQueries = {
  list: (wid: string, vid: string) =>
    queryOptions({
      queryKey: recheckKeys.list(wid, vid),
      queryFn: async ({ signal }) =>
        (
          await request('GET', `/api/workshops/${wid}/vehicles/${vid}/rechecks`, {
            schema: recheckList,
            signal,
          })
        ).items,
    }),
  due: (wid: string, query: DueQuery = {}) =>
    queryOptions({
      queryKey: recheckKeys.due(wid, query),
      queryFn: ({ signal }) =>
        request('GET', `/api/workshops/${wid}/rechecks/due` + queryString(query), {
          schema: dueListResponse,
          signal,
        }),
    }),
};

export function useVehicleRechecks(wid: string, vid: string) {
  return useQuery(recheckQueries.list(wid, vid));
}

export function useDueRechecks(wid: string, query: DueQuery = {}) {
  return useQuery(recheckQueries.due(wid, query));
}

/** The calendar file is a plain GET the browser downloads with the session cookie. */
export function recheckCalendarUrl(wid: string, rid: string): string {
  return `${API_BASE}${recheckPath(wid, rid)}/calendar.ics`;
}

function useRecheckMutation<B>(wid: string, rid: string, action: string, schema: z.ZodType<B>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: B) =>
      request('POST', `${recheckPath(wid, rid)}/${action}`, {
        body: schema.parse(body),
        schema: recheckResponse,
      }),
    onSuccess: () => invalidateTreatmentWork(queryClient, wid),
  });
}

/** Clean, or fresh evidence with a finding (the server logs it in the latest survey). */
export const useRecordRecheck = (wid: string, rid: string) =>
  useRecheckMutation<RecordRecheckRequest>(wid, rid, 'result', recordRecheckRequest);
/** A new due date, always with a reason. */
export const useMoveRecheck = (wid: string, rid: string) =>
  useRecheckMutation<MoveRecheckRequest>(wid, rid, 'move', moveRecheckRequest);
export const useAssignRecheck = (wid: string, rid: string) =>
  useRecheckMutation<AssignRecheckRequest>(wid, rid, 'assign', assignRecheckRequest);

/** Reminder e-mails about one's own due re-checks, on or off (answers like GET session). */
export async function setRemindersEnabled(remindersEnabled: boolean): Promise<void> {
  await request('PATCH', '/api/auth/preferences', {
    body: updatePreferencesRequest.parse({ remindersEnabled }),
  });
}
