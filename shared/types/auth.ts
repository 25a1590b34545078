import { hiddenNoticeSchema } from './moderation';
import { vehicleClassKeySchema } from './vehicleClasses';
import { z } from './zod';
import { COMMON_PASSWORDS } from './commonPasswords';

export const ROLES = ['racer', 'moderator', 'admin'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const HANDLE_PATTERN = /^[A-Za-z0-9_-]{3,30}$/;
export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;

export const handleSchema = z
  .string()
  .trim()
  .regex(HANDLE_PATTERN, 'Handles are 3–30 characters: letters, digits, - and _.');

export const displayNameSchema = z
  .string()
  .trim()
  .min(1, 'Tell other racers what to call you.')
  .max(80, 'Display names are at most 80 characters.')
  // Control characters make names unreadable and can break layouts.
  .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), 'Display names cannot contain control characters.');

export const emailSchema = z
  .string()
  .trim()
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email('Enter an e-mail address like name@example.com.'))
  .transform((s) => s.toLowerCase());

export const passwordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Passwords need at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Passwords are at most ${PASSWORD_MAX_LENGTH} characters.`)
  .refine((p) => !COMMON_PASSWORDS.has(p.toLowerCase()), 'That password is on the list of most common passwords; pick another.');

export const unitsSchema = z.object({
  length: z.enum(['mm', 'in']),
  temperature: z.enum(['C', 'F']),
});
export type UnitPreferences = z.infer<typeof unitsSchema>;

/** The signed-in racer, as GET /api/me returns it. */
export const meSchema = z.object({
  id: z.number().int(),
  handle: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  emailVerified: z.boolean(),
  /** An e-mail change waiting for its verification link to be clicked. */
  pendingEmail: z.string().nullable(),
  role: roleSchema,
  bio: z.string(),
  homeTrack: z.string(),
  classesRaced: z.array(vehicleClassKeySchema),
  units: unitsSchema,
  hasPassword: z.boolean(),
  githubLogin: z.string().nullable(),
  createdAt: z.string(),
});
export type Me = z.infer<typeof meSchema>;

export const meResponseSchema = z.object({ user: meSchema.nullable() });
export const authResultSchema = z.object({ user: meSchema, csrfToken: z.string() });
export const csrfResponseSchema = z.object({ csrfToken: z.string() });
export const messageResponseSchema = z.object({ message: z.string() });

export const signUpRequestSchema = z.object({
  handle: handleSchema,
  displayName: displayNameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpRequest = z.input<typeof signUpRequestSchema>;

export const signInRequestSchema = z.object({
  /** E-mail address or handle. */
  login: z.string().trim().min(1, 'Enter your e-mail address or handle.').max(254),
  password: z.string().min(1, 'Enter your password.').max(PASSWORD_MAX_LENGTH),
});
export type SignInRequest = z.input<typeof signInRequestSchema>;

export const emailOnlyRequestSchema = z.object({ email: emailSchema });
export const tokenRequestSchema = z.object({ token: z.string().min(10).max(200) });
export const resetPasswordRequestSchema = z.object({ token: z.string().min(10).max(200), password: passwordSchema });

export const profileUpdateSchema = z
  .object({
    displayName: displayNameSchema,
    bio: z.string().max(4000, 'Bios are at most 4,000 characters.'),
    homeTrack: z.string().trim().max(120, 'Home track is at most 120 characters.'),
    classesRaced: z.array(vehicleClassKeySchema).max(6),
    units: unitsSchema,
  })
  .partial();
export type ProfileUpdate = z.input<typeof profileUpdateSchema>;

export const emailChangeRequestSchema = z.object({ email: emailSchema, password: z.string().max(PASSWORD_MAX_LENGTH).optional() });
export const passwordChangeRequestSchema = z.object({
  currentPassword: z.string().max(PASSWORD_MAX_LENGTH).optional(),
  newPassword: passwordSchema,
});

/** A racer's public page, GET /api/racers/:handle. `bioHtml` is rendered and cleaned on the server. */
export const publicRacerSchema = z.object({
  /** The account's id: what a report of this racer's profile names. */
  id: z.number().int(),
  handle: z.string(),
  displayName: z.string(),
  bioHtml: z.string(),
  joinedAt: z.string(),
  homeTrack: z.string(),
  classesRaced: z.array(vehicleClassKeySchema),
  role: roleSchema,
  /**
   * Set when moderators hid this profile, and only for the racer and moderators (others get an
   * empty bio instead). Absent or null otherwise.
   */
  hidden: hiddenNoticeSchema.nullable().optional(),
});
export type PublicRacer = z.infer<typeof publicRacerSchema>;
export const publicRacerResponseSchema = z.object({ racer: publicRacerSchema });

/** One row of the admin's user list. */
export const adminUserSchema = z.object({
  id: z.number().int(),
  handle: z.string(),
  displayName: z.string(),
  email: z.string().nullable(),
  emailVerified: z.boolean(),
  role: roleSchema,
  createdAt: z.string(),
  suspendedUntil: z.string().nullable(),
  suspendedIndefinitely: z.boolean(),
  suspensionReason: z.string().nullable(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;
export const adminUserListSchema = z.object({ users: z.array(adminUserSchema) });
export const roleChangeRequestSchema = z.object({ role: roleSchema });
export const suspendRequestSchema = z.object({
  /** ISO date-time the suspension ends; null means until an admin lifts it. */
  until: z.iso.datetime({ offset: true }).nullable(),
  reason: z.string().trim().min(3, 'Give the racer a reason.').max(500),
});

/** A message caught by the development mailbox (the local fake SMTP server). */
export const mailboxMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  receivedAt: z.string(),
});
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;
export const mailboxSchema = z.object({ messages: z.array(mailboxMessageSchema) });
