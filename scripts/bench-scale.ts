/**
 * Measures the community routes on the generated world (see scripts/bench-scale.sh, which migrates,
 * seeds the demo world and runs npm run seed:scale first). Three kinds of process:
 *   - the product server (server/index.ts), API rate limit lifted, no queue workers in it;
 *   - a bare Express app on the same database (`--bare PORT`): one route answering one
 *     primary-key lookup of a setup through pg, the ceiling the product routes are compared with;
 *   - autocannon (`--load JSON`), one process per measurement, on loopback.
 * Each route is measured at 16 and at 64 connections for BENCH_SECONDS (default 10) after a short
 * warm-up. The table gives req/s and latency percentiles, and each route's ratio to the bare route
 * at the same connection count: req/s ÷ bare req/s, and p99 ÷ bare p99. Targets (issue 6): reads
 * ≥ 0.5× throughput and p99 ≤ 2.5×; writes ≥ 0.25× throughput. The "app floor" row is the
 * product's cheapest request (GET /api/health: the whole middleware stack and `SELECT 1`), and the
 * "signed-in floor" its cheapest signed-in one (GET /api/me: the stack and the session with its
 * racer), so the table shows how much of a gap is the stack and how much the route. Absolute figures drift on a
 * shared machine; compare the ratios of one run.
 */
import { spawn } from 'node:child_process';
import net from 'node:net';
import { Client, Pool } from 'pg';
import { SCALE_EMAIL_DOMAIN, SCALE_PASSWORD } from './seed-scale';

type Target = { path: string; method: 'GET' | 'POST' | 'PUT'; kind: 'read' | 'write' | 'ceiling' | 'floor'; bodies?: string[]; paths?: string[] };
type LoadSpec = { url: string; connections: number; seconds: number; headers: Record<string, string>; method: string; paths: string[]; bodies?: string[] };
type LoadResult = { reqPerSec: number; p50: number; p97_5: number; p99: number; non2xx: number; errors: number; total: number };

// BENCH_CONNECTIONS="16" and BENCH_ROUTES="feed,search" narrow a run while working on one route
// (the ceiling is always measured: ratios need it).
const CONNECTIONS = (process.env.BENCH_CONNECTIONS ?? '16,64').split(',').map(Number);
const ROUTES = process.env.BENCH_ROUTES?.split(',').map((r) => r.trim().toLowerCase()).filter(Boolean);
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const WARMUP_SECONDS = 2;

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const srv = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

/** `--bare PORT`: the ceiling. One indexed primary-key query per request, nothing else. */
async function runBare(port: number): Promise<void> {
  // Loaded here so the main process does not need Express.
  const express = (await import('express')).default;
  const pool = new Pool({ connectionString: process.env.DATABASE_URL, max: 10 });
  const app = express();
  app.get('/bare/setups/:id', async (req, res) => {
    const { rows } = await pool.query('SELECT id, title, visibility, updated_at FROM setups WHERE id = $1', [Number(req.params.id)]);
    if (!rows.length) res.status(404).json({ error: 'not found' });
    else res.json({ setup: rows[0] });
  });
  app.listen(port, '127.0.0.1');
}

/** `--load JSON`: one autocannon run; prints its figures as one JSON line. */
async function runLoad(spec: LoadSpec): Promise<void> {
  // autocannon ships no type declarations; only the fields used below are typed.
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const autocannon = require('autocannon') as (opts: object) => Promise<{
    requests: { average: number };
    latency: { p50: number; p97_5: number; p99: number };
    non2xx: number;
    errors: number;
    timeouts: number;
    requests_total?: number;
    '2xx': number;
  }>;
  let n = 0;
  const request = {
    method: spec.method,
    headers: spec.headers,
    // Each request picks the next path (and body) in turn, so connections spread over many rows.
    setupRequest: (req: Record<string, unknown>) => {
      const i = n++;
      return { ...req, path: spec.paths[i % spec.paths.length], ...(spec.bodies ? { body: spec.bodies[i % spec.bodies.length] } : {}) };
    },
  };
  const base = { url: spec.url, connections: spec.connections, requests: [request] };
  await autocannon({ ...base, duration: WARMUP_SECONDS });
  const r = await autocannon({ ...base, duration: spec.seconds });
  const out: LoadResult = {
    reqPerSec: r.requests.average,
    p50: r.latency.p50,
    p97_5: r.latency.p97_5,
    p99: r.latency.p99,
    non2xx: r.non2xx,
    errors: r.errors + r.timeouts,
    total: r['2xx'] + r.non2xx,
  };
  process.stdout.write(`${JSON.stringify(out)}\n`);
}

function runChild(args: string[], env: NodeJS.ProcessEnv = process.env): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn('./node_modules/.bin/tsx', args, { env, stdio: ['ignore', 'pipe', 'inherit'] });
    let out = '';
    child.stdout.on('data', (d: Buffer) => (out += String(d)));
    child.on('exit', (code) => (code === 0 ? resolve(out) : reject(new Error(`${args.join(' ')} exited with ${code}`))));
  });
}

async function waitFor(url: string): Promise<void> {
  for (let i = 0; ; i++) {
    if ((await fetch(url).catch(() => null))?.ok) return;
    if (i > 150) throw new Error(`${url} did not answer`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

async function signIn(base: string, login: string): Promise<{ cookie: string; csrf: string }> {
  const first = await fetch(`${base}/api/auth/csrf`);
  const anon = first.headers.get('set-cookie')!.split(';')[0];
  const { csrfToken } = (await first.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': csrfToken, Cookie: anon },
    body: JSON.stringify({ login, password: SCALE_PASSWORD }),
  });
  if (!res.ok) throw new Error(`sign-in of ${login} failed: ${res.status} ${await res.text()}`);
  const body = (await res.json()) as { csrfToken: string };
  return { cookie: res.headers.get('set-cookie')!.split(';')[0], csrf: body.csrfToken };
}

/** The racer who follows the most racers (so the feed is a busy one), popular setups and cars. */
async function pickData(url: string) {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    const { rows: who } = await client.query(
      `SELECT u.id, u.handle FROM follows f JOIN users u ON u.id = f.follower_id WHERE u.handle LIKE 'racer\\_%'
        GROUP BY u.id, u.handle ORDER BY count(*) DESC, u.id LIMIT 1`,
    );
    if (!who.length) throw new Error('no generated racers: run npm run seed:scale on this database first');
    const me = who[0] as { id: number; handle: string };
    const { rows: cars } = await client.query('SELECT id, kit_id FROM cars WHERE owner_id = $1', [me.id]);
    const carByKit = new Map<number, number>(cars.map((c: { id: number; kit_id: number }) => [c.kit_id, c.id]));
    // The 500 most-forked listed setups of others: popular pages, and forkable onto one of my cars.
    const { rows: popular } = await client.query(
      `SELECT s.id, c.kit_id FROM setups s JOIN cars c ON c.id = s.car_id
        WHERE s.visibility = 'public' AND s.hidden_at IS NULL AND s.deleted_at IS NULL AND s.owner_id <> $1
        ORDER BY s.fork_count DESC, s.id LIMIT 500`,
      [me.id],
    );
    const { rows: handles } = await client.query(`SELECT handle FROM users WHERE handle LIKE 'racer\\_%' ORDER BY id LIMIT 5`);
    return { me, carByKit, popular: popular as Array<{ id: number; kit_id: number }>, handles: handles.map((h: { handle: string }) => h.handle) };
  } finally {
    await client.end();
  }
}

function shuffled<T>(items: T[], seed = 12345): T[] {
  // A repeatable order: a linear congruential sequence from a fixed seed.
  const out = [...items];
  let s = seed;
  for (let i = out.length - 1; i > 0; i--) {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    const j = s % (i + 1);
    [out[i], out[j]] = [out[j], out[i]];
  }
  return out;
}

async function main(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set');
  const [appPort, barePort] = [await freePort(), await freePort()];
  const base = `http://127.0.0.1:${appPort}`;
  const bare = `http://127.0.0.1:${barePort}`;
  // Deployed as README's "Running at scale" says: the app server only queues mail jobs
  // (JOB_WORKERS=false); workers run as their own processes elsewhere, so the mail a fork causes is
  // not composed, sent and received (by the local fake SMTP) inside the process being measured.
  const server = spawn('./node_modules/.bin/tsx', ['server/index.ts'], {
    env: { ...process.env, PORT: String(appPort), LOG_LEVEL: 'warn', API_RATE_LIMIT_MAX: '100000000', JOB_WORKERS: 'false' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const bareServer = spawn('./node_modules/.bin/tsx', ['scripts/bench-scale.ts', '--bare', String(barePort)], { stdio: ['ignore', 'inherit', 'inherit'] });
  try {
    const data = await pickData(url);
    await waitFor(`${base}/api/health`);
    await waitFor(`${bare}/bare/setups/${data.popular[0].id}`);
    const session = await signIn(base, `${data.me.handle}@${SCALE_EMAIL_DOMAIN}`);
    const signed = { Cookie: session.cookie };
    const writing = { ...signed, 'X-CSRF-Token': session.csrf, 'Content-Type': 'application/json' };
    const ids = shuffled(data.popular.map((s) => s.id));
    const forkable = shuffled(data.popular.filter((s) => data.carByKit.has(s.kit_id)));
    const voteTypes = ['loose-dusty', 'hard-packed', 'indoor-clay', 'loamy'];

    const targets: Array<{ name: string; headers: Record<string, string>; target: Target }> = [
      { name: 'bare pk query', headers: {}, target: { kind: 'ceiling', method: 'GET', path: '', paths: ids.map((id) => `/bare/setups/${id}`) } },
      // The product's own floor: GET /api/health goes through everything every API request does
      // (helmet, compression, logging, rate limit, session, CSRF, router) and one `SELECT 1`. No
      // route of the app can be cheaper; its ratio shows what the stack alone costs.
      { name: 'app floor (health)', headers: {}, target: { kind: 'floor', method: 'GET', path: '/api/health' } },
      // The same for a signed-in request: GET /api/me reads the session and its racer (one
      // statement) and answers who I am. The feed, fork and vote cannot be cheaper than this.
      { name: 'signed-in floor (me)', headers: signed, target: { kind: 'floor', method: 'GET', path: '/api/me' } },
      { name: 'home feed', headers: signed, target: { kind: 'read', method: 'GET', path: '/api/feed' } },
      { name: 'discover best-for', headers: {}, target: { kind: 'read', method: 'GET', path: '/api/discover?sort=best-for&bestFor=loose-dusty' } },
      {
        name: 'search',
        headers: {},
        target: {
          kind: 'read',
          method: 'GET',
          path: '',
          paths: ['camber', '"shock oil"', 'spur -toe', 'droop bumps', data.handles[0], 'stoat diff'].map((q) => `/api/search?q=${encodeURIComponent(q)}`),
        },
      },
      { name: 'setup page', headers: {}, target: { kind: 'read', method: 'GET', path: '', paths: ids.map((id) => `/api/setups/${id}`) } },
      {
        name: 'fork (POST)',
        headers: writing,
        target: {
          kind: 'write',
          method: 'POST',
          path: '',
          paths: forkable.map((s) => `/api/setups/${s.id}/forks`),
          bodies: forkable.map((s, i) => JSON.stringify({ carId: data.carByKit.get(s.kit_id), title: `Bench fork ${i}` })),
        },
      },
      {
        name: 'vote (PUT)',
        headers: writing,
        target: {
          kind: 'write',
          method: 'PUT',
          path: '',
          // Every vote changes: each setup and type is voted "works" then "doesn't work" in turn.
          paths: ids.flatMap((id, i) => [0, 1].map(() => `/api/setups/${id}/votes/${voteTypes[i % voteTypes.length]}`)),
          bodies: ids.flatMap(() => [JSON.stringify({ works: true }), JSON.stringify({ works: false })]),
        },
      },
    ];

    if (ROUTES) {
      const keep = targets.filter((t) => t.target.kind === 'ceiling' || t.target.kind === 'floor' || ROUTES.some((r) => t.name.includes(r)));
      targets.splice(0, targets.length, ...keep);
    }

    // One request of each first: a route that fails is reported, not measured.
    for (const t of targets) {
      const path = t.target.paths?.[0] ?? t.target.path;
      const res = await fetch(`${t.target.kind === 'ceiling' ? bare : base}${path}`, {
        method: t.target.method,
        headers: t.headers,
        body: t.target.bodies?.[0],
      });
      if (!res.ok) throw new Error(`${t.name}: ${t.target.method} ${path} answered ${res.status} ${(await res.text()).slice(0, 300)}`);
    }

    const results: Array<{ name: string; kind: Target['kind']; connections: number; r: LoadResult }> = [];
    for (const connections of CONNECTIONS) {
      for (const t of targets) {
        const spec: LoadSpec = {
          url: t.target.kind === 'ceiling' ? bare : base,
          connections,
          seconds: SECONDS,
          headers: t.headers,
          method: t.target.method,
          paths: t.target.paths ?? [t.target.path],
          bodies: t.target.bodies,
        };
        const out = await runChild(['scripts/bench-scale.ts', '--load', JSON.stringify(spec)]);
        const r = JSON.parse(out.trim().split('\n').pop()!) as LoadResult;
        results.push({ name: t.name, kind: t.target.kind, connections, r });
        console.error(`measured ${t.name} at ${connections}: ${r.reqPerSec.toFixed(0)} req/s, p99 ${r.p99} ms`);
      }
    }

    const f = (n: number, w: number, d = 0) => n.toFixed(d).padStart(w);
    console.log('| route                | conns | req/s | p50 ms | p97.5 ms | p99 ms | req/s ÷ bare | p99 ÷ bare | non-2xx | target |');
    console.log('| -------------------- | ----- | ----- | ------ | -------- | ------ | ------------ | ---------- | ------- | ------ |');
    for (const row of results) {
      const ceiling = results.find((x) => x.kind === 'ceiling' && x.connections === row.connections)!.r;
      const tput = row.r.reqPerSec / ceiling.reqPerSec;
      const tail = row.r.p99 / ceiling.p99;
      const met =
        row.kind === 'ceiling' || row.kind === 'floor' ? '—' : row.kind === 'read' ? (tput >= 0.5 && tail <= 2.5 ? 'met' : 'missed') : tput >= 0.25 ? 'met' : 'missed';
      console.log(
        `| ${row.name.padEnd(20)} | ${f(row.connections, 5)} | ${f(row.r.reqPerSec, 5)} | ${f(row.r.p50, 6)} | ${f(row.r.p97_5, 8)} | ${f(row.r.p99, 6)} | ${f(tput, 12, 2)} | ${f(tail, 10, 2)} | ${f(row.r.non2xx + row.r.errors, 7)} | ${met.padEnd(6)} |`,
      );
    }
    // Requests autocannon abandoned at its deadline are still being served: let them finish
    // before the server stops, so its shutdown logs no errors about closed pools.
    await new Promise((r) => setTimeout(r, 5_000));
  } finally {
    server.kill('SIGTERM');
    bareServer.kill('SIGTERM');
  }
}

const [mode, arg] = process.argv.slice(2);
const run = mode === '--bare' ? runBare(Number(arg)) : mode === '--load' ? runLoad(JSON.parse(arg) as LoadSpec) : main();
run.catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
