import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

export type RunningServer = { baseUrl: string; process: ChildProcess; output: string[]; stop(): Promise<void> };

/**
 * Starts the real server (server/index.ts through tsx) on a free loopback port, serving the built
 * web export, and waits until /api/health answers.
 */
export async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const port = await freePort();
  const databaseUrl = process.env.TUNEFORK_E2E_DATABASE_URL ?? process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error('run through npm test: no database URL for the e2e server');
  const child = spawn(path.join(ROOT, 'node_modules/.bin/tsx'), ['server/index.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      LOG_LEVEL: 'warn',
      DATABASE_URL: databaseUrl,
      PORT: String(port),
      HOST: '127.0.0.1',
      // Photos of the seeded world and of a browser run live in a throwaway folder.
      DATA_DIR: process.env.TUNEFORK_E2E_DATA_DIR ?? fs.mkdtempSync(path.join(os.tmpdir(), 'tunefork-e2e-data-')),
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  child.stdout?.on('data', (d) => output.push(String(d)));
  child.stderr?.on('data', (d) => output.push(String(d)));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output.join('')}`);
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`server did not become healthy:\n${output.join('')}`);
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    baseUrl,
    process: child,
    output,
    stop: () =>
      new Promise<void>((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}
