import type { Run, RunPair, TrackDay } from '../../../shared/types/trackdays';

/** A run of Juno's Blue Stoat at the invented Saltmarsh Raceway. */
export function runFixture(overrides: Partial<Run> = {}): Run {
  return {
    id: 1,
    trackDayId: 4,
    label: '',
    car: { id: 3, nickname: 'Blue Stoat' },
    setup: { id: 7, title: 'Hollow Pines — loose and dusty' },
    revision: { id: 45, number: 4 },
    laps: [32.61, 32.48, 32.7, 32.55, 32.66, 32.52, 32.58, 32.64],
    includedSlowLaps: [],
    feelNotes: '',
    createdAt: '2026-12-05T10:00:00.000Z',
    ...overrides,
  };
}

export function trackDayFixture(overrides: Partial<TrackDay> = {}): TrackDay {
  return {
    id: 4,
    date: '2026-12-05',
    track: { id: 2, slug: 'saltmarsh-raceway', name: 'Saltmarsh Raceway', surface: 'hard-packed', indoor: false, notes: '' },
    conditions: { airTempC: 12, trackTempC: 15, humidityPct: 70, moisture: 'damp', grip: 'medium' },
    notes: '',
    runs: [],
    createdAt: '2026-12-05T09:00:00.000Z',
    ...overrides,
  };
}

/** Two runs on consecutive revisions whose sheets differ in `bValues` only. */
export function runPairFixture(aLaps: number[], bLaps: number[], bValues: Record<string, number> = { 'shock.rear.oil': 500 }): RunPair {
  const values = { 'shock.front.oil': 450, 'shock.rear.oil': 450, 'susp.front.ride-height': 27 };
  return {
    a: { ...runFixture({ id: 1, label: 'Heat 1', laps: aLaps }), vehicleClass: 'buggy-1-8-electric', values },
    b: {
      ...runFixture({ id: 2, label: 'Heat 2', laps: bLaps, revision: { id: 55, number: 5 } }),
      vehicleClass: 'buggy-1-8-electric',
      values: { ...values, ...bValues },
    },
  };
}
