import { z } from './zod';
import { gripSchema, setupValuesSchema } from './setups';
import { trackTypeKeySchema } from './trackTypes';
import { trackSummarySchema } from './catalog';

/*
 * Track days: what the client and the API exchange. Lap statistics, verdicts, CSV reading and the
 * oil model are shared code (shared/compute/trackday); the API stores and validates, the screens
 * compute what they show from the same functions.
 */

/** A run holds at most this many laps (a long practice; more is a logging mistake). */
export const MAX_LAPS_PER_RUN = 500;
export const FEEL_NOTES_MAX = 2_000;
export const TRACK_DAY_NOTES_MAX = 5_000;

export const SURFACE_MOISTURE = ['dry', 'damp', 'wet', 'watered'] as const;
export const surfaceMoistureSchema = z.enum(SURFACE_MOISTURE);

const id = (message: string) => z.number(message).int(message).positive(message).max(2_147_483_647, message);

// ---- Tracks ----

export const trackCreateSchema = z.object({
  name: z.string().trim().min(2, 'Give the track a name of at least 2 characters.').max(80, 'Track names are at most 80 characters.'),
  surface: trackTypeKeySchema,
  indoor: z.boolean().default(false),
  notes: z.string().max(2_000, 'Track notes are at most 2,000 characters.').default(''),
});
export type TrackCreate = z.input<typeof trackCreateSchema>;
export const trackResponseSchema = z.object({ track: trackSummarySchema });

// ---- Track days ----

export const trackDayConditionsSchema = z.object({
  airTempC: z.number().min(-30, 'Below −30 °C nobody is racing.').max(60, 'Above 60 °C is not an air temperature.').nullable(),
  trackTempC: z.number().min(-30, 'Below −30 °C nobody is racing.').max(80, 'Above 80 °C is not a track temperature.').nullable(),
  humidityPct: z.number().min(0, 'Humidity is between 0 and 100 %.').max(100, 'Humidity is between 0 and 100 %.').nullable(),
  moisture: surfaceMoistureSchema.nullable(),
  grip: gripSchema.nullable(),
});
export type TrackDayConditions = z.infer<typeof trackDayConditionsSchema>;

export const trackDayCreateSchema = z.object({
  /** ISO calendar date, YYYY-MM-DD (the racer's local day). */
  date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Pick a date as YYYY-MM-DD.'),
  trackId: id('Pick a track.'),
  conditions: trackDayConditionsSchema,
  notes: z.string().max(TRACK_DAY_NOTES_MAX, `Notes are at most ${TRACK_DAY_NOTES_MAX.toLocaleString('en')} characters.`).default(''),
});
export type TrackDayCreate = z.input<typeof trackDayCreateSchema>;
// Updates change only what is sent: no defaults, or a date-only edit would blank the notes.
export const trackDayUpdateSchema = trackDayCreateSchema.extend({ notes: trackDayCreateSchema.shape.notes.removeDefault() }).partial();

// ---- Runs ----

/** Lap times in seconds, in the order driven. */
export const lapTimesSchema = z
  .array(z.number('Lap times are numbers of seconds.').positive('A lap time is more than 0 s.').max(3_600, 'A lap of more than an hour is not a lap.'))
  .max(MAX_LAPS_PER_RUN, `A run holds at most ${MAX_LAPS_PER_RUN} laps.`);

export const runCreateSchema = z.object({
  carId: id('Pick one of your cars.'),
  setupId: id('Pick the setup the car ran.'),
  /** The setup's revision the car ran; the setup's current revision when left out. Later edits never change it. */
  revisionId: id('Pick a revision of that setup.').optional(),
  label: z.string().trim().max(60, 'Run names are at most 60 characters.').default(''),
  laps: lapTimesSchema.default([]),
  /** 0-based lap indexes the racer put back in after the slow-lap rule set them aside. */
  includedSlowLaps: z.array(z.number().int().min(0)).default([]),
  feelNotes: z.string().max(FEEL_NOTES_MAX, `Notes are at most ${FEEL_NOTES_MAX.toLocaleString('en')} characters.`).default(''),
});
export type RunCreate = z.input<typeof runCreateSchema>;
// Updates change only what is sent: no defaults, or a label-only edit would blank the laps.
export const runUpdateSchema = z
  .object({
    label: runCreateSchema.shape.label.removeDefault(),
    laps: runCreateSchema.shape.laps.removeDefault(),
    includedSlowLaps: runCreateSchema.shape.includedSlowLaps.removeDefault(),
    feelNotes: runCreateSchema.shape.feelNotes.removeDefault(),
  })
  .partial();
export type RunUpdate = z.input<typeof runUpdateSchema>;

export const runSchema = z.object({
  id: z.number().int(),
  trackDayId: z.number().int(),
  label: z.string(),
  car: z.object({ id: z.number().int(), nickname: z.string() }),
  setup: z.object({ id: z.number().int(), title: z.string() }),
  revision: z.object({ id: z.number().int(), number: z.number().int() }),
  laps: z.array(z.number()),
  includedSlowLaps: z.array(z.number().int()),
  feelNotes: z.string(),
  createdAt: z.string(),
});
export type Run = z.infer<typeof runSchema>;

export const trackDaySchema = z.object({
  id: z.number().int(),
  date: z.string(),
  track: trackSummarySchema,
  conditions: trackDayConditionsSchema,
  notes: z.string(),
  runs: z.array(runSchema),
  createdAt: z.string(),
});
export type TrackDay = z.infer<typeof trackDaySchema>;

export const trackDaySummarySchema = trackDaySchema.omit({ runs: true }).extend({
  runCount: z.number().int(),
  lapCount: z.number().int(),
  /** Cars that ran that day (for the per-car list in the garage). */
  carIds: z.array(z.number().int()),
});
export type TrackDaySummary = z.infer<typeof trackDaySummarySchema>;
export const trackDayListSchema = z.object({ trackDays: z.array(trackDaySummarySchema) });
export const trackDayResponseSchema = z.object({ trackDay: trackDaySchema });
export const runResponseSchema = z.object({ run: runSchema });

/** What a comparison of two runs needs beyond their laps: the two revisions' values, for the field diff. */
export const runPairSchema = z.object({
  a: runSchema.extend({ values: setupValuesSchema, vehicleClass: z.string() }),
  b: runSchema.extend({ values: setupValuesSchema, vehicleClass: z.string() }),
});
export type RunPair = z.infer<typeof runPairSchema>;

// ---- Additions for the API (checks a schema cannot express on its own) ----

/** Track days are dated within these years; outside them a date is a typing mistake. */
export const TRACK_DAY_FIRST_YEAR = 1970;
export const TRACK_DAY_LAST_YEAR = 2100;

/**
 * Why `date` (already YYYY-MM-DD) is not a usable track-day date, or null when it is: it must be a
 * day of the calendar (no 30 February) within the years above.
 */
export function trackDayDateProblem(date: string): string | null {
  const [year, month, day] = date.split('-').map(Number);
  const parsed = new Date(Date.UTC(year, month - 1, day));
  if (parsed.getUTCFullYear() !== year || parsed.getUTCMonth() !== month - 1 || parsed.getUTCDate() !== day) {
    return `${date} is not a day of the calendar.`;
  }
  if (year < TRACK_DAY_FIRST_YEAR || year > TRACK_DAY_LAST_YEAR) {
    return `Pick a date between ${TRACK_DAY_FIRST_YEAR} and ${TRACK_DAY_LAST_YEAR}.`;
  }
  return null;
}

/** Query of GET /api/runs/compare: the two runs, A first. */
export const runCompareQuerySchema = z.object({
  a: z.coerce.number('Pick run A to compare.').pipe(id('Pick run A to compare.')),
  b: z.coerce.number('Pick run B to compare.').pipe(id('Pick run B to compare.')),
});
