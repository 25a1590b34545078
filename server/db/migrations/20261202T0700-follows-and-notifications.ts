import type { MigrationContext } from '../migrator';

/*
 * Follows, the indexes the activity feed reads through, and in-app notifications.
 *
 * The feed (server/services/feed.ts) is one UNION ALL of three branches, each ordered by
 * (created_at DESC, id DESC) and cut at the page size before they are merged:
 * - new public setups of racers I follow: follows (follower_id, …) → setups_owner_public_created_idx,
 *   one short index range per followed racer, already in feed order and already without private,
 *   hidden and deleted rows (the partial predicate is the feed's own filter, so the planner can use it);
 * - their new revisions: the same setups index, then the existing unique (setup_id, number) key per
 *   setup with number > 1 (revision 1 is the setup itself, told by the first branch). EXPLAIN
 *   ANALYZE on 5,000 racers × 10 setups × 10 revisions, 30 follows each, chose that key over a
 *   (setup_id, created_at) index: a setup has a handful of revisions, and revisions are the
 *   most-written table, so no index of ours is added to it. A page took under 4 ms there;
 * - public forks of my setups: setups (owner_id, …) for mine, then setups_public_forks_idx per
 *   original, again partial on what the feed may show.
 * A keyset cursor becomes an index condition on each range ("(created_at, id) before the cursor"),
 * so a deep page costs no more than the first; an OFFSET would also sort and throw away every row
 * of the pages before it, and would shift when new activity arrives.
 */
export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q(`
    CREATE TABLE follows (
      follower_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      followee_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (follower_id, followee_id),
      CONSTRAINT follows_not_self_check CHECK (follower_id <> followee_id)
    )`);
  // The two lists, newest first, with a tiebreaker so the keyset is total. The follower-side one
  // also answers the feed's "whom do I follow" (the primary key would too, unordered).
  await q('CREATE INDEX follows_follower_created_idx ON follows (follower_id, created_at DESC, followee_id DESC)');
  await q('CREATE INDEX follows_followee_created_idx ON follows (followee_id, created_at DESC, follower_id DESC)');

  await q(`CREATE INDEX setups_owner_public_created_idx ON setups (owner_id, created_at DESC, id DESC)
           WHERE visibility = 'public' AND hidden_at IS NULL AND deleted_at IS NULL`);
  await q(`CREATE INDEX setups_public_forks_idx ON setups (forked_from_setup_id, created_at DESC, id DESC)
           WHERE forked_from_setup_id IS NOT NULL AND visibility = 'public' AND hidden_at IS NULL AND deleted_at IS NULL`);

  // The list of event types is frozen here on purpose: a new type comes with its own migration.
  await q(`
    CREATE TABLE notifications (
      id serial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      type varchar(30) NOT NULL CONSTRAINT notifications_type_check CHECK (type IN (
        'new-follower', 'comment-on-setup', 'comment-on-revision', 'comment-reply', 'setup-forked', 'original-changed', 'report-outcome')),
      actor_id integer REFERENCES users (id) ON DELETE CASCADE,
      setup_id integer REFERENCES setups (id) ON DELETE CASCADE,
      revision_id integer REFERENCES setup_revisions (id),
      comment_id integer REFERENCES comments (id) ON DELETE CASCADE,
      detail varchar(500) NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      read_at timestamptz,
      CONSTRAINT notifications_not_own_action_check CHECK (actor_id IS NULL OR actor_id <> user_id)
    )`);
  // My list, newest first (keyset on created_at, id); and the bell's count, over unread rows only.
  await q('CREATE INDEX notifications_user_created_idx ON notifications (user_id, created_at DESC, id DESC)');
  await q('CREATE INDEX notifications_user_unread_idx ON notifications (user_id) WHERE read_at IS NULL');
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  const q = (sql: string) => qi.sequelize.query(sql);
  await q('DROP TABLE IF EXISTS notifications');
  await q('DROP INDEX IF EXISTS setups_public_forks_idx');
  await q('DROP INDEX IF EXISTS setups_owner_public_created_idx');
  await q('DROP TABLE IF EXISTS follows');
}
