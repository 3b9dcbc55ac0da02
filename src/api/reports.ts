import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  createReportRequest,
  createShareRequest,
  createShareResponse,
  reportResponse,
  shareResponse,
  type CreateShareRequest,
  type ReportKind,
  type ReportResponse,
} from '@/shared/schemas/report';
import { ApiRequestError, cleanError, request } from './client';
import { newId } from './ids';

const reportList = z.object({ items: z.array(reportResponse) });
const shareList = z.object({ items: z.array(shareResponse) });
const vehiclePath = (wid: string, vid: string) => `/api/workshops/${wid}/vehicles/${vid}`;
const reportPath = (wid: string, rid: string) => `/api/workshops/${wid}/reports/${rid}`;

/** How often a report being prepared is asked for its progress. */
export const REPORT_POLL_MS = 1000;

export const isGenerating = (r: Pick<ReportResponse, 'status'>) =>
  r.status === 'queued' || r.status === 'rendering';

export const reportKeys = {
  root: ['reports'] as const,
  workshop: (wid: string) => [...reportKeys.root, wid] as const,
  list: (wid: string, vid: string) => [...reportKeys.workshop(wid), 'vehicle', vid] as const,
  detail: (wid: string, rid: string) => [...reportKeys.workshop(wid), 'detail', rid] as const,
  shares: (wid: string, rid: string) => [...reportKeys.workshop(wid), 'shares', rid] as const,
};

export const reportQueries = {
  /** Newest first; polls while any version is still being prepared. */
  list: (wid: string, vid: string) =>
    queryOptions({
      queryKey: reportKeys.list(wid, vid),
      queryFn: async ({ signal }) =>
        (await request('GET', `${vehiclePath(wid, vid)}/reports`, { schema: reportList, signal }))
          .items,
      refetchInterval: (q) => (q.state.data?.some(isGenerating) ? REPORT_POLL_MS : false),
    }),
  detail: (wid: string, rid: string) =>
    queryOptions({
      queryKey: reportKeys.detail(wid, rid),
      queryFn: ({ signal }) =>
        request('GET', reportPath(wid, rid), { schema: reportResponse, signal }),
      refetchInterval: (q) => (q.state.data && isGenerating(q.state.data) ? REPORT_POLL_MS : false),
    }),
  shares: (wid: string, rid: string) =>
    queryOptions({
      queryKey: reportKeys.shares(wid, rid),
      queryFn: async ({ signal }) =>
        (await request('GET', `${reportPath(wid, rid)}/shares`, { schema: shareList, signal }))
          .items,
    }),
};

export function useReports(wid: string, vid: string) {
  return useQuery(reportQueries.list(wid, vid));
}

export function useReport(wid: string, rid: string) {
  return useQuery(reportQueries.detail(wid, rid));
}

export function useShares(wid: string, rid: string) {
  return useQuery(reportQueries.shares(wid, rid));
}

/** Queues a new version (202); the list then polls until it is ready or failed. */
export function useGenerateReport(wid: string, vid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (kind: ReportKind) =>
      request('POST', `${vehiclePath(wid, vid)}/reports`, {
        body: createReportRequest.parse({ id: newId(), kind }),
        schema: reportResponse,
      }),
    onSuccess: (r) => {
      queryClient.setQueryData(reportKeys.detail(wid, r.id), r);
      return queryClient.invalidateQueries({ queryKey: reportKeys.list(wid, vid) });
    },
  });
}

export function useCreateShare(wid: string, rid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateShareRequest) =>
      request('POST', `${reportPath(wid, rid)}/shares`, {
        body: createShareRequest.parse(body),
        schema: createShareResponse,
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportKeys.shares(wid, rid) }),
  });
}

export function useRevokeShare(wid: string, rid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (sid: string) =>
      request('POST', `/api/workshops/${wid}/shares/${sid}/revoke`, { schema: shareResponse }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportKeys.shares(wid, rid) }),
  });
}

/**
 * A workshop may prepare only a few reports at once; the server's answer says how many (the
 * general 429 wording, "too many attempts", would be wrong here).
 */
export function generateError(error: unknown): string {
  if (error instanceof ApiRequestError && error.status === 429)
    return (
      error.message ||
      'Too many reports are being prepared at once. Wait until one is ready, then try again.'
    );
  return cleanError(error);
}
