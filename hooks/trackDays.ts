import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { formatForDisplay } from '../shared/compute/setup';
import { analyzeRun, type RunAnalysis } from '../shared/compute/trackday';
import type { UnitPreferences } from '../shared/types/auth';
import type { TrackSummary } from '../shared/types/catalog';
import {
  runPairSchema,
  runResponseSchema,
  trackDayListSchema,
  trackDayResponseSchema,
  trackResponseSchema,
  type Run,
  type RunCreate,
  type RunUpdate,
  type TrackCreate,
  type TrackDay,
  type TrackDayConditions,
  type TrackDayCreate,
  type TrackDaySummary,
} from '../shared/types/trackdays';
import { apiMutate, apiRequest } from './api';
import { catalogKeys } from './catalog';
import { STALE } from './queryClient';

export const trackDayKeys = {
  all: ['track-days'] as const,
  lists: () => [...trackDayKeys.all, 'list'] as const,
  /** Every day, or the days one car ran on. */
  list: (carId: number | null) => [...trackDayKeys.lists(), carId] as const,
  detail: (id: number) => [...trackDayKeys.all, 'detail', id] as const,
  runPairs: () => [...trackDayKeys.all, 'run-pair'] as const,
  runPair: (a: number, b: number) => [...trackDayKeys.runPairs(), a, b] as const,
};

/** Track days change only through the racer's own mutations below, like the garage. */
const STALE_TRACK_DAYS = STALE.garage;

function validId(id: number | null | undefined): id is number {
  return typeof id === 'number' && Number.isSafeInteger(id) && id > 0;
}

/** My track days, newest first; only the days `carId` ran on when given. */
export function useTrackDaysQuery(carId: number | null, enabled = true) {
  return useQuery({
    queryKey: trackDayKeys.list(carId),
    queryFn: async ({ signal }) => {
      const path = validId(carId) ? `/track-days?carId=${carId}` : '/track-days';
      return newestFirst((await apiRequest(path, { schema: trackDayListSchema, signal })).trackDays);
    },
    staleTime: STALE_TRACK_DAYS,
    enabled,
  });
}

/** One track day with its runs. */
export function useTrackDayQuery(id: number) {
  return useQuery({
    queryKey: trackDayKeys.detail(id),
    queryFn: async ({ signal }) => (await apiRequest(`/track-days/${id}`, { schema: trackDayResponseSchema, signal })).trackDay,
    staleTime: STALE_TRACK_DAYS,
    enabled: validId(id),
  });
}

/** Two runs and the values of the revisions they ran, for the A/B comparison. */
export function useRunPairQuery(a: number, b: number) {
  return useQuery({
    queryKey: trackDayKeys.runPair(a, b),
    queryFn: ({ signal }) => apiRequest(`/runs/compare?a=${a}&b=${b}`, { schema: runPairSchema, signal }),
    staleTime: STALE_TRACK_DAYS,
    enabled: validId(a) && validId(b),
  });
}

/** A new track for everyone's picker; the answer joins the cached track list at once. */
export function useCreateTrack() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: TrackCreate) => (await apiMutate('/tracks', { body: input, schema: trackResponseSchema })).track,
    onSuccess: (track) => {
      queryClient.setQueryData<TrackSummary[]>(catalogKeys.tracks(), (tracks) => (tracks ? [...tracks, track] : tracks));
      void queryClient.invalidateQueries({ queryKey: catalogKeys.tracks() });
    },
  });
}

function writeDay(queryClient: QueryClient, day: TrackDay) {
  queryClient.setQueryData(trackDayKeys.detail(day.id), day);
  void queryClient.invalidateQueries({ queryKey: trackDayKeys.lists() });
}

export function useCreateTrackDay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: TrackDayCreate) => (await apiMutate('/track-days', { body: input, schema: trackDayResponseSchema })).trackDay,
    onSuccess: (day) => writeDay(queryClient, day),
  });
}

export function useDeleteTrackDay(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiMutate(`/track-days/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: trackDayKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: trackDayKeys.lists() });
      void queryClient.invalidateQueries({ queryKey: trackDayKeys.runPairs() });
    },
  });
}

/** Replaces, adds (when new) or removes one run in the cached day, then refreshes what counts runs and laps. */
function writeRun(queryClient: QueryClient, dayId: number, run: Run | null, removedId?: number) {
  queryClient.setQueryData<TrackDay>(trackDayKeys.detail(dayId), (day) => {
    if (!day) return day;
    const others = day.runs.filter((r) => r.id !== (run?.id ?? removedId));
    if (!run) return { ...day, runs: others };
    const at = day.runs.findIndex((r) => r.id === run.id);
    const runs = at < 0 ? [...day.runs, run] : day.runs.map((r) => (r.id === run.id ? run : r));
    return { ...day, runs };
  });
  void queryClient.invalidateQueries({ queryKey: trackDayKeys.detail(dayId) });
  void queryClient.invalidateQueries({ queryKey: trackDayKeys.lists() });
  void queryClient.invalidateQueries({ queryKey: trackDayKeys.runPairs() });
}

export function useAddRun(dayId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: RunCreate) => (await apiMutate(`/track-days/${dayId}/runs`, { body: input, schema: runResponseSchema })).run,
    onSuccess: (run) => writeRun(queryClient, dayId, run),
  });
}

/** Changes a run's name, laps, notes or which slow laps count; its car, setup and revision never change. */
export function useUpdateRun(dayId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ runId, changes }: { runId: number; changes: RunUpdate }) =>
      (await apiMutate(`/runs/${runId}`, { method: 'PATCH', body: changes, schema: runResponseSchema })).run,
    onSuccess: (run) => writeRun(queryClient, dayId, run),
  });
}

export function useDeleteRun(dayId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (runId: number) => apiMutate(`/runs/${runId}`, { method: 'DELETE' }),
    onSuccess: (_, runId) => writeRun(queryClient, dayId, null, runId),
  });
}

// ---- Plain helpers the track-day screens share ----

/** Newest day first; two days on one date in the order they were logged, latest first. */
export function newestFirst(days: TrackDaySummary[]): TrackDaySummary[] {
  return [...days].sort((x, y) => y.date.localeCompare(x.date) || y.createdAt.localeCompare(x.createdAt));
}

/** The racer's local calendar day as YYYY-MM-DD (not UTC: a late session is still today). */
export function todayIsoDate(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** A calendar date read as a local day, or null when it is not a real date ("2026-02-30"). */
export function parseIsoDate(text: string): Date | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text.trim());
  if (!match) return null;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(year, month - 1, day);
  return date.getFullYear() === year && date.getMonth() === month - 1 && date.getDate() === day ? date : null;
}

/** "Sat, 5 Dec 2026"; read as a local day so it never slips to the day before west of UTC. */
export function formatTrackDayDate(isoDate: string): string {
  const date = parseIsoDate(isoDate);
  if (!date) return isoDate;
  return date.toLocaleDateString(undefined, { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' });
}

export function trackDaysHref(carId?: number | null): string {
  return validId(carId) ? `/track-days?carId=${carId}` : '/track-days';
}

export function runHref(run: Pick<Run, 'id' | 'trackDayId'>): string {
  return `/runs/${run.id}?day=${run.trackDayId}`;
}

export function compareRunsHref(a: number, b: number): string {
  return `/runs/compare?a=${a}&b=${b}`;
}

/** What racers call a run: its own name, or its place in the day. */
export function runName(run: Pick<Run, 'label'>, position?: number): string {
  if (run.label.trim()) return run.label.trim();
  return position === undefined ? 'Unnamed run' : `Run ${position + 1}`;
}

/**
 * The run's statistics with the slow-lap rule applied and the racer's put-backs honoured, or null
 * for a run without laps. Put-backs that no longer point at a lap (laps edited since) are ignored.
 */
export function analyzeRunLaps(run: Pick<Run, 'laps' | 'includedSlowLaps'>): RunAnalysis | null {
  if (run.laps.length === 0) return null;
  const includeIndices = run.includedSlowLaps.filter((i) => Number.isInteger(i) && i >= 0 && i < run.laps.length);
  return analyzeRun(run.laps, { includeIndices });
}

/** The laps that count: every lap except those the slow-lap rule set aside and the racer left out. */
export function countedLaps(run: Pick<Run, 'laps' | 'includedSlowLaps'>): number[] {
  const analysis = analyzeRunLaps(run);
  if (!analysis) return [];
  const aside = new Set(analysis.setAsideIndices);
  return run.laps.filter((_, i) => !aside.has(i));
}

export const MOISTURE_LABELS = { dry: 'Dry', damp: 'Damp', wet: 'Wet', watered: 'Watered' } as const;
export const GRIP_LABELS = { low: 'Low grip', medium: 'Medium grip', high: 'High grip' } as const;

/** "Track 31 °C · Air 24 °C · 40 % humidity · Damp · High grip": only what was noted, in the viewer's units. */
export function conditionParts(conditions: TrackDayConditions, units: UnitPreferences): string[] {
  const temperature = (c: number) => formatForDisplay(c, 'temperature', units).text;
  const parts: string[] = [];
  if (conditions.trackTempC !== null) parts.push(`Track ${temperature(conditions.trackTempC)}`);
  if (conditions.airTempC !== null) parts.push(`Air ${temperature(conditions.airTempC)}`);
  if (conditions.humidityPct !== null) parts.push(`${conditions.humidityPct} % humidity`);
  if (conditions.moisture) parts.push(MOISTURE_LABELS[conditions.moisture]);
  if (conditions.grip) parts.push(GRIP_LABELS[conditions.grip]);
  return parts;
}

/** A positive whole number from a route parameter, or null. */
export function idParam(text: string | string[] | undefined): number | null {
  const value = Array.isArray(text) ? text[0] : text;
  const n = Number(value);
  return value && Number.isSafeInteger(n) && n > 0 ? n : null;
}
