import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { publicShareResponse, verifyResponse } from '@/shared/schemas/report';
import { request } from './client';

/** Endpoints anyone may call without a session: a shared report and the genuineness check. */
export const publicKeys = {
  root: ['public'] as const,
  share: (token: string) => [...publicKeys.root, 'share', token] as const,
};

export const publicQueries = {
  share: (token: string) =>
    queryOptions({
      queryKey: publicKeys.share(token),
      queryFn: ({ signal }) =>
        request('GET', `/api/public/shares/${encodeURIComponent(token)}`, {
          schema: publicShareResponse,
          signal,
        }),
      // Every read counts a view; a reader who stays on the page is one view.
      staleTime: Infinity,
      refetchOnWindowFocus: false,
    }),
};

export function usePublicShare(token: string) {
  return useQuery(publicQueries.share(token));
}

/** By identifier, or the file itself (a web File) sent as the multipart field `pdf`. */
export type VerifyInput = { shortId: string } | { file: Blob };

export function useVerify() {
  return useMutation({
    mutationFn: (input: VerifyInput) => {
      if ('shortId' in input)
        return request('GET', `/api/public/verify/${encodeURIComponent(input.shortId)}`, {
          schema: verifyResponse,
        });
      const form = new FormData();
      form.append('pdf', input.file);
      return request('POST', '/api/public/verify', { form, schema: verifyResponse });
    },
  });
}
