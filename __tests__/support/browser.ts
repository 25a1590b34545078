import AxeBuilder from '@axe-core/playwright';
import { chromium, type APIRequestContext, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from './chromium';
import { startServer, type RunningServer } from './server';

export const VIEWPORTS = {
  phone: { width: 390, height: 844 },
  wide: { width: 1280, height: 800 },
} as const;

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
}

export type WatchedPage = {
  page: Page;
  context: BrowserContext;
  /** Console errors and uncaught page errors seen so far. */
  consoleErrors: string[];
  /** Content-Security-Policy violations reported by the page. */
  cspViolations(): Promise<string[]>;
};

/** A fresh context and page that records console errors and CSP violations. */
export async function openWatchedPage(browser: Browser, viewport: { width: number; height: number }): Promise<WatchedPage> {
  const context = await browser.newContext({ viewport });
  await context.addInitScript(() => {
    const w = window as unknown as { __cspViolations: string[] };
    w.__cspViolations = [];
    document.addEventListener('securitypolicyviolation', (e) => {
      w.__cspViolations.push(`${e.violatedDirective} blocked ${e.blockedURI || '(inline)'}`);
    });
  });
  const page = await context.newPage();
  const consoleErrors: string[] = [];
  page.on('console', (msg) => {
    // A 4xx answer the app handles (a wrong password, say) still makes Chromium log the request.
    if (msg.type() === 'error' && !/Failed to load resource: the server responded with a status of 4\d\d/.test(msg.text())) {
      consoleErrors.push(msg.text());
    }
  });
  page.on('pageerror', (err) => consoleErrors.push(`pageerror: ${err.message}`));
  return {
    page,
    context,
    consoleErrors,
    cspViolations: () => page.evaluate(() => (window as unknown as { __cspViolations: string[] }).__cspViolations),
  };
}

/** axe-core's findings of serious or critical impact, as readable lines. */
export async function seriousAccessibilityViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
}

/**
 * Signs a browser context in through the API (its cookies then carry the session into the page);
 * returns the new session's CSRF token for further API calls from the test.
 */
export async function signInThroughApi(request: APIRequestContext, baseUrl: string, login: string, password: string): Promise<string> {
  const { csrfToken } = await (await request.get(`${baseUrl}/api/auth/csrf`)).json();
  const res = await request.post(`${baseUrl}/api/auth/sign-in`, { data: { login, password }, headers: { 'X-CSRF-Token': csrfToken } });
  if (!res.ok()) throw new Error(`sign-in as ${login} failed: ${res.status()} ${await res.text()}`);
  return (await res.json()).csrfToken as string;
}

/** A browser test file's product server and chromium, and sign-in through the API against that server. */
export type BrowserWorld = {
  server: RunningServer;
  browser: Browser;
  /** signInThroughApi against this file's server. */
  signIn(request: APIRequestContext, login: string, password: string): Promise<string>;
};

/**
 * Starts the real server (on the shared e2e database) and Debian chromium before a file's tests and
 * stops both after them. Call once at the top of a test file.
 */
export function useServerAndBrowser(): BrowserWorld {
  const world = {
    signIn: (request: APIRequestContext, login: string, password: string) => signInThroughApi(request, world.server.baseUrl, login, password),
  } as BrowserWorld;
  beforeAll(async () => {
    world.server = await startServer();
    world.browser = await launchBrowser();
  });
  afterAll(async () => {
    await world.browser?.close();
    await world.server?.stop();
  });
  return world;
}

/** No serious or critical axe findings on the page as it is now. */
export async function expectAccessible(page: Page): Promise<void> {
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}
