import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  forkPreviewSchema,
  kitSetupListSchema,
  upstreamSchema,
  type ForkPreview,
  type ForkRequest,
  type StockChoice,
  type UpstreamApply,
  type UpstreamRow,
} from '../shared/types/forks';
import { setupDetailResponseSchema, setupDetailSchema, type SetupDetail } from '../shared/types/setups';
import { VEHICLE_CLASSES, type VehicleClassKey } from '../shared/types/vehicleClasses';
import { z } from '../shared/types/zod';
import { ApiRequestError, apiMutate, apiRequest } from './api';
import { historyKeys } from './history';
import { STALE } from './queryClient';
import { setupKeys } from './setups';

export const forkKeys = {
  preview: (setupId: number, carId: number, share?: string, revisionId?: number) =>
    [...setupKeys.all, 'fork-preview', setupId, carId, share ?? null, revisionId ?? null] as const,
  families: () => [...setupKeys.all, 'family'] as const,
  family: (setupId: number, share?: string) => [...forkKeys.families(), setupId, share ?? null] as const,
  upstream: (setupId: number) => [...setupKeys.all, 'upstream', setupId] as const,
  allKitSetups: () => ['kits', 'setups'] as const,
  kitSetups: (kitId: number) => [...forkKeys.allKitSetups(), kitId] as const,
};

const familyNodeSchema = z.object({
  id: z.number().int(),
  parentId: z.number().int().nullable(),
  depth: z.number().int(),
  /** False for setups the viewer may not open; their title and owner are withheld. */
  visible: z.boolean(),
  title: z.string().nullable(),
  ownerHandle: z.string().nullable(),
  createdAt: z.string(),
  changedFromParent: z.number().int().nullable(),
});
export type FamilyNode = z.infer<typeof familyNodeSchema>;

export const familySchema = z.object({
  /** Root first, the direct parent last. */
  ancestors: z.array(familyNodeSchema),
  /** Forks below this setup, by depth then age. */
  descendants: z.array(familyNodeSchema),
  forkCount: z.number().int(),
  familyForkCount: z.number().int(),
});
export type Family = z.infer<typeof familySchema>;

const upstreamApplyResponseSchema = z.object({ setup: setupDetailSchema, taken: z.number().int() });

function shareQuery(share?: string): string {
  return share ? `share=${encodeURIComponent(share)}` : '';
}

function scaleOf(vehicleClass: VehicleClassKey): string | undefined {
  return VEHICLE_CLASSES.find((c) => c.key === vehicleClass)?.scale;
}

/** A setup can be forked onto a car of the same scale: 1/8 with 1/8, 1/10 with 1/10. */
export function canForkOnto(source: VehicleClassKey, target: VehicleClassKey): boolean {
  return scaleOf(source) !== undefined && scaleOf(source) === scaleOf(target);
}

/**
 * The starting choice per option part: a car marked stock has none of them, so it takes the stock
 * value; any other car probably has the part fitted (or its owner means to buy it), so it keeps
 * the original's value.
 */
export function defaultStockChoices(optionParts: ForkPreview['optionParts'], carIsStock: boolean): Record<string, StockChoice> {
  const choice: StockChoice = carIsStock ? 'stock' : 'keep';
  return Object.fromEntries(optionParts.map((part) => [part.key, choice]));
}

/** The same choice for every option part ("Keep all", "Take all stock values"). */
export function allStockChoices(optionParts: ForkPreview['optionParts'], choice: StockChoice): Record<string, StockChoice> {
  return Object.fromEntries(optionParts.map((part) => [part.key, choice]));
}

/** What the racer decided for one offered field of the original. */
export type SyncChoice = { take: boolean; dismiss: boolean };
export const SYNC_UNDECIDED: SyncChoice = { take: false, dismiss: false };

/**
 * Taking a value and "don't offer again" exclude each other: taking it makes the fork agree with the
 * original, so there is nothing left to dismiss.
 */
export function changeSyncChoice(current: SyncChoice, change: Partial<SyncChoice>): SyncChoice {
  const next = { ...current, ...change };
  if (change.take) next.dismiss = false;
  if (change.dismiss) next.take = false;
  return next;
}

/** The body of "apply": fields to take and fields not to offer again, in the order of the rows. */
export function buildUpstreamPayload(
  rows: readonly UpstreamRow[],
  choices: Readonly<Record<string, SyncChoice>>,
): Pick<Required<UpstreamApply>, 'take' | 'dismiss'> {
  const take: string[] = [];
  const dismiss: string[] = [];
  for (const row of rows) {
    const choice = choices[row.key] ?? SYNC_UNDECIDED;
    if (choice.take) take.push(row.key);
    else if (choice.dismiss) dismiss.push(row.key);
  }
  return { take, dismiss };
}

/**
 * The forks below a setup in reading order: each fork followed by its own forks (oldest first), so
 * indenting by depth draws the tree. Forks whose parent is missing from the list go last.
 */
export function familyTreeOrder(rootId: number, descendants: readonly FamilyNode[]): FamilyNode[] {
  const children = new Map<number, FamilyNode[]>();
  for (const node of descendants) {
    const siblings = children.get(node.parentId ?? -1) ?? [];
    siblings.push(node);
    children.set(node.parentId ?? -1, siblings);
  }
  const ordered: FamilyNode[] = [];
  const seen = new Set<number>();
  // An explicit stack: a family a thousand forks deep must not overflow the call stack.
  const stack = [...(children.get(rootId) ?? [])].reverse();
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (seen.has(node.id)) continue;
    seen.add(node.id);
    ordered.push(node);
    stack.push(...[...(children.get(node.id) ?? [])].reverse());
  }
  return [...ordered, ...descendants.filter((node) => !seen.has(node.id))];
}

/** What a fork of this setup onto `carId` would hold; a car of another scale answers 400 on carId. */
export function useForkPreview(setupId: number, carId: number | null, share?: string, revisionId?: number) {
  return useQuery({
    queryKey: forkKeys.preview(setupId, carId ?? 0, share, revisionId),
    queryFn: ({ signal }) => {
      const query = [`carId=${carId}`, revisionId ? `revisionId=${revisionId}` : '', shareQuery(share)].filter(Boolean).join('&');
      return apiRequest(`/setups/${setupId}/fork-preview?${query}`, { schema: forkPreviewSchema, signal });
    },
    staleTime: STALE.setup,
    enabled: carId !== null && Number.isSafeInteger(setupId) && setupId > 0,
  });
}

/** Copies the setup into my garage; the new setup lands in the cache so its page opens at once. */
export function useForkSetup(setupId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: ForkRequest) =>
      (await apiMutate(`/setups/${setupId}/forks`, { body: input, schema: setupDetailResponseSchema })).setup,
    onSuccess: (setup: SetupDetail) => {
      queryClient.setQueryData(setupKeys.detail(setup.id), setup);
      void queryClient.invalidateQueries({ queryKey: setupKeys.garage() });
      // The original's fork counts and every family tree it belongs to now have one more member.
      void queryClient.invalidateQueries({ queryKey: [...setupKeys.all, 'detail', setupId] });
      void queryClient.invalidateQueries({ queryKey: forkKeys.families() });
    },
  });
}

/** The setup's ancestors up to the root and the tree of its forks. */
export function useFamilyQuery(setupId: number, share?: string) {
  return useQuery({
    queryKey: forkKeys.family(setupId, share),
    queryFn: ({ signal }) => {
      const query = shareQuery(share);
      return apiRequest(`/setups/${setupId}/family${query ? `?${query}` : ''}`, { schema: familySchema, signal });
    },
    staleTime: STALE.setup,
    enabled: Number.isSafeInteger(setupId) && setupId > 0,
  });
}

/** For the owner of a fork: what changed in the original since the fork last took changes. */
export function useUpstreamQuery(setupId: number, enabled = true) {
  return useQuery({
    queryKey: forkKeys.upstream(setupId),
    queryFn: ({ signal }) => apiRequest(`/setups/${setupId}/upstream`, { schema: upstreamSchema, signal }),
    staleTime: STALE.setup,
    enabled: enabled && Number.isSafeInteger(setupId) && setupId > 0,
  });
}

/** True for the 409 that says the original or the fork moved while the racer was choosing. */
export function isStaleUpstream(error: unknown): boolean {
  return error instanceof ApiRequestError && error.status === 409;
}

/**
 * Takes the chosen fields from the original as a new revision of the fork. A 409 (either side moved)
 * refetches both, so the screen shows the fresh view.
 */
export function useApplyUpstream(setupId: number) {
  const queryClient = useQueryClient();
  const refresh = () => {
    void queryClient.invalidateQueries({ queryKey: forkKeys.upstream(setupId) });
    void queryClient.invalidateQueries({ queryKey: [...setupKeys.all, 'detail', setupId] });
  };
  return useMutation({
    mutationFn: (input: UpstreamApply) => apiMutate(`/setups/${setupId}/upstream`, { body: input, schema: upstreamApplyResponseSchema }),
    onSuccess: ({ setup }) => {
      queryClient.setQueryData(setupKeys.detail(setup.id), setup);
      void queryClient.invalidateQueries({ queryKey: forkKeys.upstream(setupId) });
      void queryClient.invalidateQueries({ queryKey: historyKeys.setup(setupId) });
      // A public fork's revision count shows on its kit's list.
      void queryClient.invalidateQueries({ queryKey: forkKeys.allKitSetups() });
      void queryClient.invalidateQueries({ queryKey: setupKeys.garage() });
      void queryClient.invalidateQueries({ queryKey: forkKeys.families() });
    },
    onError: (error) => {
      if (isStaleUpstream(error)) refresh();
    },
  });
}

/** Public setups of one kit, newest first, with the kit itself. */
export function useKitSetups(kitId: number) {
  return useQuery({
    queryKey: forkKeys.kitSetups(kitId),
    queryFn: ({ signal }) => apiRequest(`/kits/${kitId}/setups`, { schema: kitSetupListSchema, signal }),
    staleTime: STALE.setup,
    enabled: Number.isSafeInteger(kitId) && kitId > 0,
  });
}
