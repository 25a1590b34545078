/**
 * Measures the API over loopback against a server it starts (see scripts/bench.sh):
 *   setup view   GET /api/setups/:id of a public demo setup, 8 clients in parallel
 *   setup save   POST /api/setups/:id/revisions, one client saving one change after another
 *   fork         POST /api/setups/:id/forks, one client growing a family of FAMILY_SIZE forks, each
 *                forking a random earlier member (so the tree is both wide and deep)
 *   family       GET /api/setups/:id/family of that family's root (all FAMILY_SIZE forks below it)
 * Prints requests per second and latency percentiles. Figures vary with the machine; compare
 * runs on the same machine.
 */
import { spawn } from 'node:child_process';
import net from 'node:net';
import { performance } from 'node:perf_hooks';

const VIEW_CLIENTS = 8;
const VIEW_REQUESTS_PER_CLIENT = 250;
const SAVES = 200;
const FAMILY_SIZE = 1000;
const FAMILY_READS = 100;

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const srv = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

function report(name: string, latencies: number[], seconds: number): string {
  const s = [...latencies].sort((a, b) => a - b);
  const f = (n: number) => n.toFixed(1).padStart(7);
  return `| ${name.padEnd(12)} | ${String(s.length).padStart(5)} | ${f(s.length / seconds)} | ${f(percentile(s, 50))} | ${f(percentile(s, 95))} | ${f(percentile(s, 99))} |`;
}

async function signIn(base: string): Promise<{ cookie: string; csrf: string }> {
  const first = await fetch(`${base}/api/auth/csrf`);
  const anon = first.headers.get('set-cookie')!.split(';')[0];
  const { csrfToken } = (await first.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': csrfToken, Cookie: anon },
    body: JSON.stringify({ login: 'juno@racers.example', password: 'hollow-pines-laps-2' }),
  });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  const body = (await res.json()) as { csrfToken: string };
  return { cookie: res.headers.get('set-cookie')!.split(';')[0], csrf: body.csrfToken };
}

async function main(): Promise<void> {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = spawn('./node_modules/.bin/tsx', ['server/index.ts'], {
    env: { ...process.env, PORT: String(port), LOG_LEVEL: 'warn', API_RATE_LIMIT_MAX: '1000000' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  try {
    for (let i = 0; ; i++) {
      if ((await fetch(`${base}/api/health`).catch(() => null))?.ok) break;
      if (i > 150) throw new Error('server did not start');
      await new Promise((r) => setTimeout(r, 200));
    }
    const session = await signIn(base);
    const garage = (await (await fetch(`${base}/api/garage`, { headers: { Cookie: session.cookie } })).json()) as {
      cars: Array<{ setups: Array<{ id: number; visibility: string }> }>;
    };
    const setupId = garage.cars.flatMap((c) => c.setups).find((s) => s.visibility === 'public')!.id;

    const viewLatencies: number[] = [];
    const viewStart = performance.now();
    await Promise.all(
      Array.from({ length: VIEW_CLIENTS }, async () => {
        for (let i = 0; i < VIEW_REQUESTS_PER_CLIENT; i++) {
          const t0 = performance.now();
          const res = await fetch(`${base}/api/setups/${setupId}`);
          await res.arrayBuffer();
          if (!res.ok) throw new Error(`view answered ${res.status}`);
          viewLatencies.push(performance.now() - t0);
        }
      }),
    );
    const viewSeconds = (performance.now() - viewStart) / 1000;

    let detail = (await (await fetch(`${base}/api/setups/${setupId}`, { headers: { Cookie: session.cookie } })).json()) as {
      setup: { currentRevision: { id: number; values: Record<string, unknown> } };
    };
    const saveLatencies: number[] = [];
    const saveStart = performance.now();
    for (let i = 0; i < SAVES; i++) {
      const values = { ...detail.setup.currentRevision.values, 'shock.rear.oil': 400 + (i % 10) * 10 };
      const t0 = performance.now();
      const res = await fetch(`${base}/api/setups/${setupId}/revisions`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Cookie: session.cookie, 'X-CSRF-Token': session.csrf },
        body: JSON.stringify({ baseRevisionId: detail.setup.currentRevision.id, values, changeNote: `Bench change ${i}` }),
      });
      detail = (await res.json()) as typeof detail;
      if (res.status !== 201) throw new Error(`save answered ${res.status}`);
      saveLatencies.push(performance.now() - t0);
    }
    const saveSeconds = (performance.now() - saveStart) / 1000;

    // A family of forks: the public setup is the root; each fork forks a random earlier member.
    const carId = (
      (await (await fetch(`${base}/api/setups/${setupId}`, { headers: { Cookie: session.cookie } })).json()) as { setup: { car: { id: number } } }
    ).setup.car.id;
    const members = [setupId];
    const forkLatencies: number[] = [];
    // A repeatable choice of parent: a linear congruential sequence from a fixed seed.
    let seed = 12345;
    const nextIndex = (n: number) => ((seed = (Math.imul(seed, 1103515245) + 12345) >>> 0), seed % n);
    const forkStart = performance.now();
    for (let i = 0; i < FAMILY_SIZE; i++) {
      const parent = members[nextIndex(members.length)];
      const t0 = performance.now();
      const res = await fetch(`${base}/api/setups/${parent}/forks`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json', Cookie: session.cookie, 'X-CSRF-Token': session.csrf },
        body: JSON.stringify({ carId, title: `Bench fork ${i}` }),
      });
      const body = (await res.json()) as { setup: { id: number } };
      if (res.status !== 201) throw new Error(`fork answered ${res.status}`);
      forkLatencies.push(performance.now() - t0);
      members.push(body.setup.id);
    }
    const forkSeconds = (performance.now() - forkStart) / 1000;

    const familyLatencies: number[] = [];
    const familyStart = performance.now();
    for (let i = 0; i < FAMILY_READS; i++) {
      const t0 = performance.now();
      const res = await fetch(`${base}/api/setups/${setupId}/family`, { headers: { Cookie: session.cookie } });
      const body = (await res.json()) as { descendants: unknown[] };
      if (!res.ok || body.descendants.length !== FAMILY_SIZE) throw new Error(`family answered ${res.status} with ${body.descendants.length} forks`);
      familyLatencies.push(performance.now() - t0);
    }
    const familySeconds = (performance.now() - familyStart) / 1000;

    console.log('| route        | reqs  |   req/s | p50 ms  | p95 ms  | p99 ms  |');
    console.log('| ------------ | ----- | ------- | ------- | ------- | ------- |');
    console.log(report('setup view', viewLatencies, viewSeconds));
    console.log(report('setup save', saveLatencies, saveSeconds));
    console.log(report('fork', forkLatencies, forkSeconds));
    console.log(report(`family ${FAMILY_SIZE}`, familyLatencies, familySeconds));
  } finally {
    server.kill('SIGTERM');
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
