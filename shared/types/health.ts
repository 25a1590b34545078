import { z } from './zod';

export const healthSchema = z.object({
  status: z.literal('ok'),
  database: z.literal('ok'),
  version: z.string(),
  uptimeSeconds: z.number().nonnegative(),
  /** Development tools (the mailbox of the local fake SMTP server) are available on this server. */
  devTools: z.boolean(),
});

export type Health = z.infer<typeof healthSchema>;
