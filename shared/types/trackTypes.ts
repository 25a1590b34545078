import { z } from './zod';

/**
 * The fixed list of track surfaces racers tune for. Used for track records, setup conditions
 * and votes. Keys are stored in the database; labels are what people read.
 */
export const TRACK_TYPES = [
  { key: 'indoor-clay', label: 'Indoor high-grip clay' },
  { key: 'hard-packed', label: 'Hard-packed outdoor' },
  { key: 'loose-dusty', label: 'Loose and dusty' },
  { key: 'blue-groove', label: 'Blue-groove' },
  { key: 'wet-muddy', label: 'Wet and muddy' },
  { key: 'rough-bumpy', label: 'Rough and bumpy' },
  { key: 'loamy', label: 'Loamy' },
  { key: 'turf', label: 'Turf' },
] as const;

export type TrackType = (typeof TRACK_TYPES)[number];
export type TrackTypeKey = TrackType['key'];

export const trackTypeKeySchema = z.enum(
  TRACK_TYPES.map((t) => t.key) as [TrackTypeKey, ...TrackTypeKey[]],
);

export function trackTypeLabel(key: TrackTypeKey): string {
  return TRACK_TYPES.find((t) => t.key === key)?.label ?? key;
}
