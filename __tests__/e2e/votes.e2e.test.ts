import type { Page } from 'playwright-core';
import { openWatchedPage, seriousAccessibilityViolations, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(240_000);

const world = useServerAndBrowser();

/** Titles of the Discover cards that speak of the surface, in the order shown. */
async function bestForOrder(page: Page, surface: string): Promise<string[]> {
  const cards = page.getByRole('link', { name: new RegExp(`(No votes for|works on) ${surface}`) });
  await cards.first().waitFor();
  const labels = await cards.evaluateAll((els) => els.map((e) => e.getAttribute('aria-label') ?? ''));
  return labels.map((label) => label.split('. ')[0]);
}

async function showBestFor(page: Page, surface: string): Promise<void> {
  await page.goto(`${world.server.baseUrl}/`);
  await page.getByRole('radio', { name: 'Best for a track surface' }).click();
  await page.getByRole('radio', { name: `Best for ${surface}` }).click();
  await page.getByRole('note', { name: 'Why this order' }).waitFor();
}

it('a racer votes that a setup works on a surface and sees it move to the top of "best for" that surface (phone)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = w;
  const { csrfToken } = await (await page.request.get(`${world.server.baseUrl}/api/auth/csrf`)).json();
  const signIn = await page.request.post(`${world.server.baseUrl}/api/auth/sign-in`, {
    data: { login: 'pell-strand', password: 'brackwater-ruts-9' },
    headers: { 'X-CSRF-Token': csrfToken },
  });
  expect(signIn.ok()).toBe(true);

  // Nobody has voted for wet and muddy yet: the order is newest first, the oldest demo setup is not on top.
  await showBestFor(page, 'Wet and muddy');
  const before = await bestForOrder(page, 'Wet and muddy');
  expect(before.length).toBeGreaterThan(1);
  expect(before[0]).not.toBe('Hollow Pines — loose and dusty');
  expect(await seriousAccessibilityViolations(page)).toEqual([]);

  // Vote on the setup page.
  await page.getByRole('link', { name: /^Hollow Pines — loose and dusty\./ }).first().click();
  await page.waitForURL((url) => /^\/setups\/\d+$/.test(url.pathname));
  await page.getByRole('radio', { name: 'Works here: Wet and muddy' }).click();
  await page.getByRole('listitem', { name: /^Wet and muddy: 1\b/ }).waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);

  await showBestFor(page, 'Wet and muddy');
  const after = await bestForOrder(page, 'Wet and muddy');
  expect(after[0]).toBe('Hollow Pines — loose and dusty');
  await page.getByRole('link', { name: /^Hollow Pines — loose and dusty\..*1 of 1 racer says it works on Wet and muddy/ }).waitFor();
  expect(w.consoleErrors).toEqual([]);
  await w.context.close();
});
