import crypto from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import type { Database } from '../db/database';
import type { EmailTokenPurpose } from '../models/EmailToken';

export const TOKEN_LIFETIME_MS: Record<EmailTokenPurpose, number> = {
  verify: 48 * 60 * 60 * 1000,
  reset: 60 * 60 * 1000,
};

export function hashToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex');
}

/**
 * Creates a single-use token for `purpose` and returns it in clear (for the e-mail only); the
 * database keeps its hash. Older unused tokens of the same purpose stop working.
 */
export async function issueEmailToken(
  db: Database,
  userId: number,
  purpose: EmailTokenPurpose,
  email: string,
  now = new Date(),
): Promise<string> {
  const token = crypto.randomBytes(32).toString('base64url');
  await db.sequelize.transaction(async (transaction) => {
    await db.models.EmailToken.update(
      { usedAt: now },
      { where: { userId, purpose, usedAt: null }, transaction },
    );
    await db.models.EmailToken.create(
      { userId, purpose, tokenHash: hashToken(token), email, createdAt: now, expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]) },
      { transaction },
    );
  });
  return token;
}

export type ConsumedToken = { userId: number; email: string | null };

/**
 * Marks the token used and returns whose it was, or null when it is unknown, used or expired.
 * The UPDATE … RETURNING makes two simultaneous uses impossible.
 */
export async function consumeEmailToken(
  db: Database,
  token: string,
  purpose: EmailTokenPurpose,
  transaction?: Transaction,
  now = new Date(),
): Promise<ConsumedToken | null> {
  const [count, rows] = await db.models.EmailToken.update(
    { usedAt: now },
    {
      where: { tokenHash: hashToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: now } },
      returning: true,
      transaction,
    },
  );
  if (count !== 1) return null;
  return { userId: rows[0].userId, email: rows[0].email };
}
