import { QueryTypes, UniqueConstraintError, type Includeable } from 'sequelize';
import type { z } from 'zod';
import type { TrackSummary } from '../../shared/types/catalog';
import { ERROR_CODES } from '../../shared/types/errors';
import {
  runCompareQuerySchema,
  runCreateSchema,
  runUpdateSchema,
  trackCreateSchema,
  trackDayCreateSchema,
  trackDayDateProblem,
  trackDayUpdateSchema,
  type Run as RunDto,
  type RunPair,
  type TrackDay as TrackDayDto,
  type TrackDaySummary,
} from '../../shared/types/trackdays';
import type { Database } from '../db/database';
import { ApiError } from '../errors';
import type { Run } from '../models/Run';
import type { Track } from '../models/Track';
import type { TrackDay } from '../models/TrackDay';

// ---- Input checks ----

/** Parses with a schema; a refusal names each field and leads with the first problem. */
function parseInput<S extends z.ZodTypeAny>(schema: S, input: unknown): z.output<S> {
  const parsed = schema.safeParse(input ?? {});
  if (parsed.success) return parsed.data;
  const details: Record<string, string> = {};
  for (const issue of parsed.error.issues) details[issue.path.join('.') || '_'] = issue.message;
  throw ApiError.validation(details, parsed.error.issues[0].message);
}

function refuse(field: string, message: string): ApiError {
  return ApiError.validation({ [field]: message }, message);
}

/**
 * Only the fields the request sent. The update schemas are `.partial()` of schemas with defaults,
 * and zod fills those defaults in: without this an edit of the date would wipe the notes.
 */
function sentFieldsOnly<T extends object>(parsed: T, input: unknown): Partial<T> {
  const sent = input && typeof input === 'object' ? input : {};
  return Object.fromEntries(Object.entries(parsed).filter(([key]) => Object.hasOwn(sent, key))) as Partial<T>;
}

/** PostgreSQL text cannot hold U+0000; refuse it with a message instead of failing on insert. */
function refuseNulCharacters(fields: Record<string, string | undefined>): void {
  for (const [field, text] of Object.entries(fields)) {
    if (text?.includes('\u0000')) throw refuse(field, 'Text cannot contain the NUL character (U+0000).');
  }
}

function checkTrackDayDate(date: string | undefined): void {
  const problem = date === undefined ? null : trackDayDateProblem(date);
  if (problem) throw refuse('date', problem);
}

/** Put-back laps must be laps of the run; returned sorted without repeats. */
function checkIncludedSlowLaps(included: number[], lapCount: number): number[] {
  included.forEach((index, position) => {
    if (index >= lapCount) {
      const laps = lapCount === 1 ? '1 lap' : `${lapCount} laps`;
      throw refuse(`includedSlowLaps.${position}`, `Lap ${index + 1} cannot be put back in: the run has ${laps}.`);
    }
  });
  return [...new Set(included)].sort((x, y) => x - y);
}

// ---- Tracks ----

export function toTrackSummary(track: Pick<Track, 'id' | 'slug' | 'name' | 'surface' | 'indoor' | 'notes'>): TrackSummary {
  return { id: track.id, slug: track.slug, name: track.name, surface: track.surface, indoor: track.indoor, notes: track.notes };
}

/** The slug a track name gives: ASCII letters and digits joined by dashes, "track" when none are left. */
export function trackSlugBase(name: string): string {
  const slug = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .slice(0, 60)
    .replace(/^-+|-+$/g, '');
  return slug || 'track';
}

/** `base`, or `base-2`, `base-3`… whichever no track has yet. */
async function freeTrackSlug(db: Database, base: string): Promise<string> {
  const taken = await db.sequelize.query<{ slug: string }>("SELECT slug FROM tracks WHERE slug = :base OR slug LIKE :prefix", {
    replacements: { base, prefix: `${base}-%` },
    type: QueryTypes.SELECT,
  });
  const slugs = new Set(taken.map((t) => t.slug));
  let n = 1;
  while (slugs.has(n === 1 ? base : `${base}-${n}`)) n += 1;
  return n === 1 ? base : `${base}-${n}`;
}

async function findTrackByName(db: Database, name: string): Promise<Track | null> {
  const [row] = await db.sequelize.query<{ id: number }>('SELECT id FROM tracks WHERE lower(name) = lower(:name)', {
    replacements: { name },
    type: QueryTypes.SELECT,
  });
  return row ? db.models.Track.findByPk(row.id) : null;
}

function duplicateTrack(existing: Track): ApiError {
  const message = `There is already a track called "${existing.name}": pick it from the list instead.`;
  return new ApiError(400, ERROR_CODES.validation, message, { name: message, existingTrack: toTrackSummary(existing) });
}

/**
 * Adds a track any racer can then pick. Names are unique whatever the case (the duplicate's answer
 * names the existing track); the slug comes from the name, with a number added when taken.
 */
export async function createTrack(db: Database, creatorId: number, input: unknown): Promise<TrackSummary> {
  const data = parseInput(trackCreateSchema, input);
  const name = data.name.replace(/\s+/g, ' ');
  if (/[\u0000-\u001f\u007f-\u009f]/.test(name)) throw refuse('name', 'Track names cannot contain control characters.');
  refuseNulCharacters({ notes: data.notes });
  for (let attempt = 0; ; attempt += 1) {
    const existing = await findTrackByName(db, name);
    if (existing) throw duplicateTrack(existing);
    const slug = await freeTrackSlug(db, trackSlugBase(name));
    try {
      const track = await db.models.Track.create({ slug, name, surface: data.surface, indoor: data.indoor, notes: data.notes, createdBy: creatorId });
      return toTrackSummary(track);
    } catch (err) {
      // Another racer added the same name or took the slug a moment ago: look again.
      if (!(err instanceof UniqueConstraintError) || attempt >= 2) throw err;
    }
  }
}

// ---- Runs ----

function runIncludes(db: Database, withValues = false): Includeable[] {
  return [
    { model: db.models.Car, as: 'car', attributes: ['id', 'nickname'] },
    { model: db.models.Setup, as: 'setup', attributes: ['id', 'title', 'vehicleClass'] },
    { model: db.models.SetupRevision, as: 'revision', attributes: withValues ? ['id', 'number', 'values'] : ['id', 'number'] },
  ];
}

function toRunDto(run: Run): RunDto {
  return {
    id: run.id,
    trackDayId: run.trackDayId,
    label: run.label,
    car: { id: run.carId, nickname: run.car?.nickname ?? '' },
    setup: { id: run.setupId, title: run.setup?.title ?? '' },
    revision: { id: run.revisionId, number: run.revision?.number ?? 0 },
    laps: run.laps,
    includedSlowLaps: run.includedSlowLaps,
    feelNotes: run.feelNotes,
    createdAt: run.createdAt.toISOString(),
  };
}

/** One of the racer's runs (through its track day), else 404. */
async function findOwnRun(db: Database, ownerId: number, runId: number, withValues = false): Promise<Run> {
  const run = Number.isSafeInteger(runId)
    ? await db.models.Run.findOne({
        where: { id: runId },
        include: [{ model: db.models.TrackDay, as: 'trackDay', where: { ownerId }, attributes: ['id'] }, ...runIncludes(db, withValues)],
      })
    : null;
  if (!run) throw ApiError.notFound('That run');
  return run;
}

/**
 * What a new run ran: one of the racer's cars, one of the racer's setups on that car (a setup of
 * another car is refused, even of the same class), and a revision of that setup — its current one
 * unless told. Anything not the racer's reads as not found, without saying whose it is.
 */
async function resolveRunTarget(db: Database, ownerId: number, data: { carId: number; setupId: number; revisionId?: number }) {
  const car = await db.models.Car.findOne({ where: { id: data.carId, ownerId } });
  if (!car) throw refuse('carId', 'That car is not in your garage: pick one of your cars.');
  const setup = await db.models.Setup.findOne({ where: { id: data.setupId, ownerId, deletedAt: null } });
  if (!setup) throw refuse('setupId', 'That setup is not one of yours: pick one of your setups.');
  if (setup.carId !== car.id) throw refuse('setupId', `"${setup.title}" is a setup of another car: pick a setup of ${car.nickname}.`);
  const revisionId = data.revisionId ?? setup.currentRevisionId;
  const revision = revisionId ? await db.models.SetupRevision.findOne({ where: { id: revisionId, setupId: setup.id } }) : null;
  if (!revision) throw refuse('revisionId', `That revision is not one of "${setup.title}"'s revisions.`);
  return { carId: car.id, setupId: setup.id, revisionId: revision.id };
}

/** Logs a run on one of the racer's track days. The revision it ran is fixed here for good. */
export async function createRun(db: Database, ownerId: number, trackDayId: number, input: unknown): Promise<RunDto> {
  const trackDay = await findOwnTrackDay(db, ownerId, trackDayId);
  const data = parseInput(runCreateSchema, input);
  const includedSlowLaps = checkIncludedSlowLaps(data.includedSlowLaps, data.laps.length);
  refuseNulCharacters({ label: data.label, feelNotes: data.feelNotes });
  const target = await resolveRunTarget(db, ownerId, data);
  const run = await db.models.Run.create({
    trackDayId: trackDay.id,
    ...target,
    label: data.label,
    laps: data.laps,
    includedSlowLaps,
    feelNotes: data.feelNotes,
  });
  return toRunDto(await findOwnRun(db, ownerId, run.id));
}

/** Changes a run's name, laps, put-back laps or notes; what it ran stays as logged. */
export async function updateRun(db: Database, ownerId: number, runId: number, input: unknown): Promise<RunDto> {
  const run = await findOwnRun(db, ownerId, runId);
  const changes = sentFieldsOnly(parseInput(runUpdateSchema, input), input);
  const laps = changes.laps ?? run.laps;
  const includedSlowLaps = checkIncludedSlowLaps(changes.includedSlowLaps ?? run.includedSlowLaps, laps.length);
  refuseNulCharacters({ label: changes.label, feelNotes: changes.feelNotes });
  await run.update({ ...changes, includedSlowLaps });
  return toRunDto(await findOwnRun(db, ownerId, run.id));
}

export async function deleteRun(db: Database, ownerId: number, runId: number): Promise<void> {
  const run = await findOwnRun(db, ownerId, runId);
  await run.destroy();
}

/** Two of the racer's runs with the values of the revisions they ran, for the verdict and the field diff. */
export async function getRunPair(db: Database, ownerId: number, query: unknown): Promise<RunPair> {
  const { a, b } = parseInput(runCompareQuerySchema, query);
  const [runA, runB] = [await findOwnRun(db, ownerId, a, true), await findOwnRun(db, ownerId, b, true)];
  const withValues = (run: Run) => ({ ...toRunDto(run), values: run.revision?.values ?? {}, vehicleClass: run.setup?.vehicleClass ?? '' });
  return { a: withValues(runA), b: withValues(runB) };
}

// ---- Track days ----

type TrackDayRow = Omit<TrackDayDto, 'runs'>;

function toTrackDayRow(day: TrackDay): TrackDayRow {
  return {
    id: day.id,
    date: day.date,
    track: toTrackSummary(day.track!),
    conditions: { airTempC: day.airTempC, trackTempC: day.trackTempC, humidityPct: day.humidityPct, moisture: day.moisture, grip: day.grip },
    notes: day.notes,
    createdAt: day.createdAt.toISOString(),
  };
}

/** One of the racer's track days, else 404 (another racer's reads the same as a missing one). */
async function findOwnTrackDay(db: Database, ownerId: number, id: number): Promise<TrackDay> {
  const day = Number.isSafeInteger(id) ? await db.models.TrackDay.findOne({ where: { id, ownerId } }) : null;
  if (!day) throw ApiError.notFound('That track day');
  return day;
}

/** A track day with its track and its runs in the order they were logged. */
export async function getTrackDay(db: Database, ownerId: number, id: number): Promise<TrackDayDto> {
  const { id: found } = await findOwnTrackDay(db, ownerId, id);
  const day = (await db.models.TrackDay.findByPk(found, {
    include: [
      { model: db.models.Track, as: 'track' },
      { model: db.models.Run, as: 'runs', include: runIncludes(db) },
    ],
    order: [[{ model: db.models.Run, as: 'runs' }, 'id', 'ASC']],
  }))!;
  return { ...toTrackDayRow(day), runs: (day.runs ?? []).map(toRunDto) };
}

function conditionColumns(conditions: TrackDayDto['conditions']) {
  const { airTempC, trackTempC, humidityPct, moisture, grip } = conditions;
  return { airTempC, trackTempC, humidityPct, moisture, grip };
}

async function checkTrackExists(db: Database, trackId: number | undefined): Promise<void> {
  if (trackId !== undefined && !(await db.models.Track.findByPk(trackId))) throw refuse('trackId', 'Pick a track from the list.');
}

export async function createTrackDay(db: Database, ownerId: number, input: unknown): Promise<TrackDayDto> {
  const data = parseInput(trackDayCreateSchema, input);
  checkTrackDayDate(data.date);
  refuseNulCharacters({ notes: data.notes });
  await checkTrackExists(db, data.trackId);
  const day = await db.models.TrackDay.create({ ownerId, trackId: data.trackId, date: data.date, notes: data.notes, ...conditionColumns(data.conditions) });
  return getTrackDay(db, ownerId, day.id);
}

/** Changes what was sent; `conditions`, when sent, is replaced as a whole. */
export async function updateTrackDay(db: Database, ownerId: number, id: number, input: unknown): Promise<TrackDayDto> {
  const day = await findOwnTrackDay(db, ownerId, id);
  const { conditions, ...changes } = sentFieldsOnly(parseInput(trackDayUpdateSchema, input), input);
  checkTrackDayDate(changes.date);
  refuseNulCharacters({ notes: changes.notes });
  await checkTrackExists(db, changes.trackId);
  await day.update({ ...changes, ...(conditions ? conditionColumns(conditions) : {}) });
  return getTrackDay(db, ownerId, day.id);
}

/** Deletes a track day and, with it, its runs. */
export async function deleteTrackDay(db: Database, ownerId: number, id: number): Promise<void> {
  const day = await findOwnTrackDay(db, ownerId, id);
  await day.destroy();
}

/** `carId` from a query string: a whole positive id, or a 400. */
function parseCarFilter(carId: unknown): number | undefined {
  if (carId === undefined) return undefined;
  const n = typeof carId === 'string' && /^\d{1,10}$/.test(carId) ? Number(carId) : NaN;
  if (!(n > 0 && n <= 2_147_483_647)) throw refuse('carId', 'carId must be the id of one of your cars.');
  return n;
}

/**
 * The racer's track days, newest first, each with how many runs and laps it holds and which cars
 * ran; with `carId`, only the days that car ran (a car that is not the racer's is 404).
 */
export async function listTrackDays(db: Database, ownerId: number, query: { carId?: unknown }): Promise<TrackDaySummary[]> {
  const carId = parseCarFilter(query.carId);
  if (carId !== undefined && !(await db.models.Car.findOne({ where: { id: carId, ownerId } }))) throw ApiError.notFound('That car');
  const totals = await db.sequelize.query<{ id: number; runCount: number; lapCount: number; carIds: number[] }>(
    `SELECT td.id,
            count(r.id)::int AS "runCount",
            coalesce(sum(cardinality(r.laps)), 0)::int AS "lapCount",
            coalesce(array_agg(DISTINCT r.car_id) FILTER (WHERE r.car_id IS NOT NULL), '{}') AS "carIds"
       FROM track_days td
       LEFT JOIN runs r ON r.track_day_id = td.id
      WHERE td.owner_id = :ownerId
      GROUP BY td.id
     HAVING CAST(:carId AS integer) IS NULL OR CAST(:carId AS integer) = ANY (array_agg(r.car_id))`,
    { replacements: { ownerId, carId: carId ?? null }, type: QueryTypes.SELECT },
  );
  if (!totals.length) return [];
  const byId = new Map(totals.map((t) => [t.id, t]));
  const days = await db.models.TrackDay.findAll({
    where: { id: [...byId.keys()] },
    include: [{ model: db.models.Track, as: 'track' }],
    order: [
      ['date', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return days.map((day) => {
    const { runCount, lapCount, carIds } = byId.get(day.id)!;
    return { ...toTrackDayRow(day), runCount, lapCount, carIds };
  });
}
