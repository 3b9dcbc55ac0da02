import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  createInvitationRequest,
  invitationResponse,
  type CreateInvitationRequest,
} from '@/shared/schemas';
import { request } from './client';
import { outboxKeys } from './outbox';
import { STALE } from './query-client';

const invitationList = z.object({ items: z.array(invitationResponse) });
const base = (wid: string) => `/api/workshops/${wid}/invitations`;

export const invitationKeys = {
  root: ['invitations'] as const,
  list: (wid: string) => [...invitationKeys.root, wid] as const,
};

export const invitationQueries = {
  list: (wid: string) =>
    queryOptions({
      queryKey: invitationKeys.list(wid),
      queryFn: async ({ signal }) =>
        (await request('GET', base(wid), { schema: invitationList, signal })).items,
      staleTime: STALE.medium,
    }),
};

export function useInvitations(wid: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...invitationQueries.list(wid), enabled: options.enabled ?? true });
}

export function useCreateInvitation(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateInvitationRequest) =>
      request('POST', base(wid), {
        body: createInvitationRequest.parse(body),
        schema: invitationResponse,
      }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: invitationKeys.list(wid) }),
        // The invitation mail lands in the development outbox.
        queryClient.invalidateQueries({ queryKey: outboxKeys.root }),
      ]),
  });
}

/** `mutate(invitationId)`. */
export function useRevokeInvitation(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => request<void>('DELETE', `${base(wid)}/${invitationId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.list(wid) }),
  });
}
