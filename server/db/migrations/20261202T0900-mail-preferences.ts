import { DataTypes, literal } from 'sequelize';
import type { MigrationContext } from '../migrator';

/*
 * E-mail preferences, the daily digest's waiting items, and the rate-limit counters every app
 * server shares. The job queue itself (pg-boss) keeps its tables in its own `pgboss` schema, which
 * pg-boss creates and migrates when it starts.
 */
export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const now = literal('now()');
  // No row means the defaults (shared/types/community.ts DEFAULT_EMAIL_PREFERENCES).
  await qi.createTable('email_preferences', {
    user_id: { type: DataTypes.INTEGER, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    enabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    delivery: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'immediate' },
    // Only the types a racer chose explicitly: { "comment-reply": false }. Others keep their default.
    type_choices: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
  });
  await qi.sequelize.query(
    "ALTER TABLE email_preferences ADD CONSTRAINT email_preferences_delivery_check CHECK (delivery IN ('immediate', 'daily-digest'))",
  );

  // Events waiting for a racer's daily digest. A digest job claims its rows by job id before it
  // sends, so a retried job resends the same rows and a second job finds none.
  await qi.createTable('email_digest_items', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    notification: { type: DataTypes.JSONB, allowNull: false },
    claimed_by_job: { type: DataTypes.UUID, allowNull: true },
    // A claim older than a day belongs to a job that gave up: the next digest run takes the rows.
    claimed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: now },
  });
  await qi.addIndex('email_digest_items', ['user_id', 'id'], { name: 'email_digest_items_user_idx' });

  // Rate-limit counters, one row per limiter and client, counted with one atomic upsert. UNLOGGED:
  // no write-ahead log for counters that are worthless after a crash (they restart at zero).
  await qi.sequelize.query(`
    CREATE UNLOGGED TABLE rate_limit_hits (
      key varchar(400) PRIMARY KEY,
      hits integer NOT NULL,
      reset_at timestamptz NOT NULL
    )`);
  await qi.addIndex('rate_limit_hits', ['reset_at'], { name: 'rate_limit_hits_reset_idx' });
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  await qi.dropTable('rate_limit_hits');
  await qi.dropTable('email_digest_items');
  await qi.dropTable('email_preferences');
}
