import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import type { Role } from '@/shared/roles';
import { memberResponse, updateMemberRequest } from '@/shared/schemas';
import { request } from './client';
import { STALE } from './query-client';

const memberList = z.object({ items: z.array(memberResponse) });
const base = (wid: string) => `/api/workshops/${wid}/members`;

export const memberKeys = {
  root: ['members'] as const,
  list: (wid: string) => [...memberKeys.root, wid] as const,
};

export const memberQueries = {
  list: (wid: string) =>
    queryOptions({
      queryKey: memberKeys.list(wid),
      queryFn: async ({ signal }) =>
        (await request('GET', base(wid), { schema: memberList, signal })).items,
      staleTime: STALE.medium,
    }),
};

export function useMembers(wid: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...memberQueries.list(wid), enabled: options.enabled ?? true });
}

/** `mutate({ memberId, role })`. */
export function useChangeMemberRole(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ memberId, role }: { memberId: string; role: Role }) =>
      request('PATCH', `${base(wid)}/${memberId}`, {
        body: updateMemberRequest.parse({ role }),
        schema: memberResponse.optional(),
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: memberKeys.list(wid) }),
  });
}

/** `mutate(memberId)`. */
export function useRemoveMember(wid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (memberId: string) => request<void>('DELETE', `${base(wid)}/${memberId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: memberKeys.list(wid) }),
  });
}
