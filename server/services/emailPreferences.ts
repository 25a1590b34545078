import type { Pool } from 'pg';
import {
  DEFAULT_EMAIL_PREFERENCES,
  NOTIFICATION_TYPES,
  emailPreferencesUpdateSchema,
  type EmailDelivery,
  type EmailPreferences,
  type NotificationType,
  type UnsubscribeScope,
} from '../../shared/types/community';

type Row = { enabled: boolean; delivery: EmailDelivery; type_choices: Partial<Record<NotificationType, boolean>> };

/** Stored choices over the defaults; a type nobody chose for yet (or added later) shows its default. */
function toPreferences(row: Row | undefined): EmailPreferences {
  if (!row) return structuredClone(DEFAULT_EMAIL_PREFERENCES);
  const types = { ...DEFAULT_EMAIL_PREFERENCES.types };
  for (const type of NOTIFICATION_TYPES) {
    const choice = row.type_choices[type];
    if (typeof choice === 'boolean') types[type] = choice;
  }
  return { enabled: row.enabled, delivery: row.delivery, types };
}

/** A racer's e-mail preferences (the defaults until they change one). */
export async function getEmailPreferences(pool: Pool, userId: number): Promise<EmailPreferences> {
  const { rows } = await pool.query<Row>('SELECT enabled, delivery, type_choices FROM email_preferences WHERE user_id = $1', [userId]);
  return toPreferences(rows[0]);
}

/**
 * Applies a partial update (validated here, so bad input is refused with a message per field) in
 * one upsert; type choices merge into the stored ones, so two tabs changing different types both
 * keep their change.
 */
export async function updateEmailPreferences(pool: Pool, userId: number, body: unknown): Promise<EmailPreferences> {
  const update = emailPreferencesUpdateSchema.parse(body);
  const { rows } = await pool.query<Row>(
    `INSERT INTO email_preferences AS p (user_id, enabled, delivery, type_choices, updated_at)
     VALUES ($1, COALESCE($2, $5::boolean), COALESCE($3, $6::varchar), $4::jsonb, now())
     ON CONFLICT (user_id) DO UPDATE SET
       enabled = COALESCE($2, p.enabled),
       delivery = COALESCE($3, p.delivery),
       type_choices = p.type_choices || $4::jsonb,
       updated_at = now()
     RETURNING enabled, delivery, type_choices`,
    [
      userId,
      update.enabled ?? null,
      update.delivery ?? null,
      JSON.stringify(update.types ?? {}),
      DEFAULT_EMAIL_PREFERENCES.enabled,
      DEFAULT_EMAIL_PREFERENCES.delivery,
    ],
  );
  return toPreferences(rows[0]);
}

/** Turns off one type, or everything ('all' flips the master switch and keeps the per-type choices). */
export function unsubscribeFrom(pool: Pool, userId: number, scope: UnsubscribeScope): Promise<EmailPreferences> {
  return updateEmailPreferences(pool, userId, scope === 'all' ? { enabled: false } : { types: { [scope]: false } });
}

/** Whether an unsubscribe link's scope is already off for the racer. */
export function isAlreadyOff(preferences: EmailPreferences, scope: UnsubscribeScope): boolean {
  return scope === 'all' ? !preferences.enabled : !preferences.enabled || !preferences.types[scope];
}

/** What happens to one event for this racer: a mail now, a line in tomorrow's digest, or nothing. */
export function deliveryFor(preferences: EmailPreferences, type: NotificationType): 'now' | 'digest' | 'none' {
  if (!preferences.enabled || !preferences.types[type]) return 'none';
  return preferences.delivery === 'daily-digest' ? 'digest' : 'now';
}
