import type { Browser } from 'playwright-core';
import { jpegWithGps } from '../support/images';
import { openWatchedPage, seriousAccessibilityViolations, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(240_000);

const world = useServerAndBrowser();

it('a racer adds a car, starts a setup from the stock sheet, changes two fields with a note, writes previewed notes, adds a photo and prints (phone)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = w;
  // The demo newcomer, signed in through the API so the browser shares the session cookie.
  const { csrfToken } = await (await page.request.get(`${world.server.baseUrl}/api/auth/csrf`)).json();
  const signIn = await page.request.post(`${world.server.baseUrl}/api/auth/sign-in`, {
    data: { login: 'rafi_new', password: 'first-season-stoat-8e' },
    headers: { 'X-CSRF-Token': csrfToken },
  });
  expect(signIn.ok()).toBe(true);

  await page.goto(`${world.server.baseUrl}/garage`);
  await page.getByRole('link', { name: 'Add a car' }).first().click();
  await page.waitForURL((url) => url.pathname === '/garage/add-car');
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.getByText('Ottervale Kitworks Stoat 8N').first().click();
  await page.getByLabel('Name for the car').fill('Browser Stoat');
  await page.getByRole('button', { name: 'Add the car' }).click();
  await page.waitForURL((url) => url.pathname === '/garage');
  const car = page.getByRole('article', { name: 'Browser Stoat' });
  await car.getByRole('link', { name: 'New setup' }).click();
  await page.waitForURL((url) => url.pathname === '/setups/new');
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.getByLabel('Title', { exact: true }).fill('First club night');
  await page.getByRole('button', { name: 'Create the setup' }).click();
  await page.waitForURL((url) => /^\/setups\/\d+$/.test(url.pathname));
  const setupPath = new URL(page.url()).pathname;
  await page.getByRole('heading', { name: 'First club night', level: 1 }).waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);

  await page.getByRole('link', { name: 'Edit the sheet' }).click();
  await page.waitForURL((url) => url.pathname === `${setupPath}/edit`);
  // Sections start folded on a phone: jump to each one, which opens it.
  await page.getByRole('button', { name: 'Go to Shocks' }).click();
  await page.getByRole('button', { name: 'Increase rear shock oil' }).click();
  await page.getByRole('button', { name: 'Go to Gearing' }).click();
  await page.getByRole('button', { name: 'Increase spur gear' }).click();
  await page.getByText(/2 fields changed/i).first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.getByLabel(/Change note/).fill('Thicker rear oil and one more spur tooth for the long straight.');
  await page.getByRole('button', { name: 'Save revision 2' }).click();
  await page.waitForURL((url) => url.pathname === setupPath);
  await page.getByText('Thicker rear oil and one more spur tooth for the long straight.').first().waitFor();

  // Notes in markdown, previewed as the server will show them.
  await page.getByRole('link', { name: 'Edit details' }).click();
  await page.waitForURL((url) => url.pathname === `${setupPath}/details`);
  await page.getByLabel('Notes', { exact: true }).fill('Rear oil **450** felt right on the bumps.');
  await page.getByRole('tab', { name: 'Preview notes' }).click();
  await page.locator('strong', { hasText: '450' }).first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.getByRole('button', { name: 'Save details' }).click();
  await page.waitForURL((url) => url.pathname === setupPath);
  await page.locator('strong', { hasText: '450' }).first().waitFor();

  // Slow the upload down so the progress bar has time to be seen.
  const cdp = await w.context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 60 * 1024 });
  const photo = await jpegWithGps({ width: 1800, height: 1200 });
  await page.locator('input[type=file]').setInputFiles({ name: 'rear.jpg', mimeType: 'image/jpeg', buffer: photo });
  await page.getByRole('progressbar', { name: 'Photo upload' }).waitFor();
  await page.getByRole('button', { name: /Open photo 1/ }).waitFor({ timeout: 60_000 });
  await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
  expect(await seriousAccessibilityViolations(page)).toEqual([]);

  await page.getByRole('link', { name: 'Pit sheet to print' }).click();
  await page.waitForURL((url) => url.pathname === `${setupPath}/print`);
  await page.getByText(/Revision 2/).filter({ visible: true }).first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  expect(w.consoleErrors).toEqual([]);
  expect(await w.cspViolations()).toEqual([]);
  await w.context.close();
});

it('shows a public demo setup read-only to a visitor, and its pit sheet, clean under axe (wide)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.wide);
  const { page } = w;
  const res = await page.request.get(`${world.server.baseUrl}/api/racers/juno_braithwick`);
  expect(res.ok()).toBe(true);
  await page.goto(`${world.server.baseUrl}/garage`);
  await page.getByRole('heading', { name: 'Garage', level: 1 }).waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  // The first demo setup of the seeded world is Juno's public loose-and-dusty sheet.
  await page.goto(`${world.server.baseUrl}/setups/1`);
  await page.getByRole('heading', { name: /Hollow Pines/, level: 1 }).waitFor();
  expect(await page.getByRole('link', { name: 'Edit the sheet' }).count()).toBe(0);
  await page.getByText(/Final drive/).first().waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.goto(`${world.server.baseUrl}/setups/1/print`);
  await page.getByRole('button', { name: 'Print' }).waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  expect(w.consoleErrors).toEqual([]);
  expect(await w.cspViolations()).toEqual([]);
  await w.context.close();
});
