import type { MigrationContext } from '../migrator';

/*
 * Votes by track type, the maintained counts that rank "best for", the fork count that ranks "most
 * forked", and full-text search over setups.
 *
 * Vote counts are kept by a trigger on setup_votes rather than by the API code: every writer of
 * votes — the vote routes, bulk generators that insert votes by the thousand, cascades when a setup
 * or an account goes — keeps setup_vote_counts right without having to remember to, and the trigger
 * runs inside the statement's own transaction, so a count never disagrees with the votes it counts.
 * The Wilson bound is a generated column over the counts, so it cannot drift from them either.
 */

// Same formula as shared/compute/ranking/wilson.ts (z = 1.96); a server test checks they agree.
const WILSON_FUNCTION = `
  CREATE FUNCTION wilson_lower_bound(works integer, fails integer) RETURNS numeric
  LANGUAGE sql IMMUTABLE STRICT PARALLEL SAFE AS $$
    SELECT CASE WHEN v.n = 0 THEN 0::numeric
      ELSE round(greatest(0, (v.p + v.z * v.z / (2 * v.n) - v.z * sqrt((v.p * (1 - v.p) + v.z * v.z / (4 * v.n)) / v.n))
                 / (1 + v.z * v.z / v.n))::numeric, 8)
    END
    FROM (SELECT (works + fails)::float8 AS n,
                 CASE WHEN works + fails = 0 THEN 0 ELSE works::float8 / (works + fails) END AS p,
                 1.96::float8 AS z) v
  $$`;

const VOTE_COUNT_TRIGGER = `
  CREATE FUNCTION setup_votes_maintain_counts() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP IN ('UPDATE', 'DELETE') THEN
      UPDATE setup_vote_counts
         SET works = works - OLD.works::int, fails = fails - (NOT OLD.works)::int
       WHERE setup_id = OLD.setup_id AND track_type = OLD.track_type;
    END IF;
    IF TG_OP IN ('INSERT', 'UPDATE') THEN
      -- The row lock this takes serialises concurrent votes on one setup and track type only.
      INSERT INTO setup_vote_counts AS c (setup_id, track_type, works, fails)
      VALUES (NEW.setup_id, NEW.track_type, NEW.works::int, (NOT NEW.works)::int)
      ON CONFLICT (setup_id, track_type)
      DO UPDATE SET works = c.works + EXCLUDED.works, fails = c.fails + EXCLUDED.fails;
    END IF;
    RETURN NULL;
  END $$`;

/*
 * Forks that count: not deleted and not hidden, as on the setup page and the kit list. Kept on the
 * original's row so "most forked" pages through an index instead of counting every setup's forks.
 */
const FORK_COUNT_TRIGGER = `
  CREATE FUNCTION setups_maintain_fork_count() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    IF TG_OP IN ('UPDATE', 'DELETE') AND OLD.forked_from_setup_id IS NOT NULL AND OLD.deleted_at IS NULL AND OLD.hidden_at IS NULL THEN
      UPDATE setups SET fork_count = fork_count - 1 WHERE id = OLD.forked_from_setup_id;
    END IF;
    IF TG_OP IN ('INSERT', 'UPDATE') AND NEW.forked_from_setup_id IS NOT NULL AND NEW.deleted_at IS NULL AND NEW.hidden_at IS NULL THEN
      UPDATE setups SET fork_count = fork_count + 1 WHERE id = NEW.forked_from_setup_id;
    END IF;
    RETURN NULL;
  END $$`;

/*
 * Search. The document is a generated tsvector column on setups: title (weight A), notes (B), and
 * the kit's and maker's names and the author's handle (C). Those last three live in other tables,
 * which a generated column cannot read, so they are copied into setups.search_context, kept by
 * triggers. A denormalised column rather than a separate search table: the GIN index then sits on
 * the table the visibility filters are on (one index scan, no join to find matches), title and
 * notes follow every edit with no trigger at all, and the copied names change only on the rare
 * rename of a kit, maker or handle. The 'english' configuration: racers type "shocks" for "shock"
 * and "tires" for "tire"; names pass through the same stemmer on both sides, so they still match.
 */
const SEARCH_CONTEXT_FUNCTION = `
  CREATE FUNCTION setup_search_context(p_car_id integer, p_owner_id integer) RETURNS text
  LANGUAGE sql STABLE AS $$
    SELECT concat_ws(' ',
      (SELECT k.name || ' ' || m.name FROM cars c JOIN kits k ON k.id = c.kit_id JOIN makers m ON m.id = k.maker_id WHERE c.id = p_car_id),
      (SELECT u.handle FROM users u WHERE u.id = p_owner_id))
  $$`;

const SEARCH_TRIGGERS = [
  `CREATE FUNCTION setups_set_search_context() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     NEW.search_context := setup_search_context(NEW.car_id, NEW.owner_id);
     RETURN NEW;
   END $$`,
  `CREATE TRIGGER setups_search_context BEFORE INSERT OR UPDATE OF car_id, owner_id ON setups
   FOR EACH ROW EXECUTE FUNCTION setups_set_search_context()`,
  `CREATE FUNCTION search_context_follow_rename() RETURNS trigger LANGUAGE plpgsql AS $$
   BEGIN
     IF TG_TABLE_NAME = 'users' THEN
       UPDATE setups SET search_context = setup_search_context(car_id, owner_id) WHERE owner_id = NEW.id;
     ELSIF TG_TABLE_NAME = 'cars' THEN
       UPDATE setups SET search_context = setup_search_context(car_id, owner_id) WHERE car_id = NEW.id;
     ELSIF TG_TABLE_NAME = 'kits' THEN
       UPDATE setups s SET search_context = setup_search_context(s.car_id, s.owner_id)
         FROM cars c WHERE c.kit_id = NEW.id AND s.car_id = c.id;
     ELSE
       UPDATE setups s SET search_context = setup_search_context(s.car_id, s.owner_id)
         FROM cars c JOIN kits k ON k.id = c.kit_id WHERE k.maker_id = NEW.id AND s.car_id = c.id;
     END IF;
     RETURN NULL;
   END $$`,
  `CREATE TRIGGER users_search_context AFTER UPDATE OF handle ON users
   FOR EACH ROW WHEN (OLD.handle IS DISTINCT FROM NEW.handle) EXECUTE FUNCTION search_context_follow_rename()`,
  `CREATE TRIGGER cars_search_context AFTER UPDATE OF kit_id ON cars
   FOR EACH ROW WHEN (OLD.kit_id IS DISTINCT FROM NEW.kit_id) EXECUTE FUNCTION search_context_follow_rename()`,
  `CREATE TRIGGER kits_search_context AFTER UPDATE OF name, maker_id ON kits
   FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name OR OLD.maker_id IS DISTINCT FROM NEW.maker_id)
   EXECUTE FUNCTION search_context_follow_rename()`,
  `CREATE TRIGGER makers_search_context AFTER UPDATE OF name ON makers
   FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name) EXECUTE FUNCTION search_context_follow_rename()`,
];

const LISTED = "visibility = 'public' AND hidden_at IS NULL AND deleted_at IS NULL";

async function createVotes(run: (sql: string) => Promise<unknown>): Promise<void> {
  await run(WILSON_FUNCTION);
  await run(`
    CREATE TABLE setup_votes (
      user_id integer NOT NULL REFERENCES users (id) ON DELETE CASCADE,
      setup_id integer NOT NULL REFERENCES setups (id) ON DELETE CASCADE,
      track_type varchar(40) NOT NULL,
      works boolean NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (user_id, setup_id, track_type)
    )`);
  await run('CREATE INDEX setup_votes_setup_idx ON setup_votes (setup_id, track_type)');
  await run(`
    CREATE TABLE setup_vote_counts (
      setup_id integer NOT NULL REFERENCES setups (id) ON DELETE CASCADE,
      track_type varchar(40) NOT NULL,
      works integer NOT NULL DEFAULT 0 CHECK (works >= 0),
      fails integer NOT NULL DEFAULT 0 CHECK (fails >= 0),
      wilson numeric(9, 8) GENERATED ALWAYS AS (wilson_lower_bound(works, fails)) STORED,
      PRIMARY KEY (setup_id, track_type)
    )`);
  // "Best for T": walk T's voted setups best first and stop after a page.
  await run('CREATE INDEX setup_vote_counts_rank_idx ON setup_vote_counts (track_type, wilson DESC, setup_id DESC) WHERE works + fails > 0');
  await run(VOTE_COUNT_TRIGGER);
  await run(`CREATE TRIGGER setup_votes_counts_on_insert_delete AFTER INSERT OR DELETE ON setup_votes
             FOR EACH ROW EXECUTE FUNCTION setup_votes_maintain_counts()`);
  await run(`CREATE TRIGGER setup_votes_counts_on_update AFTER UPDATE OF works, setup_id, track_type ON setup_votes
             FOR EACH ROW WHEN (OLD.works IS DISTINCT FROM NEW.works OR OLD.setup_id <> NEW.setup_id OR OLD.track_type <> NEW.track_type)
             EXECUTE FUNCTION setup_votes_maintain_counts()`);
}

async function createForkCount(run: (sql: string) => Promise<unknown>): Promise<void> {
  await run('ALTER TABLE setups ADD COLUMN fork_count integer NOT NULL DEFAULT 0');
  await run(`UPDATE setups s SET fork_count = f.n
               FROM (SELECT forked_from_setup_id AS id, count(*)::int AS n FROM setups
                      WHERE forked_from_setup_id IS NOT NULL AND deleted_at IS NULL AND hidden_at IS NULL
                      GROUP BY forked_from_setup_id) f
              WHERE s.id = f.id`);
  await run(FORK_COUNT_TRIGGER);
  await run(`CREATE TRIGGER setups_fork_count_on_insert_delete AFTER INSERT OR DELETE ON setups
             FOR EACH ROW EXECUTE FUNCTION setups_maintain_fork_count()`);
  await run(`CREATE TRIGGER setups_fork_count_on_update AFTER UPDATE OF forked_from_setup_id, deleted_at, hidden_at ON setups
             FOR EACH ROW WHEN (OLD.forked_from_setup_id IS DISTINCT FROM NEW.forked_from_setup_id
               OR (OLD.deleted_at IS NULL AND OLD.hidden_at IS NULL) <> (NEW.deleted_at IS NULL AND NEW.hidden_at IS NULL))
             EXECUTE FUNCTION setups_maintain_fork_count()`);
  // Discover pages: newest (by creation, which never moves, so pages stay stable) and most forked.
  await run(`CREATE INDEX setups_listed_created_idx ON setups (created_at DESC, id DESC) WHERE ${LISTED}`);
  await run(`CREATE INDEX setups_listed_forks_idx ON setups (fork_count DESC, id DESC) WHERE ${LISTED}`);
}

async function createSearch(run: (sql: string) => Promise<unknown>): Promise<void> {
  await run("ALTER TABLE setups ADD COLUMN search_context text NOT NULL DEFAULT ''");
  await run(`
    ALTER TABLE setups ADD COLUMN search_document tsvector GENERATED ALWAYS AS (
      setweight(to_tsvector('english'::regconfig, title), 'A') ||
      setweight(to_tsvector('english'::regconfig, notes_md), 'B') ||
      setweight(to_tsvector('english'::regconfig, search_context), 'C')
    ) STORED`);
  await run(SEARCH_CONTEXT_FUNCTION);
  for (const sql of SEARCH_TRIGGERS) await run(sql);
  await run('UPDATE setups SET search_context = setup_search_context(car_id, owner_id)');
  await run('CREATE INDEX setups_search_idx ON setups USING gin (search_document)');
  // Typo-tolerant kit lookup ("stot 8e" finds the Stoat 8E). pg_trgm ships with PostgreSQL's
  // contrib modules (Debian's postgresql package) and is a trusted extension since PostgreSQL 13.
  // The kit list is short, so the lookup compares every kit's name and needs no trigram index.
  await run('CREATE EXTENSION IF NOT EXISTS pg_trgm');
}

export async function up({ sequelize }: MigrationContext): Promise<void> {
  const run = (sql: string) => sequelize.query(sql);
  await createVotes(run);
  await createForkCount(run);
  await createSearch(run);
}

export async function down({ sequelize }: MigrationContext): Promise<void> {
  const run = (sql: string) => sequelize.query(sql);
  for (const [trigger, table] of [
    ['makers_search_context', 'makers'],
    ['kits_search_context', 'kits'],
    ['cars_search_context', 'cars'],
    ['users_search_context', 'users'],
    ['setups_search_context', 'setups'],
    ['setups_fork_count_on_update', 'setups'],
    ['setups_fork_count_on_insert_delete', 'setups'],
  ]) {
    await run(`DROP TRIGGER IF EXISTS ${trigger} ON ${table}`);
  }
  await run('DROP FUNCTION IF EXISTS search_context_follow_rename()');
  await run('DROP FUNCTION IF EXISTS setups_set_search_context()');
  await run('DROP FUNCTION IF EXISTS setup_search_context(integer, integer)');
  await run('DROP FUNCTION IF EXISTS setups_maintain_fork_count()');
  // Indexes on columns that stay (created_at, id) would outlive the columns dropped below.
  await run('DROP INDEX IF EXISTS setups_listed_created_idx');
  await run('DROP INDEX IF EXISTS setups_listed_forks_idx');
  await run('DROP INDEX IF EXISTS setups_search_idx');
  await run('ALTER TABLE setups DROP COLUMN IF EXISTS search_document');
  await run('ALTER TABLE setups DROP COLUMN IF EXISTS search_context');
  await run('ALTER TABLE setups DROP COLUMN IF EXISTS fork_count');
  await run('DROP TABLE IF EXISTS setup_vote_counts');
  await run('DROP TABLE IF EXISTS setup_votes');
  await run('DROP FUNCTION IF EXISTS setup_votes_maintain_counts()');
  await run('DROP FUNCTION IF EXISTS wilson_lower_bound(integer, integer)');
}
