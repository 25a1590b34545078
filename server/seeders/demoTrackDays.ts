import type { Transaction } from 'sequelize';
import type { TrackDayConditions } from '../../shared/types/trackdays';
import type { Database } from '../db/database';

/**
 * Juno's afternoon at Hollow Pines: the same setup run back to back on two revisions, the standard
 * body and then the high-downforce one, so the track-day screens have a real comparison to show.
 * One crash lap in the first run (landed short off the tabletop). All invented.
 */
export const DEMO_TRACK_DAY = {
  owner: 'juno_braithwick',
  track: 'hollow-pines',
  setupTitle: 'Hollow Pines — loose and dusty',
  conditions: { airTempC: 23, trackTempC: 31, humidityPct: 38, moisture: 'dry', grip: 'low' } satisfies TrackDayConditions,
  notes: 'Afternoon practice, wind picking up from the pines side. Body back to back: standard, then high-downforce.',
  runs: [
    {
      revisionNumber: 5,
      label: 'Standard body',
      laps: [39.62, 39.18, 39.41, 38.97, 39.25, 39.33, 46.84, 39.08, 39.47, 39.12, 38.94, 39.36, 39.21, 39.55],
      feelNotes: 'Floats off the tabletop when the wind gusts; landed short on lap 7 and rolled. Loose on exit over the ruts.',
    },
    {
      revisionNumber: 6,
      label: 'High-downforce body',
      laps: [38.91, 38.72, 38.85, 39.04, 38.66, 38.79, 38.93, 38.58, 38.81, 38.97, 38.7, 38.88, 38.76],
      feelNotes: 'Flat and calm in the air off the tabletop. Pushes a little mid-corner in the sweeper.',
    },
  ],
};

/**
 * Seeds the demo track day on the day Juno saved the second revision it uses. Skipped when she
 * already has a track day, or when her setup or the track is gone.
 */
export async function seedDemoTrackDays(db: Database, transaction: Transaction): Promise<void> {
  const { User, Track, Setup, SetupRevision, TrackDay, Run } = db.models;
  const demo = DEMO_TRACK_DAY;
  const owner = await User.findOne({ where: { handle: demo.owner }, transaction });
  if (!owner || (await TrackDay.count({ where: { ownerId: owner.id }, transaction })) > 0) return;
  const track = await Track.findOne({ where: { slug: demo.track }, transaction });
  const setup = await Setup.findOne({ where: { ownerId: owner.id, title: demo.setupTitle, deletedAt: null }, transaction });
  if (!track || !setup) return;
  const revisions = [];
  for (const run of demo.runs) {
    revisions.push(await SetupRevision.findOne({ where: { setupId: setup.id, number: run.revisionNumber }, transaction }));
  }
  if (revisions.some((revision) => !revision)) return;
  const lastRevision = revisions[revisions.length - 1]!;
  const trackDay = await TrackDay.create(
    { ownerId: owner.id, trackId: track.id, date: lastRevision.createdAt.toISOString().slice(0, 10), notes: demo.notes, ...demo.conditions },
    { transaction },
  );
  for (const [i, run] of demo.runs.entries()) {
    await Run.create(
      {
        trackDayId: trackDay.id,
        carId: setup.carId,
        setupId: setup.id,
        revisionId: revisions[i]!.id,
        label: run.label,
        laps: run.laps,
        feelNotes: run.feelNotes,
      },
      { transaction },
    );
  }
}
