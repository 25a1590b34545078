import { DataTypes, type CreationAttributes } from 'sequelize';
import type { Database } from '../db/database';
import type { User } from '../models/User';

/*
 * A signed-in request used to cost two round trips before its route ran: the session row, then the
 * racer's row through Sequelize (about 40 % of the server's time on a signed-in request that does
 * nothing else, in a CPU profile under load). The session store now reads both in one prepared
 * statement and hands the racer's row to passport's deserializeUser through this small hand-off,
 * which builds the model instance from it as Sequelize would from its own query.
 *
 * The hand-off only carries a row from the store's read to the deserialisation of the same request
 * (a few milliseconds later, same process); an entry older than HANDOFF_MS is never used, and
 * deserializeUser falls back to reading the racer when there is none. So a suspension or a role
 * change is seen by the next request exactly as before.
 */
const HANDOFF_MS = 1_000;
const MAX_ENTRIES = 10_000;

type Row = Record<string, unknown>;

export type SessionUserHandoff = {
  /** SQL select list of every User attribute of `users u`, aliased to the attribute name. */
  readonly userColumns: string;
  put(row: Row): void;
  /** The racer's row read with their session just now, as a model instance; null when there is none. */
  take(id: number): User | null;
};

const handoffs = new WeakMap<Database, SessionUserHandoff>();

/** The one hand-off of a database's app: the session store puts, passport takes. */
export function sessionUserHandoff(db: Database): SessionUserHandoff {
  let handoff = handoffs.get(db);
  if (handoff) return handoff;
  const model = db.models.User;
  // Columns only: a VIRTUAL attribute has none (Sequelize computes it from the others).
  const userColumns = Object.entries(model.getAttributes())
    .filter(([, definition]) => !(definition.type instanceof DataTypes.VIRTUAL))
    .map(([attribute, definition]) => `u."${definition.field ?? attribute}" AS "${attribute}"`)
    .join(', ');
  const rows = new Map<number, { row: Row; at: number }>();
  handoff = {
    userColumns,
    put(row) {
      const id = row.id as number;
      rows.delete(id);
      rows.set(id, { row, at: Date.now() });
      if (rows.size > MAX_ENTRIES) rows.delete(rows.keys().next().value!);
    },
    take(id) {
      const entry = rows.get(id);
      if (!entry) return null;
      rows.delete(id);
      if (Date.now() - entry.at > HANDOFF_MS) return null;
      // What Sequelize itself does with a SELECT's rows: an existing record, values as read.
      // The row holds every User column as read (userColumns), so it is the model's attributes.
      return model.build(entry.row as CreationAttributes<User>, { isNewRecord: false, raw: true });
    },
  };
  handoffs.set(db, handoff);
  return handoff;
}
