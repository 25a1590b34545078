import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { myLimitsSchema, myReportSchema, type ReportCreate } from '../shared/types/moderation';
import { z } from '../shared/types/zod';
import { apiMutate, apiRequest } from './api';
import { STALE } from './queryClient';

export const reportKeys = {
  all: ['reports'] as const,
  mine: () => [...reportKeys.all, 'mine'] as const,
  limits: () => ['me', 'limits'] as const,
};

const reportResponseSchema = z.object({ report: myReportSchema });
const myReportsSchema = z.object({ reports: z.array(myReportSchema) });

/** What I reported, newest first, with each one's outcome once a moderator has looked. */
export function useMyReportsQuery(enabled = true) {
  return useQuery({
    queryKey: reportKeys.mine(),
    queryFn: async ({ signal }) => (await apiRequest('/reports/mine', { schema: myReportsSchema, signal })).reports,
    staleTime: STALE.moderationMine,
    enabled,
  });
}

/** Sends one report; "My reports" then asks again so the new one is listed. */
export function useCreateReport() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: ReportCreate) => (await apiMutate('/reports', { body, schema: reportResponseSchema })).report,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: reportKeys.mine() }),
  });
}

/** The new-account limits that apply to me now; only asked for while signed in. */
export function useMyLimitsQuery(enabled: boolean) {
  return useQuery({
    queryKey: reportKeys.limits(),
    queryFn: ({ signal }) => apiRequest('/me/limits', { schema: myLimitsSchema, signal }),
    staleTime: STALE.moderationMine,
    enabled,
  });
}

