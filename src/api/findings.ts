import {
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
} from '@tanstack/react-query';
import { z } from 'zod';
import {
  createFindingRequest,
  findingResponse,
  updateFindingRequest,
  type CreateFindingRequest,
  type findingListQuery,
  type FindingResponse,
  type UpdateFindingRequest,
} from '@/shared/schemas';
import { request } from './client';
import { newId, queryString } from './ids';
import { surveyKeys } from './surveys';
import { invalidateVehicles } from './vehicles';

export type FindingListQuery = z.input<typeof findingListQuery>;

const findingList = z.object({ items: z.array(findingResponse) });
const findingPath = (wid: string, fid: string) => `/api/workshops/${wid}/findings/${fid}`;

export const findingKeys = {
  root: ['findings'] as const,
  workshop: (wid: string) => [...findingKeys.root, wid] as const,
  lists: (wid: string, vid: string) => [...findingKeys.workshop(wid), 'vehicle', vid] as const,
  list: (wid: string, vid: string, query: FindingListQuery = {}) =>
    [...findingKeys.lists(wid, vid), query] as const,
  detail: (wid: string, fid: string) => [...findingKeys.workshop(wid), 'detail', fid] as const,
};

export const findingQueries = {
  list: (wid: string, vid: string, query: FindingListQuery = {}) =>
    queryOptions({
      queryKey: findingKeys.list(wid, vid, query),
      queryFn: async ({ signal }) =>
        (
          await request(
            'GET',
            `/api/workshops/${wid}/vehicles/${vid}/findings` + queryString(query),
            {
              schema: findingList,
              signal,
            },
          )
        ).items,
    }),
  detail: (wid: string, fid: string) =>
    queryOptions({
      queryKey: findingKeys.detail(wid, fid),
      queryFn: ({ signal }) =>
        request('GET', findingPath(wid, fid), { schema: findingResponse, signal }),
    }),
};

export function useFindings(wid: string, vid: string, query: FindingListQuery = {}) {
  return useQuery(findingQueries.list(wid, vid, query));
}

export function useFinding(wid: string, fid: string) {
  return useQuery(findingQueries.detail(wid, fid));
}

/**
 * After any finding write: findings, the vehicle's summary (worst severity, counts) and the
 * survey's finding count all change.
 */
export function invalidateAfterFindingWrite(
  queryClient: QueryClient,
  wid: string,
  finding?: FindingResponse,
) {
  if (finding) queryClient.setQueryData(findingKeys.detail(wid, finding.id), finding);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: findingKeys.workshop(wid) }),
    queryClient.invalidateQueries({ queryKey: surveyKeys.workshop(wid) }),
    invalidateVehicles(queryClient, wid),
  ]);
}

/** The body should carry an id made once per form (see `newId`) so a retry stays one finding. */
export function useCreateFinding(wid: string, surveyId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateFindingRequest) =>
      request('POST', `/api/workshops/${wid}/surveys/${surveyId}/findings`, {
        body: createFindingRequest.parse({ ...body, id: body.id ?? newId() }),
        schema: findingResponse,
      }),
    onSuccess: (finding) => invalidateAfterFindingWrite(queryClient, wid, finding),
  });
}

/** Send the `version` the form loaded; a stale one answers 409 (`stale_version`). */
export function useUpdateFinding(wid: string, fid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateFindingRequest) =>
      request('PATCH', findingPath(wid, fid), {
        body: updateFindingRequest.parse(body),
        schema: findingResponse,
      }),
    onSuccess: (finding) => invalidateAfterFindingWrite(queryClient, wid, finding),
  });
}

/** Soft delete; `mutate(findingId)`. `useRestoreFinding` undoes it. */
export function useDeleteFinding(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fid: string) => request<void>('DELETE', findingPath(wid, fid)),
    onSuccess: () => invalidateAfterFindingWrite(queryClient, wid),
  });
}

/** `mutate(findingId)`. */
export function useRestoreFinding(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (fid: string) =>
      request('POST', `${findingPath(wid, fid)}/restore`, { schema: findingResponse.optional() }),
    onSuccess: (finding) => invalidateAfterFindingWrite(queryClient, wid, finding ?? undefined),
  });
}
