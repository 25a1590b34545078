import { useInfiniteQuery } from '@tanstack/react-query';
import { discoverPageSchema, searchPageSchema, type DiscoverSort } from '../shared/types/community';
import type { TrackTypeKey } from '../shared/types/trackTypes';
import type { VehicleClassKey } from '../shared/types/vehicleClasses';
import { apiRequest } from './api';

/** What the Discover screen asks for; temperatures are °C (the screen converts from the racer's unit). */
export type DiscoverFilters = {
  vehicleClass: VehicleClassKey | null;
  kitId: number | null;
  trackType: TrackTypeKey | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  sort: DiscoverSort;
  /** The track type "best for" ranks by; only sent with that order. */
  bestFor: TrackTypeKey | null;
};

export const NO_FILTERS: DiscoverFilters = {
  vehicleClass: null,
  kitId: null,
  trackType: null,
  tempMinC: null,
  tempMaxC: null,
  sort: 'newest',
  bestFor: null,
};

export const discoverKeys = {
  all: ['discover'] as const,
  list: (filters: DiscoverFilters) => [...discoverKeys.all, 'list', filters] as const,
  search: (q: string) => [...discoverKeys.all, 'search', q] as const,
};

/** Lists change as racers publish and vote: half a minute old is fresh enough while scrolling. */
export const DISCOVER_STALE_MS = 30_000;

/** The query string of GET /api/discover for `filters`; unset filters are left out. */
export function discoverQueryString(filters: DiscoverFilters, cursor: string | null = null): string {
  const params = new URLSearchParams();
  if (filters.vehicleClass) params.set('class', filters.vehicleClass);
  if (filters.kitId !== null) params.set('kit', String(filters.kitId));
  if (filters.trackType) params.set('trackType', filters.trackType);
  if (filters.tempMinC !== null) params.set('tempMin', String(filters.tempMinC));
  if (filters.tempMaxC !== null) params.set('tempMax', String(filters.tempMaxC));
  if (filters.sort !== 'newest') params.set('sort', filters.sort);
  if (filters.sort === 'best-for' && filters.bestFor) params.set('bestFor', filters.bestFor);
  if (cursor) params.set('cursor', cursor);
  const text = params.toString();
  return text ? `?${text}` : '';
}

/** Public setups for `filters`, a page at a time: `fetchNextPage` follows the server's cursor. */
export function useDiscoverQuery(filters: DiscoverFilters, enabled = true) {
  return useInfiniteQuery({
    queryKey: discoverKeys.list(filters),
    queryFn: ({ pageParam, signal }) => apiRequest(`/discover${discoverQueryString(filters, pageParam)}`, { schema: discoverPageSchema, signal }),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: DISCOVER_STALE_MS,
    enabled: enabled && (filters.sort !== 'best-for' || filters.bestFor !== null),
  });
}

/** Setups matching the words `q` (websearch syntax), a page at a time; off while `q` is blank. */
export function useSearchQuery(q: string) {
  const words = q.trim();
  return useInfiniteQuery({
    queryKey: discoverKeys.search(words),
    queryFn: ({ pageParam, signal }) => {
      const params = new URLSearchParams({ q: words });
      if (pageParam) params.set('cursor', pageParam);
      return apiRequest(`/search?${params.toString()}`, { schema: searchPageSchema, signal });
    },
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
    staleTime: DISCOVER_STALE_MS,
    enabled: words.length > 0,
  });
}
