import { useQuery } from '@tanstack/react-query';
import { healthSchema } from '../shared/types/health';
import { apiRequest } from './api';
import { STALE } from './queryClient';

export const healthKeys = { all: ['health'] as const };

export function useHealthQuery() {
  return useQuery({
    queryKey: healthKeys.all,
    queryFn: ({ signal }) => apiRequest('/health', { schema: healthSchema, signal }),
    staleTime: STALE.status,
    refetchInterval: 60_000,
    retry: false,
  });
}
