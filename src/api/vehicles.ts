import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  createVehicleRequest,
  updateVehicleRequest,
  vehicleResponse,
  type CreateVehicleRequest,
  type UpdateVehicleRequest,
  type VehicleResponse,
  type vehicleListQuery,
} from '@/shared/schemas';
import { request } from './client';
import { newId, queryString } from './ids';

export type VehicleListQuery = z.input<typeof vehicleListQuery>;

const vehicleList = z.object({ items: z.array(vehicleResponse) });
const base = (wid: string) => `/api/workshops/${wid}/vehicles`;

export const vehicleKeys = {
  root: ['vehicles'] as const,
  workshop: (wid: string) => [...vehicleKeys.root, wid] as const,
  lists: (wid: string) => [...vehicleKeys.workshop(wid), 'list'] as const,
  list: (wid: string, query: VehicleListQuery = {}) => [...vehicleKeys.lists(wid), query] as const,
  detail: (wid: string, vid: string) => [...vehicleKeys.workshop(wid), 'detail', vid] as const,
};

export const vehicleQueries = {
  list: (wid: string, query: VehicleListQuery = {}) =>
    queryOptions({
      queryKey: vehicleKeys.list(wid, query),
      queryFn: async ({ signal }) =>
        (await request('GET', base(wid) + queryString(query), { schema: vehicleList, signal }))
          .items,
    }),
  detail: (wid: string, vid: string) =>
    queryOptions({
      queryKey: vehicleKeys.detail(wid, vid),
      queryFn: ({ signal }) =>
        request('GET', `${base(wid)}/${vid}`, { schema: vehicleResponse, signal }),
    }),
};

export function useVehicles(wid: string, query: VehicleListQuery = {}) {
  return useQuery(vehicleQueries.list(wid, query));
}

export function useVehicle(wid: string, vid: string) {
  return useQuery(vehicleQueries.detail(wid, vid));
}

/** Refresh every vehicle list and detail of the workshop (summaries depend on findings too). */
export function invalidateVehicles(queryClient: ReturnType<typeof useQueryClient>, wid: string) {
  return queryClient.invalidateQueries({ queryKey: vehicleKeys.workshop(wid) });
}

/** The body carries a client-made id (kept across retries of the same form) so a repeat is one row. */
export function useCreateVehicle(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateVehicleRequest) =>
      request('POST', base(wid), {
        body: createVehicleRequest.parse({ ...body, id: body.id ?? newId() }),
        schema: vehicleResponse,
      }),
    onSuccess: (vehicle) => {
      queryClient.setQueryData(vehicleKeys.detail(wid, vehicle.id), vehicle);
      return invalidateVehicles(queryClient, wid);
    },
  });
}

/** Send the `version` the editor loaded; a stale one answers 409 (`stale_version`). */
export function useUpdateVehicle(wid: string, vid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UpdateVehicleRequest) =>
      request('PATCH', `${base(wid)}/${vid}`, {
        body: updateVehicleRequest.parse(body),
        schema: vehicleResponse,
      }),
    onSuccess: (vehicle: VehicleResponse) => {
      queryClient.setQueryData(vehicleKeys.detail(wid, vid), vehicle);
      return invalidateVehicles(queryClient, wid);
    },
  });
}

/** Soft delete; `mutate(vehicleId)`. Restore undoes it. */
export function useDeleteVehicle(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (vid: string) => request<void>('DELETE', `${base(wid)}/${vid}`),
    onSuccess: () => invalidateVehicles(queryClient, wid),
  });
}

/** `mutate(vehicleId)`. */
export function useRestoreVehicle(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (vid: string) =>
      request('POST', `${base(wid)}/${vid}/restore`, { schema: vehicleResponse.optional() }),
    onSuccess: () => invalidateVehicles(queryClient, wid),
  });
}
