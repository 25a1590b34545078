import type { MigrationContext } from '../migrator';

/*
 * Moderation: reports, moderators' actions, appeals, what is hidden and why, and the audit log.
 *
 * Hiding never deletes: setups, comments and photos keep their `hidden_at` column (lists filter on
 * it); `content_hides` holds the reason and whether the threshold hid it, for every kind of target,
 * including revision change notes (revisions themselves are immutable) and racer profiles.
 *
 * The audit log is append-only in the database: a trigger refuses UPDATE, DELETE and TRUNCATE, and
 * it has no foreign keys (a cascade would have to change its rows).
 */
const TARGETS = "('setup', 'revision', 'comment', 'photo', 'racer')";
const ACTIONS =
  "('hide', 'restore', 'dismiss', 'warn', 'suspend', 'unsuspend', 'hide-all', 'auto-hide', 'appeal-upheld', 'appeal-overturned')";

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const run = (sql: string) => qi.sequelize.query(sql);

  await run(`
    CREATE TABLE moderation_actions (
      id serial PRIMARY KEY,
      actor_id integer REFERENCES users (id) ON DELETE SET NULL,
      action varchar(20) NOT NULL CHECK (action IN ${ACTIONS}),
      target_type varchar(10) NOT NULL CHECK (target_type IN ${TARGETS}),
      target_id integer NOT NULL,
      subject_user_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      reason text NOT NULL,
      suspended_until timestamptz,
      suspended_indefinitely boolean NOT NULL DEFAULT false,
      hide_content boolean,
      appeal_id integer,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
  await run('CREATE INDEX moderation_actions_subject_idx ON moderation_actions (subject_user_id, created_at DESC)');
  await run('CREATE INDEX moderation_actions_target_idx ON moderation_actions (target_type, target_id, created_at DESC)');

  await run(`
    CREATE TABLE reports (
      id serial PRIMARY KEY,
      reporter_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      target_type varchar(10) NOT NULL CHECK (target_type IN ${TARGETS}),
      target_id integer NOT NULL,
      target_owner_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      reason varchar(10) NOT NULL CHECK (reason IN ('spam', 'abusive', 'unsafe', 'stolen', 'other')),
      note text NOT NULL DEFAULT '',
      status varchar(10) NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'resolved')),
      resolved_by_action_id integer REFERENCES moderation_actions (id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      resolved_at timestamptz
    )`);
  // One open report per reporter and target.
  await run("CREATE UNIQUE INDEX reports_one_open_idx ON reports (reporter_id, target_type, target_id) WHERE status = 'open'");
  await run("CREATE INDEX reports_open_target_idx ON reports (target_type, target_id) WHERE status = 'open'");
  await run('CREATE INDEX reports_reporter_idx ON reports (reporter_id, created_at DESC)');
  await run('CREATE INDEX reports_owner_idx ON reports (target_owner_id)');

  await run(`
    CREATE TABLE appeals (
      id serial PRIMARY KEY,
      action_id integer NOT NULL UNIQUE REFERENCES moderation_actions (id) ON DELETE CASCADE,
      appellant_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      text text NOT NULL,
      status varchar(10) NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'upheld', 'overturned')),
      decided_by integer REFERENCES users (id) ON DELETE SET NULL,
      decision_reason text,
      decided_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
  await run("CREATE INDEX appeals_open_idx ON appeals (created_at) WHERE status = 'open'");

  // The current hidden state of each hidden thing, with the reason its author sees.
  await run(`
    CREATE TABLE content_hides (
      target_type varchar(10) NOT NULL CHECK (target_type IN ${TARGETS}),
      target_id integer NOT NULL,
      hidden_at timestamptz NOT NULL DEFAULT now(),
      reason text NOT NULL,
      auto boolean NOT NULL DEFAULT false,
      action_id integer REFERENCES moderation_actions (id) ON DELETE SET NULL,
      PRIMARY KEY (target_type, target_id)
    )`);

  await run(`
    CREATE TABLE audit_log (
      id bigserial PRIMARY KEY,
      actor_id integer,
      actor_handle varchar(40),
      actor_role varchar(10),
      action varchar(40) NOT NULL,
      target_type varchar(20) NOT NULL,
      target_id integer,
      subject_user_id integer,
      subject_handle varchar(40),
      reason text NOT NULL DEFAULT '',
      previous_state jsonb NOT NULL DEFAULT '{}',
      new_state jsonb NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
  await run('CREATE INDEX audit_log_recent_idx ON audit_log (id DESC)');
  await run('CREATE INDEX audit_log_actor_idx ON audit_log (actor_id, id DESC)');
  await run('CREATE INDEX audit_log_action_idx ON audit_log (action, id DESC)');
  await run(`
    CREATE FUNCTION audit_log_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      RAISE EXCEPTION 'the audit log is append-only (% refused)', TG_OP USING ERRCODE = 'restrict_violation';
    END $$`);
  await run(`CREATE TRIGGER audit_log_no_update_or_delete BEFORE UPDATE OR DELETE ON audit_log
             FOR EACH ROW EXECUTE FUNCTION audit_log_append_only()`);
  await run(`CREATE TRIGGER audit_log_no_truncate BEFORE TRUNCATE ON audit_log
             FOR EACH STATEMENT EXECUTE FUNCTION audit_log_append_only()`);

  // Profiles can be hidden (bio and avatar withheld) like other content.
  await run('ALTER TABLE users ADD COLUMN profile_hidden_at timestamptz');
  // New-account limits count recent posts per author.
  await run('CREATE INDEX IF NOT EXISTS comments_author_recent_idx ON comments (author_id, created_at DESC)');
  await run('CREATE INDEX IF NOT EXISTS setups_owner_created_idx ON setups (owner_id, created_at DESC)');
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  const run = (sql: string) => qi.sequelize.query(sql);
  await run('DROP INDEX IF EXISTS setups_owner_created_idx');
  await run('DROP INDEX IF EXISTS comments_author_recent_idx');
  await run('ALTER TABLE users DROP COLUMN IF EXISTS profile_hidden_at');
  await run('DROP TABLE IF EXISTS audit_log');
  await run('DROP FUNCTION IF EXISTS audit_log_append_only()');
  await run('DROP TABLE IF EXISTS content_hides');
  await run('DROP TABLE IF EXISTS appeals');
  await run('DROP TABLE IF EXISTS reports');
  await run('DROP TABLE IF EXISTS moderation_actions');
}
