import { z } from './zod';
import { vehicleClassKeySchema } from './vehicleClasses';
import { trackTypeKeySchema } from './trackTypes';

export const kitSummarySchema = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  makerName: z.string(),
  vehicleClass: vehicleClassKeySchema,
  releasedYear: z.number().int().nullable(),
});
export type KitSummary = z.infer<typeof kitSummarySchema>;

export const trackSummarySchema = z.object({
  id: z.number().int(),
  slug: z.string(),
  name: z.string(),
  surface: trackTypeKeySchema,
  indoor: z.boolean(),
  notes: z.string(),
});
export type TrackSummary = z.infer<typeof trackSummarySchema>;

export const kitListSchema = z.object({ kits: z.array(kitSummarySchema) });
export const trackListSchema = z.object({ tracks: z.array(trackSummarySchema) });
