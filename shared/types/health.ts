import { z } from './zod';

export const healthSchema = z.object({
  status: z.literal('ok'),
  database: z.literal('ok'),
  version: z.string(),
  uptimeSeconds: z.number().nonnegative(),
});

export type Health = z.infer<typeof healthSchema>;
