import type { MigrationContext } from '../migrator';

/*
 * The activity feed, written when things happen instead of gathered when it is read ("fan-out on
 * write"). Reading it had meant joining every followed racer's setups and every revision of them and
 * sorting a few thousand rows per page (14 ms of database time for a racer following 49 racers on
 * the generated world); now a page is one range of one index plus a primary-key lookup per item.
 *
 * feed_items holds, per reader, one row per thing that may appear in their feed: a new setup or a
 * revision (number > 1) by a racer they follow, or a fork of one of their setups by another racer.
 * Rows are kept by triggers, so every way of writing (API, demo seeders, imports) feeds it:
 *   - a setup or revision is fanned out to the owner's followers when it is written while the setup
 *     is listed (public, not hidden, not deleted); new setups start private, and a racer's private
 *     work never fills their followers' feeds with rows to skip;
 *   - a setup that becomes listed (shared, restored by moderators, undeleted) is fanned out then,
 *     with its newest FOLLOW_BACKFILL revisions;
 *   - following a racer brings their newest FOLLOW_BACKFILL listed changes into my feed; anything
 *     older stays in each setup's history;
 *   - unfollowing removes their setups and revisions from my feed (forks of my setups stay);
 *   - a fork of my setup by another racer is written for me whatever its visibility (one row).
 * Whether an item may be shown now (still listed, owner not suspended) is decided when the feed is
 * read, so a setup made private or hidden later needs no feed upkeep.
 * A racer's saves and follows or unfollows of that racer are serialised on an advisory lock
 * (FEED_LOCK_SPACE, racer id): without it a save and a follow committing at the same moment would
 * each miss the other (the item never reaches the new follower), and an unfollow could delete
 * before a save's fan-out writes. Saves share the lock; follows take it alone.
 * The rows carry the item's time so the index orders them; the demo seeders back-date setups after
 * writing them, so a change of a setup's time is carried over (by primary key).
 */

/** How many of a racer's newest listed changes join my feed when I follow them. */
export const FOLLOW_BACKFILL = 20;

/** The first key of the feed's advisory locks (the second is a racer's id); any number no other lock uses. */
const FEED_LOCK_SPACE = 1702;

/** A setup anyone may see in a list: public, neither hidden by moderation nor deleted. */
const listed = (row: string) => `${row}.visibility = 'public' AND ${row}.hidden_at IS NULL AND ${row}.deleted_at IS NULL`;

/**
 * Fills feed_items for every existing follow (the followee's newest `perFollow` listed setups and
 * revisions) and every listed fork of another racer's setup. Used by this migration and by the
 * generated world of `npm run seed:scale`, which loads with the feed triggers off.
 */
export const BACKFILL_SQL = (perFollow: number) => `
  WITH recent AS (
    SELECT owner_id, created_at, kind, item_id FROM (
      SELECT x.*, row_number() OVER (PARTITION BY x.owner_id ORDER BY x.created_at DESC, x.kind DESC, x.item_id DESC) AS n
        FROM (SELECT s.owner_id, s.created_at, 'setup'::text AS kind, s.id AS item_id
                FROM setups s WHERE ${listed('s')}
              UNION ALL
              SELECT s.owner_id, r.created_at, 'revision', r.id
                FROM setups s JOIN setup_revisions r ON r.setup_id = s.id AND r.number > 1
               WHERE ${listed('s')}) x) ranked
     WHERE n <= ${Number(perFollow)})
  INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
  SELECT f.follower_id, r.created_at, r.kind, r.item_id, r.owner_id FROM follows f JOIN recent r ON r.owner_id = f.followee_id
  UNION ALL
  SELECT s.forked_from_owner_id, s.created_at, 'fork', s.id, s.owner_id FROM setups s
   WHERE s.forked_from_owner_id IS NOT NULL AND s.forked_from_owner_id <> s.owner_id
  ON CONFLICT DO NOTHING`;

export async function up({ queryInterface: qi }: MigrationContext): Promise<void> {
  const run = (sql: string) => qi.sequelize.query(sql);
  // Ordered as the feed is read: newest first, then kind, then id (a page's cursor is a row of this key).
  // No foreign key on reader_id: a save fans out to every follower at once, and checking each new
  // row against users was a third of that insert's time (9,262 rows: 48 of 170 ms); racers are
  // never deleted (their setups and revisions hold them), and follows' own keys name real racers.
  await run(`CREATE TABLE feed_items (
      reader_id integer NOT NULL,
      created_at timestamptz NOT NULL,
      kind text NOT NULL CHECK (kind IN ('setup', 'revision', 'fork')),
      item_id integer NOT NULL,
      actor_id integer NOT NULL,
      PRIMARY KEY (reader_id, created_at, kind, item_id))`);

  await run(`CREATE FUNCTION feed_fan_out_setup() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF ${listed('NEW')} THEN
        PERFORM pg_advisory_xact_lock_shared(${FEED_LOCK_SPACE}, NEW.owner_id);
        INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
        SELECT f.follower_id, NEW.created_at, 'setup', NEW.id, NEW.owner_id FROM follows f WHERE f.followee_id = NEW.owner_id
        ON CONFLICT DO NOTHING;
      END IF;
      IF NEW.forked_from_owner_id IS NOT NULL AND NEW.forked_from_owner_id <> NEW.owner_id THEN
        INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
        VALUES (NEW.forked_from_owner_id, NEW.created_at, 'fork', NEW.id, NEW.owner_id)
        ON CONFLICT DO NOTHING;
      END IF;
      RETURN NULL;
    END $$`);
  await run('CREATE TRIGGER setups_feed_fan_out AFTER INSERT ON setups FOR EACH ROW EXECUTE FUNCTION feed_fan_out_setup()');

  await run(`CREATE FUNCTION feed_fan_out_revision() RETURNS trigger LANGUAGE plpgsql AS $$
    DECLARE
      setup_owner integer;
    BEGIN
      IF NEW.number > 1 THEN
        SELECT s.owner_id INTO setup_owner FROM setups s WHERE s.id = NEW.setup_id AND ${listed('s')};
        IF setup_owner IS NOT NULL THEN
          PERFORM pg_advisory_xact_lock_shared(${FEED_LOCK_SPACE}, setup_owner);
          INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
          SELECT f.follower_id, NEW.created_at, 'revision', NEW.id, setup_owner FROM follows f WHERE f.followee_id = setup_owner
          ON CONFLICT DO NOTHING;
        END IF;
      END IF;
      RETURN NULL;
    END $$`);
  await run('CREATE TRIGGER setup_revisions_feed_fan_out AFTER INSERT ON setup_revisions FOR EACH ROW EXECUTE FUNCTION feed_fan_out_revision()');

  // TG_ARGV[0]: how many of its newest revisions come along (FOLLOW_BACKFILL).
  await run(`CREATE FUNCTION feed_setup_listed() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      PERFORM pg_advisory_xact_lock_shared(${FEED_LOCK_SPACE}, NEW.owner_id);
      INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
      SELECT f.follower_id, x.created_at, x.kind, x.item_id, NEW.owner_id
        FROM follows f
        CROSS JOIN (SELECT NEW.created_at, 'setup'::text AS kind, NEW.id AS item_id
                    UNION ALL
                    (SELECT r.created_at, 'revision', r.id FROM setup_revisions r WHERE r.setup_id = NEW.id AND r.number > 1
                      ORDER BY r.number DESC LIMIT TG_ARGV[0]::integer)) x
       WHERE f.followee_id = NEW.owner_id
      ON CONFLICT DO NOTHING;
      RETURN NULL;
    END $$`);
  await run(`CREATE TRIGGER setups_feed_listed AFTER UPDATE OF visibility, hidden_at, deleted_at ON setups FOR EACH ROW
             WHEN (${listed('NEW')} AND NOT (${listed('OLD')}))
             EXECUTE FUNCTION feed_setup_listed('${FOLLOW_BACKFILL}')`);

  // Only the demo seeders move a setup's time; each copy is found by its primary key.
  await run(`CREATE FUNCTION feed_setup_moved() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      UPDATE feed_items fi SET created_at = NEW.created_at
        FROM follows f
       WHERE f.followee_id = NEW.owner_id AND fi.reader_id = f.follower_id
         AND fi.created_at = OLD.created_at AND fi.kind = 'setup' AND fi.item_id = NEW.id;
      UPDATE feed_items SET created_at = NEW.created_at
       WHERE reader_id = NEW.forked_from_owner_id AND created_at = OLD.created_at AND kind = 'fork' AND item_id = NEW.id;
      RETURN NULL;
    END $$`);
  await run(`CREATE TRIGGER setups_feed_moved AFTER UPDATE OF created_at ON setups FOR EACH ROW
             WHEN (OLD.created_at IS DISTINCT FROM NEW.created_at) EXECUTE FUNCTION feed_setup_moved()`);

  // TG_ARGV[0]: how many of the followee's newest listed changes to bring in (FOLLOW_BACKFILL).
  await run(`CREATE FUNCTION feed_follow_backfill() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      PERFORM pg_advisory_xact_lock(${FEED_LOCK_SPACE}, NEW.followee_id);
      INSERT INTO feed_items (reader_id, created_at, kind, item_id, actor_id)
      SELECT NEW.follower_id, x.created_at, x.kind, x.item_id, NEW.followee_id FROM (
        (SELECT s.created_at, 'setup'::text AS kind, s.id AS item_id FROM setups s
          WHERE s.owner_id = NEW.followee_id AND ${listed('s')}
          ORDER BY s.created_at DESC LIMIT TG_ARGV[0]::integer)
        UNION ALL
        (SELECT r.created_at, 'revision', r.id FROM setups s JOIN setup_revisions r ON r.setup_id = s.id AND r.number > 1
          WHERE s.owner_id = NEW.followee_id AND ${listed('s')}
          ORDER BY r.created_at DESC LIMIT TG_ARGV[0]::integer)) x
      ORDER BY x.created_at DESC, x.kind DESC, x.item_id DESC
      LIMIT TG_ARGV[0]::integer
      ON CONFLICT DO NOTHING;
      RETURN NULL;
    END $$`);
  await run(`CREATE TRIGGER follows_feed_backfill AFTER INSERT ON follows FOR EACH ROW EXECUTE FUNCTION feed_follow_backfill('${FOLLOW_BACKFILL}')`);

  // A racer's forks of my setups stay in my feed after I unfollow them: they are about my setups.
  await run(`CREATE FUNCTION feed_unfollow() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      PERFORM pg_advisory_xact_lock(${FEED_LOCK_SPACE}, OLD.followee_id);
      DELETE FROM feed_items WHERE reader_id = OLD.follower_id AND actor_id = OLD.followee_id AND kind <> 'fork';
      RETURN NULL;
    END $$`);
  await run('CREATE TRIGGER follows_feed_unfollow AFTER DELETE ON follows FOR EACH ROW EXECUTE FUNCTION feed_unfollow()');

  await run(BACKFILL_SQL(FOLLOW_BACKFILL));
  // The feed no longer lists forks of my setups from setups itself: the index made for that
  // (20261202T1100) would only slow every setup written.
  await run('DROP INDEX IF EXISTS setups_listed_forks_of_owner_idx');
}

export async function down({ queryInterface: qi }: MigrationContext): Promise<void> {
  const run = (sql: string) => qi.sequelize.query(sql);
  await run(`CREATE INDEX IF NOT EXISTS setups_listed_forks_of_owner_idx ON setups (forked_from_owner_id, created_at DESC, id DESC)
             WHERE forked_from_owner_id IS NOT NULL AND visibility = 'public' AND hidden_at IS NULL AND deleted_at IS NULL`);
  await run('DROP TRIGGER IF EXISTS follows_feed_unfollow ON follows');
  await run('DROP TRIGGER IF EXISTS follows_feed_backfill ON follows');
  await run('DROP TRIGGER IF EXISTS setup_revisions_feed_fan_out ON setup_revisions');
  await run('DROP TRIGGER IF EXISTS setups_feed_moved ON setups');
  await run('DROP TRIGGER IF EXISTS setups_feed_listed ON setups');
  await run('DROP TRIGGER IF EXISTS setups_feed_fan_out ON setups');
  await run('DROP FUNCTION IF EXISTS feed_unfollow()');
  await run('DROP FUNCTION IF EXISTS feed_follow_backfill()');
  await run('DROP FUNCTION IF EXISTS feed_fan_out_revision()');
  await run('DROP FUNCTION IF EXISTS feed_setup_moved()');
  await run('DROP FUNCTION IF EXISTS feed_setup_listed()');
  await run('DROP FUNCTION IF EXISTS feed_fan_out_setup()');
  await run('DROP TABLE IF EXISTS feed_items');
}
