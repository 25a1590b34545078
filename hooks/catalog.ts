import { useQuery } from '@tanstack/react-query';
import { kitListSchema, trackListSchema } from '../shared/types/catalog';
import { apiRequest } from './api';
import { STALE } from './queryClient';

export const catalogKeys = {
  all: ['catalog'] as const,
  kits: () => [...catalogKeys.all, 'kits'] as const,
  tracks: () => [...catalogKeys.all, 'tracks'] as const,
};

export function useKitsQuery() {
  return useQuery({
    queryKey: catalogKeys.kits(),
    queryFn: async ({ signal }) => (await apiRequest('/kits', { schema: kitListSchema, signal })).kits,
    staleTime: STALE.catalog,
  });
}

export function useTracksQuery() {
  return useQuery({
    queryKey: catalogKeys.tracks(),
    queryFn: async ({ signal }) => (await apiRequest('/tracks', { schema: trackListSchema, signal })).tracks,
    staleTime: STALE.catalog,
  });
}
