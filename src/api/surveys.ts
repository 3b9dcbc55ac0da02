import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { createSurveyRequest, surveyResponse, type CreateSurveyRequest } from '@/shared/schemas';
import { request } from './client';
import { newId } from './ids';
import { invalidateVehicles } from './vehicles';

const surveyList = z.object({ items: z.array(surveyResponse) });

export const surveyKeys = {
  root: ['surveys'] as const,
  workshop: (wid: string) => [...surveyKeys.root, wid] as const,
  list: (wid: string, vid: string) => [...surveyKeys.workshop(wid), 'vehicle', vid] as const,
};

export const surveyQueries = {
  list: (wid: string, vid: string) =>
    queryOptions({
      queryKey: surveyKeys.list(wid, vid),
      queryFn: async ({ signal }) =>
        (
          await request('GET', `/api/workshops/${wid}/vehicles/${vid}/surveys`, {
            schema: surveyList,
            signal,
          })
        ).items,
    }),
};

export function useSurveys(wid: string, vid: string) {
  return useQuery(surveyQueries.list(wid, vid));
}

export function useCreateSurvey(wid: string, vid: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateSurveyRequest) =>
      request('POST', `/api/workshops/${wid}/vehicles/${vid}/surveys`, {
        body: createSurveyRequest.parse({ ...body, id: body.id ?? newId() }),
        schema: surveyResponse,
      }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: surveyKeys.list(wid, vid) }),
        // The vehicle's summary (survey count, last survey date) changes too.
        invalidateVehicles(queryClient, wid),
      ]),
  });
}
