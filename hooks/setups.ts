import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  carSchema,
  garageSchema,
  kitStockSchema,
  setupDetailResponseSchema,
  type CarCreate,
  type RevisionCreate,
  type SetupCreate,
  type SetupDetail,
  type SetupMetaUpdate,
} from '../shared/types/setups';
import { z } from '../shared/types/zod';
import { apiMutate, apiRequest, apiUpload } from './api';
import { STALE } from './queryClient';
import { reportKeys } from './reports';

export const setupKeys = {
  all: ['setups'] as const,
  garage: () => [...setupKeys.all, 'garage'] as const,
  detail: (id: number, share?: string) => [...setupKeys.all, 'detail', id, share ?? null] as const,
  /** A setup's history and single revisions (hooks/history.ts), whichever share token opened them. */
  history: (id: number) => [...setupKeys.all, 'history', id] as const,
  kitStock: (kitId: number) => ['kits', 'stock', kitId] as const,
};

const carResponseSchema = z.object({ car: carSchema });
const revisionResponseSchema = setupDetailResponseSchema.extend({ warnings: z.record(z.string(), z.string()) });

/** My cars, each with its setups. */
export function useGarageQuery(enabled = true) {
  return useQuery({
    queryKey: setupKeys.garage(),
    queryFn: ({ signal }) => apiRequest('/garage', { schema: garageSchema, signal }),
    staleTime: STALE.garage,
    enabled,
  });
}

/** A kit's stock sheet and which options are in its box. */
export function useKitStockQuery(kitId: number | null) {
  return useQuery({
    queryKey: setupKeys.kitStock(kitId ?? 0),
    queryFn: async ({ signal }) => (await apiRequest(`/kits/${kitId}/stock`, { schema: z.object({ stock: kitStockSchema }), signal })).stock,
    staleTime: STALE.catalog,
    enabled: kitId !== null,
  });
}

/** One setup as the viewer may see it; `share` opens an unlisted setup. */
export function useSetupQuery(id: number, share?: string) {
  return useQuery({
    queryKey: setupKeys.detail(id, share),
    queryFn: async ({ signal }) =>
      (await apiRequest(`/setups/${id}${share ? `?share=${encodeURIComponent(share)}` : ''}`, { schema: setupDetailResponseSchema, signal })).setup,
    staleTime: STALE.setup,
    enabled: Number.isSafeInteger(id) && id > 0,
  });
}

function useSetupCacheWriter() {
  const queryClient = useQueryClient();
  return (setup: SetupDetail) => {
    queryClient.setQueryData(setupKeys.detail(setup.id), setup);
    void queryClient.invalidateQueries({ queryKey: setupKeys.garage() });
  };
}

export function useCreateCar() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: CarCreate) => (await apiMutate('/cars', { body: input, schema: carResponseSchema })).car,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: setupKeys.garage() }),
  });
}

export function useCreateSetup() {
  const queryClient = useQueryClient();
  const write = useSetupCacheWriter();
  return useMutation({
    mutationFn: async (input: SetupCreate) => (await apiMutate('/setups', { body: input, schema: setupDetailResponseSchema })).setup,
    onSuccess: (setup) => {
      write(setup);
      // A new account's count of setups this hour just went up.
      void queryClient.invalidateQueries({ queryKey: reportKeys.limits() });
    },
  });
}

export function useUpdateSetupMeta(id: number) {
  const write = useSetupCacheWriter();
  return useMutation({
    mutationFn: async (input: SetupMetaUpdate) => (await apiMutate(`/setups/${id}`, { method: 'PATCH', body: input, schema: setupDetailResponseSchema })).setup,
    onSuccess: write,
  });
}

/** Saves a new revision; a stale base rejects with ApiRequestError code `stale_revision`. */
export function useSaveRevision(id: number) {
  const queryClient = useQueryClient();
  const write = useSetupCacheWriter();
  return useMutation({
    mutationFn: (input: RevisionCreate) => apiMutate(`/setups/${id}/revisions`, { body: input, schema: revisionResponseSchema }),
    onSuccess: (result) => {
      write(result.setup);
      void queryClient.invalidateQueries({ queryKey: setupKeys.history(id) });
    },
  });
}

export function useDeleteSetup(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiMutate(`/setups/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: [...setupKeys.all, 'detail', id] });
      void queryClient.invalidateQueries({ queryKey: setupKeys.garage() });
    },
  });
}

export function useImportSetup() {
  const write = useSetupCacheWriter();
  return useMutation({
    mutationFn: async (input: { carId: number; document: unknown }) =>
      (await apiMutate('/setups/import', { body: input, schema: setupDetailResponseSchema })).setup,
    onSuccess: write,
  });
}

export function useDeleteSetupPhoto(id: number) {
  const write = useSetupCacheWriter();
  return useMutation({
    mutationFn: async (photoId: number) =>
      (await apiMutate(`/setups/${id}/photos/${photoId}`, { method: 'DELETE', schema: setupDetailResponseSchema })).setup,
    onSuccess: write,
  });
}

/** Uploads a photo to a setup, reporting progress from 0 to 1; the answer replaces the cached setup. */
export function useUploadSetupPhoto(id: number) {
  const write = useSetupCacheWriter();
  return useMutation({
    mutationFn: ({ file, caption, onProgress }: { file: Blob; caption?: string; onProgress?: (fraction: number) => void }) => {
      const form = new FormData();
      if (caption) form.append('caption', caption);
      form.append('photo', file);
      return apiUpload(`/setups/${id}/photos`, form, { schema: setupDetailResponseSchema, onProgress }).then((r) => r.setup);
    },
    onSuccess: write,
  });
}

/** Server-rendered preview of notes markdown: the same cleaning the saved notes get. */
export function useMarkdownPreview() {
  return useMutation({
    mutationFn: async (markdown: string) => (await apiMutate('/markdown/preview', { body: { markdown }, schema: z.object({ html: z.string() }) })).html,
  });
}
