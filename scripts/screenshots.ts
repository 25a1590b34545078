/**
 * Takes screenshots of the running app at phone and desktop sizes, for looking at what changed:
 *   BASE_URL=http://127.0.0.1:8080 tsx scripts/screenshots.ts / /garage
 * With LOGIN and PASSWORD set (a demo account from the README), pages are taken signed in.
 * Files land in .data/screenshots/<size>-<route>.png.
 */
import fs from 'node:fs';
import path from 'node:path';
import { chromium, type APIRequestContext } from 'playwright-core';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../__tests__/support/chromium';

const SIZES = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
];

/** Signs the browser context in through the API, so its pages share the session cookie. */
async function signIn(request: APIRequestContext, base: string, login: string, password: string): Promise<void> {
  const { csrfToken } = (await (await request.get(`${base}/api/auth/csrf`)).json()) as { csrfToken: string };
  const res = await request.post(`${base}/api/auth/sign-in`, { data: { login, password }, headers: { 'X-CSRF-Token': csrfToken } });
  if (!res.ok()) throw new Error(`sign-in as ${login} failed: ${res.status()}`);
}

async function main(): Promise<void> {
  const base = process.env.BASE_URL ?? 'http://127.0.0.1:8080';
  const routes = process.argv.slice(2).length ? process.argv.slice(2) : ['/'];
  const outDir = path.resolve('.data/screenshots');
  fs.mkdirSync(outDir, { recursive: true });
  const browser = await chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
  try {
    for (const size of SIZES) {
      const context = await browser.newContext({ viewport: { width: size.width, height: size.height } });
      if (process.env.LOGIN && process.env.PASSWORD) await signIn(context.request, base, process.env.LOGIN, process.env.PASSWORD);
      const page = await context.newPage();
      page.on('console', (m) => m.type() === 'error' && console.error(`[${size.name}] console: ${m.text()}`));
      for (const route of routes) {
        await page.goto(base + route, { waitUntil: 'networkidle' });
        await page.waitForTimeout(Number(process.env.SETTLE_MS ?? 800));
        const file = path.join(outDir, `${size.name}-${route.replace(/[^a-z0-9]+/gi, '_') || 'root'}.png`);
        await page.screenshot({ path: file, fullPage: process.env.FULL_PAGE === '1' });
        console.log(file);
      }
      await context.close();
    }
  } finally {
    await browser.close();
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
