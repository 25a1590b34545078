/**
 * npm run seed:scale: fills the database named by DATABASE_URL (migrated, demo world seeded) with a
 * generated invented world for benchmarks: racers racer_00001…, a car of every demo kit each, their
 * setups (some forks of popular ones), revision histories, votes by track type and follows.
 *
 * Sizes (defaults at SCALE=1; SCALE=0.01 for a quick run; each also settable on its own):
 *   SCALE_RACERS 10,000 · SCALE_SETUPS 100,000 · SCALE_REVISIONS 1,000,000 · SCALE_VOTES 500,000 ·
 *   SCALE_FOLLOWS 300,000 · SCALE_FORK_SHARE 0.1 (the share of setups that are forks)
 *
 * Every table is filled by one or two INSERT … SELECT generate_series statements in one
 * transaction; ids of setups and revisions are reserved from their sequences first, so a setup is
 * inserted already pointing at its current revision (that foreign key is deferred to commit) and a
 * fork at its original's. The search_context trigger stays on (one lookup per setup). The two
 * counting triggers (setups.fork_count, setup_vote_counts) are switched off for the bulk inserts
 * and the counts rebuilt afterwards by one aggregate each, as the votes migration describes: left
 * on, a popular setup's count row is updated thousands of times in one transaction, and each
 * update walks the chain of that row's earlier versions. ALTER TABLE … DISABLE TRIGGER is
 * transactional and needs only table ownership: a failed run rolls back with the triggers on.
 * The activity feed's fan-out triggers are off too (on, every revision would be copied to each of
 * its owner's followers: ~30 million rows); the feed is then filled as the feed migration fills an
 * existing database: each follow brings the followee's newest listed changes (FOLLOW_BACKFILL).
 *
 * Skew: who is followed, which setups are forked and which are voted on are drawn from a
 * Zipf-like law, P(rank r) ∝ 1/r, by sampling r = floor(exp(U · ln(n + 1))) with U uniform on
 * [0, 1) (a log-uniform draw; its density is ∝ 1/r). Rank 1 is the most popular racer or setup.
 * Racer ranks are their handle numbers; setup ranks follow their order of creation among public
 * setups. Pairs that must be unique (follows, votes) are drawn with head-room and the first
 * distinct ones in order of drawing kept (which keeps the head of the law); targets are capped at
 * 30 % of the possible pairs so small runs still fill.
 */
import bcrypt from 'bcryptjs';
import { Client, type ClientBase } from 'pg';
import { performance } from 'node:perf_hooks';
import { BACKFILL_SQL as FEED_BACKFILL_SQL, FOLLOW_BACKFILL } from '../server/db/migrations/20261202T1200-feed-items';

/** The feed migration's fan-out triggers, off during the bulk inserts (see above). */
const FEED_TRIGGERS = [
  ['setups', 'setups_feed_fan_out'],
  ['setup_revisions', 'setup_revisions_feed_fan_out'],
  ['follows', 'follows_feed_backfill'],
] as const;

export type ScaleSizes = {
  racers: number;
  setups: number;
  revisions: number;
  votes: number;
  follows: number;
  forkShare: number;
};

export type ScaleResult = {
  planned: ScaleSizes;
  counts: { racers: number; cars: number; setups: number; forks: number; revisions: number; votes: number; follows: number };
  timings: Array<{ table: string; rows: number; ms: number }>;
};

/** The password of every generated racer (sign-in for benchmarks); the hash is computed once. */
export const SCALE_PASSWORD = 'scale-racer-laps-9';
export const SCALE_EMAIL_DOMAIN = 'scale.racers.example';
const TRACK_TYPE_KEYS = ['indoor-clay', 'hard-packed', 'loose-dusty', 'blue-groove', 'wet-muddy', 'rough-bumpy', 'loamy', 'turf'];

function envNumber(env: NodeJS.ProcessEnv, name: string, fallback: number): number {
  const raw = env[name];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isFinite(n) || n < 0) throw new Error(`${name} must be a number ≥ 0, got "${raw}"`);
  return n;
}

/** Sizes from SCALE and the per-table overrides, with floors so a tiny scale still has a world. */
export function scaleSizes(env: NodeJS.ProcessEnv = process.env): ScaleSizes {
  const scale = envNumber(env, 'SCALE', 1);
  const racers = Math.max(20, Math.round(envNumber(env, 'SCALE_RACERS', 10_000 * scale)));
  const setups = Math.max(2 * racers, Math.round(envNumber(env, 'SCALE_SETUPS', 100_000 * scale)));
  const revisions = Math.max(setups, Math.round(envNumber(env, 'SCALE_REVISIONS', 1_000_000 * scale)));
  const forkShare = Math.min(0.5, envNumber(env, 'SCALE_FORK_SHARE', 0.1));
  // Possible pairs: follows need distinct (follower, followee); votes distinct (racer, setup, type).
  const follows = Math.min(Math.round(envNumber(env, 'SCALE_FOLLOWS', 300_000 * scale)), Math.floor(0.3 * racers * (racers - 1)));
  const votes = Math.min(Math.round(envNumber(env, 'SCALE_VOTES', 500_000 * scale)), Math.floor(0.3 * racers * setups * 0.8 * TRACK_TYPE_KEYS.length));
  return { racers, setups, revisions, votes, follows, forkShare };
}

async function timed(timings: ScaleResult['timings'], table: string, log: (line: string) => void, work: () => Promise<number>): Promise<void> {
  const t0 = performance.now();
  const rows = await work();
  const ms = performance.now() - t0;
  timings.push({ table, rows, ms });
  log(`${table.padEnd(18)} ${String(rows).padStart(9)} rows ${(ms / 1000).toFixed(1).padStart(7)} s`);
}

/** A Zipf-like rank in 1..n (SQL expression; see the header). */
const zipf = (n: string) => `least(${n}, greatest(1, floor(exp(random() * ln(${n} + 1)))::int))`;

/**
 * Generates the world through one client, in one transaction. bcryptCost as in the server's
 * config; the log function receives one line per table.
 */
export async function seedScale(
  client: ClientBase,
  sizes: ScaleSizes,
  options: { bcryptCost?: number; log?: (line: string) => void } = {},
): Promise<ScaleResult> {
  const log = options.log ?? (() => undefined);
  const timings: ScaleResult['timings'] = [];
  const q = (sql: string, params: unknown[] = []) => client.query(sql, params);

  const { rows: existing } = await q(`SELECT count(*)::int AS n FROM users WHERE handle LIKE 'racer\\_%'`);
  if (existing[0].n > 0) throw new Error('this database already has generated racers (racer_…); use a fresh database');
  const { rows: kitRows } = await q('SELECT count(*)::int AS n FROM kits');
  if (kitRows[0].n === 0) throw new Error('no kits: run the migrations and the demo seed (npm run db:seed) first');

  const hash = await bcrypt.hash(SCALE_PASSWORD, options.bcryptCost ?? 10);
  const origins = sizes.setups - Math.round(sizes.setups * sizes.forkShare);
  const avgRevisions = Math.floor(sizes.revisions / sizes.setups);
  const extraRevisions = sizes.revisions - avgRevisions * sizes.setups;

  await q('BEGIN');
  try {
    await q('SET LOCAL synchronous_commit = off');
    await q('ALTER TABLE setups DISABLE TRIGGER setups_fork_count_on_insert_delete');
    await q('ALTER TABLE setup_votes DISABLE TRIGGER setup_votes_counts_on_insert_delete');
    for (const [table, trigger] of FEED_TRIGGERS) await q(`ALTER TABLE ${table} DISABLE TRIGGER ${trigger}`);
    await timed(timings, 'users', log, async () => {
      const res = await q(
        `INSERT INTO users (handle, display_name, email, email_verified_at, password_hash, classes_raced, bio, created_at, updated_at)
         SELECT format('racer_%s', lpad(g::text, 5, '0')), format('Racer %s', g), format('racer_%s@%s', lpad(g::text, 5, '0'), $2::text),
                now(), $1, '[]'::jsonb, '', now() - interval '2 years', now()
           FROM generate_series(1, $3::int) g`,
        [hash, SCALE_EMAIL_DOMAIN, sizes.racers],
      );
      // Ranks: racer_00001 is rank 1, the most followed.
      await q(`CREATE TEMP TABLE scale_racers ON COMMIT DROP AS
                 SELECT substring(handle FROM 7)::int AS rank, id FROM users WHERE handle ~ '^racer_[0-9]+$'`);
      await q('CREATE UNIQUE INDEX ON scale_racers (rank)');
      return res.rowCount ?? 0;
    });

    await timed(timings, 'cars', log, async () => {
      await q(`CREATE TEMP TABLE scale_kits ON COMMIT DROP AS
                 SELECT row_number() OVER (ORDER BY id)::int - 1 AS idx, id, name, vehicle_class, template_version, stock_values,
                        -- How many of the fields the revisions vary this kit's sheet has (see setup_revisions).
                        (stock_values ->> 'shock.front.oil' IS NOT NULL)::int + (stock_values ->> 'shock.rear.oil' IS NOT NULL)::int
                          + (stock_values ->> 'susp.rear.ride-height' IS NOT NULL)::int AS varied_fields
                   FROM kits`);
      const res = await q(
        `INSERT INTO cars (owner_id, kit_id, nickname, stock, created_at, updated_at)
         SELECT r.id, k.id, format('%s no. %s', k.name, r.rank), false, now() - interval '2 years', now()
           FROM scale_racers r CROSS JOIN scale_kits k ORDER BY r.rank, k.idx`,
      );
      await q(`CREATE TEMP TABLE scale_cars ON COMMIT DROP AS
                 SELECT c.id, r.rank, k.idx AS kit_idx FROM cars c JOIN scale_racers r ON r.id = c.owner_id JOIN scale_kits k ON k.id = c.kit_id`);
      await q('CREATE UNIQUE INDEX ON scale_cars (rank, kit_idx)');
      return res.rowCount ?? 0;
    });

    await timed(timings, 'setups (plan)', log, async () => {
      const nKits = (await q('SELECT count(*)::int AS n FROM scale_kits')).rows[0].n as number;
      // g = 1..origins are originals, the rest forks. Revision counts avg ± a spread that cancels
      // in pairs, plus the remainder one each on the first setups, so they sum to the target.
      await q(
        `CREATE TEMP TABLE scale_plan ON COMMIT DROP AS
         SELECT g,
                CASE WHEN g % 10 = 3 THEN 'unlisted' WHEN g % 10 = 7 THEN 'private' ELSE 'public' END AS visibility,
                ((g - 1) % $1::int) + 1 AS owner_rank,
                ((g * 7) % $2::int) AS kit_idx,
                $3::int + CASE WHEN g = $4::int AND $4::int % 2 = 1 THEN 0
                               WHEN g % 2 = 1 THEN ((((g + 1) / 2) * 7919) % $3::int)
                               ELSE -((((g + 1) / 2) * 7919) % $3::int) END
                       + CASE WHEN g <= $5::int THEN 1 ELSE 0 END AS nrev
           FROM generate_series(1, $4::int) g`,
        [sizes.racers, nKits, avgRevisions, sizes.setups, extraRevisions],
      );
      await q('ALTER TABLE scale_plan ADD PRIMARY KEY (g)');
      await q(`CREATE TEMP TABLE scale_public ON COMMIT DROP AS
                 SELECT row_number() OVER (ORDER BY g)::int AS prank, g FROM scale_plan WHERE visibility = 'public' AND g <= $1::int`, [origins]);
      await q('ALTER TABLE scale_public ADD PRIMARY KEY (prank)');
      const nPublic = (await q('SELECT count(*)::int AS n FROM scale_public')).rows[0].n as number;
      // Forks: a Zipf-drawn public original; the forker (any racer) forks onto a car of its kit.
      await q('ALTER TABLE scale_plan ADD COLUMN source_g int');
      await q(
        `UPDATE scale_plan p SET source_g = o.g, kit_idx = o.kit_idx, owner_rank = f.owner_rank, visibility = 'public'
           FROM (SELECT g, ${zipf('$1::int')} AS prank, 1 + floor(random() * $2::int)::int AS owner_rank FROM scale_plan WHERE g > $3::int) f
           JOIN scale_public sp ON sp.prank = f.prank JOIN scale_plan o ON o.g = sp.g
          WHERE p.g = f.g`,
        [nPublic, sizes.racers, origins],
      );
      // Ids reserved from the sequences: setup g is setup_base + g, its revisions follow rev_base.
      const setupBase = (await q(`SELECT nextval('setups_id_seq')::int - 1 AS b`)).rows[0].b as number;
      await q(`SELECT setval('setups_id_seq', $1::int)`, [setupBase + sizes.setups]);
      const revBase = (await q(`SELECT nextval('setup_revisions_id_seq')::int - 1 AS b`)).rows[0].b as number;
      await q(`SELECT setval('setup_revisions_id_seq', $1::int)`, [revBase + sizes.revisions]);
      await q(
        `CREATE TEMP TABLE scale_setups ON COMMIT DROP AS
         SELECT p.*, $1::int + p.g AS id,
                $2::int + 1 + sum(p.nrev) OVER (ORDER BY p.g) - p.nrev AS first_rev_id,
                now() - interval '400 days' + p.g * (interval '390 days' / $3::int) AS created
           FROM scale_plan p`,
        [setupBase, revBase, sizes.setups],
      );
      await q('ALTER TABLE scale_setups ADD PRIMARY KEY (g)');
      return sizes.setups;
    });

    await timed(timings, 'setups', log, async () => {
      const res = await q(
        `INSERT INTO setups (id, owner_id, car_id, vehicle_class, template_version, title, visibility, share_token, track_type,
                             temperature_c, grip, notes_md, current_revision_id, revision_count, forked_from_setup_id,
                             forked_from_revision_id, upstream_revision_id, family_root_id, created_at, updated_at)
         SELECT s.id, r.id, c.id, k.vehicle_class, k.template_version,
                CASE WHEN s.source_g IS NULL THEN format('%s %s base %s', k.name, tt.key, s.g)
                     ELSE format('%s %s fork %s', k.name, tt.key, s.g) END,
                s.visibility, md5('scale-share-' || s.g), tt.key, 5 + (s.g * 13) % 31, (ARRAY['low', 'medium', 'high'])[1 + s.g % 3],
                (ARRAY['Soft and free for the loose top layer; rear camber at -2 keeps the car planted on exit.',
                       'Stiffer springs and thicker shock oil: less dive on the jumps, the car lands flat.',
                       'Toe-in at the rear for stability on the long sweeper; spur one tooth up for the short straight.',
                       'Ride height down 1 mm all round; droop screws out for the bumps in the back section.',
                       'Heavier diff oil in the centre: more drive out of the hairpin, a little push on entry.'])[1 + s.g % 5],
                s.first_rev_id + s.nrev - 1, s.nrev, src.id, src.first_rev_id + src.nrev - 1, src.first_rev_id + src.nrev - 1,
                src.id,
                s.created, s.created + (s.nrev - 1) * interval '1 hour'
           FROM scale_setups s
           JOIN scale_racers r ON r.rank = s.owner_rank
           JOIN scale_cars c ON c.rank = s.owner_rank AND c.kit_idx = s.kit_idx
           JOIN scale_kits k ON k.idx = s.kit_idx
           CROSS JOIN LATERAL (SELECT (ARRAY[${TRACK_TYPE_KEYS.map((t) => `'${t}'`).join(', ')}])[1 + (s.g * 5) % ${TRACK_TYPE_KEYS.length}] AS key) tt
           LEFT JOIN scale_setups src ON src.g = s.source_g
          ORDER BY s.g`,
      );
      return res.rowCount ?? 0;
    });

    await timed(timings, 'setup_revisions', log, async () => {
      // Stock sheet with the shock oils and (where the kit has them) ride heights varied per step.
      // Changed fields, as diffSetupValues counts them: every step moves each varied field that the
      // kit's stock sheet has (front oil by (g+i)%3, rear by (g+2i)%3, ride height by i%3: never the
      // same offset twice running), nothing else; revision 1 counts 0.
      const res = await q(
        `INSERT INTO setup_revisions (id, setup_id, number, values, change_note, author_id, changed_field_count, created_at)
         SELECT s.first_rev_id + n.i, s.id, n.i + 1,
                k.stock_values || jsonb_build_object(
                  'shock.front.oil', (k.stock_values ->> 'shock.front.oil')::int + 50 * ((s.g + n.i) % 3 - 1),
                  'shock.rear.oil', (k.stock_values ->> 'shock.rear.oil')::int + 50 * ((s.g + 2 * n.i) % 3 - 1))
                || CASE WHEN k.stock_values ? 'susp.rear.ride-height'
                        THEN jsonb_build_object('susp.rear.ride-height', (k.stock_values ->> 'susp.rear.ride-height')::numeric + (n.i % 3) - 1)
                        ELSE '{}'::jsonb END,
                CASE WHEN n.i = 0 THEN format('Started from the %s stock sheet.', k.name)
                     ELSE format('Shock oil %s front, %s rear after practice %s.',
                                 (k.stock_values ->> 'shock.front.oil')::int + 50 * ((s.g + n.i) % 3 - 1),
                                 (k.stock_values ->> 'shock.rear.oil')::int + 50 * ((s.g + 2 * n.i) % 3 - 1), n.i) END,
                r.id,
                CASE WHEN n.i = 0 THEN 0 ELSE k.varied_fields END,
                s.created + n.i * interval '1 hour'
           FROM scale_setups s
           JOIN scale_racers r ON r.rank = s.owner_rank
           JOIN scale_kits k ON k.idx = s.kit_idx
           CROSS JOIN LATERAL generate_series(0, s.nrev - 1) AS n(i)`,
      );
      return res.rowCount ?? 0;
    });

    await timed(timings, 'follows', log, async () => {
      const res = await q(
        `INSERT INTO follows (follower_id, followee_id, created_at)
         SELECT fr.id, fe.id, now() - random() * interval '300 days'
           FROM (SELECT DISTINCT ON (a, b) a, b, i
                   FROM (SELECT i, 1 + floor(random() * $1::int)::int AS a, ${zipf('$1::int')} AS b
                           FROM generate_series(1, $2::int * 2 + 1000) i) d
                  WHERE a <> b ORDER BY a, b, i) pairs
           JOIN scale_racers fr ON fr.rank = pairs.a JOIN scale_racers fe ON fe.rank = pairs.b
          ORDER BY pairs.i
          LIMIT $2::int`,
        [sizes.racers, sizes.follows],
      );
      return res.rowCount ?? 0;
    });

    await timed(timings, 'setup_votes', log, async () => {
      // A Zipf-drawn public setup; mostly its own track type; "works" more likely on some setups.
      await q(`CREATE TEMP TABLE scale_votable ON COMMIT DROP AS
                 SELECT row_number() OVER (ORDER BY s.g)::int AS vrank, s.g, s.id, r.id AS owner_id
                   FROM scale_setups s JOIN scale_racers r ON r.rank = s.owner_rank WHERE s.visibility = 'public'`);
      await q('ALTER TABLE scale_votable ADD PRIMARY KEY (vrank)');
      const nVotable = (await q('SELECT count(*)::int AS n FROM scale_votable')).rows[0].n as number;
      const res = await q(
        `INSERT INTO setup_votes (user_id, setup_id, track_type, works, created_at, updated_at)
         SELECT v.voter, v.setup_id, v.track_type, random() < 0.3 + 0.6 * ((v.setup_id * 7919) % 1000) / 1000.0, now(), now()
           FROM (SELECT DISTINCT ON (voter, setup_id, track_type) d.i, r.id AS voter, t.id AS setup_id,
                        CASE WHEN d.own THEN st.track_type ELSE (ARRAY[${TRACK_TYPE_KEYS.map((t) => `'${t}'`).join(', ')}])[d.tt] END AS track_type
                   FROM (SELECT i, 1 + floor(random() * $1::int)::int AS voter_rank, ${zipf('$2::int')} AS vrank,
                                random() < 0.7 AS own, 1 + floor(random() * ${TRACK_TYPE_KEYS.length})::int AS tt
                           FROM generate_series(1, $3::int * 2 + 1000) i) d
                   JOIN scale_racers r ON r.rank = d.voter_rank
                   JOIN scale_votable t ON t.vrank = d.vrank
                   JOIN setups st ON st.id = t.id
                  WHERE r.id <> t.owner_id
                  ORDER BY voter, setup_id, track_type, d.i) v
          ORDER BY v.i
          LIMIT $3::int`,
        [sizes.racers, nVotable, sizes.votes],
      );
      return res.rowCount ?? 0;
    });

    await timed(timings, 'recount', log, async () => {
      // The deferred current-revision checks run now (every revision is in), so no trigger event is
      // pending on setups and its trigger may be switched back on.
      await q('SET CONSTRAINTS ALL IMMEDIATE');
      await q('ALTER TABLE setups ENABLE TRIGGER setups_fork_count_on_insert_delete');
      await q('ALTER TABLE setup_votes ENABLE TRIGGER setup_votes_counts_on_insert_delete');
      const forks = await q(
        `UPDATE setups s SET fork_count = f.n
           FROM (SELECT forked_from_setup_id AS id, count(*)::int AS n FROM setups
                  WHERE forked_from_setup_id IS NOT NULL AND deleted_at IS NULL AND hidden_at IS NULL GROUP BY 1) f
          WHERE s.id = f.id AND s.fork_count <> f.n`,
      );
      const votes = await q(
        `INSERT INTO setup_vote_counts AS c (setup_id, track_type, works, fails)
         SELECT setup_id, track_type, count(*) FILTER (WHERE works)::int, count(*) FILTER (WHERE NOT works)::int
           FROM setup_votes GROUP BY 1, 2
         ON CONFLICT (setup_id, track_type) DO UPDATE SET works = EXCLUDED.works, fails = EXCLUDED.fails
          WHERE c.works <> EXCLUDED.works OR c.fails <> EXCLUDED.fails`,
      );
      return (forks.rowCount ?? 0) + (votes.rowCount ?? 0);
    });

    await timed(timings, 'feed_items', log, async () => {
      for (const [table, trigger] of FEED_TRIGGERS) await q(`ALTER TABLE ${table} ENABLE TRIGGER ${trigger}`);
      // Statistics of the rows just written first: without them the planner joins a million
      // revisions as if the tables were empty, and the backfill takes minutes instead of about one.
      await q('ANALYZE setups, setup_revisions, follows');
      return (await q(FEED_BACKFILL_SQL(FOLLOW_BACKFILL))).rowCount ?? 0;
    });

    await timed(timings, 'commit', log, async () => {
      await q('COMMIT');
      return 0;
    });
  } catch (err) {
    await q('ROLLBACK').catch(() => undefined);
    throw err;
  }
  await timed(timings, 'analyze', log, async () => {
    await q('ANALYZE');
    return 0;
  });

  const { rows } = await q(`
    SELECT (SELECT count(*) FROM users WHERE handle LIKE 'racer\\_%')::int AS racers,
           (SELECT count(*) FROM cars c JOIN users u ON u.id = c.owner_id WHERE u.handle LIKE 'racer\\_%')::int AS cars,
           (SELECT count(*) FROM setups s JOIN users u ON u.id = s.owner_id WHERE u.handle LIKE 'racer\\_%')::int AS setups,
           (SELECT count(*) FROM setups s JOIN users u ON u.id = s.owner_id WHERE u.handle LIKE 'racer\\_%' AND s.forked_from_setup_id IS NOT NULL)::int AS forks,
           (SELECT count(*) FROM setup_revisions r JOIN users u ON u.id = r.author_id WHERE u.handle LIKE 'racer\\_%')::int AS revisions,
           (SELECT count(*) FROM setup_votes v JOIN users u ON u.id = v.user_id WHERE u.handle LIKE 'racer\\_%')::int AS votes,
           (SELECT count(*) FROM follows f JOIN users u ON u.id = f.follower_id WHERE u.handle LIKE 'racer\\_%')::int AS follows`);
  return { planned: sizes, counts: rows[0], timings };
}

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: name the database to fill');
  const sizes = scaleSizes();
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    console.log(`seed:scale ${JSON.stringify(sizes)}`);
    const t0 = performance.now();
    const result = await seedScale(client, sizes, { bcryptCost: Number(process.env.BCRYPT_COST ?? 10), log: (l) => console.log(l) });
    console.log(`total ${((performance.now() - t0) / 1000).toFixed(1)} s; rows ${JSON.stringify(result.counts)}`);
  } finally {
    await client.end();
  }
}

if (require.main === module) {
  main().catch((err: unknown) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
