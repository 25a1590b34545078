import type { Browser } from 'playwright-core';
import { openWatchedPage, seriousAccessibilityViolations, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(180_000);

const world = useServerAndBrowser();

it('signs up, confirms the address from the dev mailbox, signs out and signs back in (phone)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = w;
  const stamp = Date.now().toString(36);
  const handle = `e2e-${stamp}`;
  const email = `e2e.${stamp}@racers.example`;
  const password = 'front-toe-out-one-degree';

  await page.goto(`${world.server.baseUrl}/sign-up`);
  await page.getByRole('heading', { level: 1 }).waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.getByLabel('Handle').fill(handle);
  await page.getByLabel('Display name').fill('Test Racer');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-up');

  await page.goto(`${world.server.baseUrl}/dev/mailbox`);
  const message = page.getByRole('link', { name: new RegExp(`Confirm your e-mail address for Tunefork, to .*${email}`) });
  await message.first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await message.first().click();
  const verifyLink = page.getByRole('link', { name: /Open .*\/verify-email\?token=/ });
  await verifyLink.waitFor();
  await verifyLink.click();
  await page.waitForURL((url) => url.pathname === '/verify-email');
  await page.getByText(/confirmed/i).first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);

  await page.goto(`${world.server.baseUrl}/profile`);
  await page.getByText(`@${handle}`).first().waitFor();
  await page.getByRole('button', { name: 'Sign out', exact: true }).click();
  await page.getByRole('link', { name: 'Sign in' }).first().waitFor();

  await page.goto(`${world.server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail or handle').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-in');
  await page.goto(`${world.server.baseUrl}/profile`);
  await page.getByText(`@${handle}`).first().waitFor();
  expect(w.consoleErrors).toEqual([]);
  expect(await w.cspViolations()).toEqual([]);
  await w.context.close();
});

it('continues with GitHub through the local provider\u2019s consent page and back (wide)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.wide);
  const { page } = w;
  await page.goto(`${world.server.baseUrl}/sign-in`);
  await page.getByRole('button', { name: 'Continue with GitHub' }).click();
  await page.waitForURL((url) => url.pathname === '/fake-github/login/oauth/authorize');
  await page.getByLabel('Login', { exact: true }).fill('e2e-gh-racer');
  await page.getByLabel('Name', { exact: true }).fill('Browser Racer');
  await page.getByLabel('E-mail', { exact: true }).fill('browser.racer@racers.example');
  await page.getByLabel('Another account:').check();
  await page.getByRole('button', { name: 'Authorize Tunefork' }).click();
  await page.waitForURL((url) => url.origin === world.server.baseUrl && !url.pathname.startsWith('/fake-github') && !url.pathname.startsWith('/api'));
  await page.goto(`${world.server.baseUrl}/profile`);
  await page.getByText('@e2e-gh-racer').first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  expect(w.consoleErrors).toEqual([]);
  expect(await w.cspViolations()).toEqual([]);
  await w.context.close();
});
