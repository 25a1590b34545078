import type { Page } from 'playwright-core';
import { expectAccessible, openWatchedPage, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(300_000);

const world = useServerAndBrowser();

/** Types laps into the one lap field, Enter after each, the way a racer does in the pits. */
async function typeLaps(page: Page, laps: string[]): Promise<void> {
  const field = page.getByLabel('Lap time', { exact: true });
  for (const lap of laps) {
    await field.fill(lap);
    await field.press('Enter');
  }
  await page.getByRole('list', { name: `${laps.length} laps entered` }).waitFor();
}

async function addRun(page: Page, revision: RegExp, laps: string[], label: string): Promise<void> {
  const form = page.getByRole('region', { name: 'Add a run' });
  await form.getByRole('radio', { name: /Blue Stoat/ }).click();
  await form.getByRole('radio', { name: /Hollow Pines — loose and dusty/ }).click();
  await form.getByRole('radio', { name: revision }).click();
  await form.getByLabel('Run name (optional)').fill(label);
  await typeLaps(page, laps);
  await form.getByRole('button', { name: 'Save the run' }).click();
  await page.getByRole('article', { name: new RegExp(label) }).waitFor();
}

it('a racer logs a track day with two runs on different revisions, reads the verdict and the one-field change, and asks for oils on a colder day (phone)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = w;
  const { csrfToken } = await (await page.request.get(`${world.server.baseUrl}/api/auth/csrf`)).json();
  const signIn = await page.request.post(`${world.server.baseUrl}/api/auth/sign-in`, {
    data: { login: 'juno_braithwick', password: 'hollow-pines-laps-2' },
    headers: { 'X-CSRF-Token': csrfToken },
  });
  expect(signIn.ok()).toBe(true);

  await page.goto(`${world.server.baseUrl}/track-days`);
  await page.getByRole('link', { name: 'Log a track day' }).first().click();
  await page.waitForURL((url) => url.pathname === '/track-days/new');
  await page.getByRole('radio', { name: /Hollow Pines Circuit/ }).click();
  await page.getByLabel(/Track temperature/).fill('21');
  await expectAccessible(page);
  await page.getByRole('button', { name: 'Save the day' }).click();
  await page.waitForURL((url) => /^\/track-days\/\d+$/.test(url.pathname));

  // Baseline on revision 5, then the same car on revision 6 (one field changed: the body).
  await addRun(page, /^Revision 5\b/, ['39.8', '39.5', '39.6', '39.4', '39.7', '39.5', '39.6', '39.3'], 'Standard body');
  await addRun(page, /^Revision 6\b/, ['39.1', '38.9', '39.0', '38.8', '39.1', '38.9', '39.0', '38.8'], 'High-downforce body');
  await expectAccessible(page);

  const picker = page.getByRole('region', { name: 'Compare two runs' });
  await picker.getByRole('link', { name: 'Compare A and B' }).click();
  await page.waitForURL((url) => url.pathname === '/runs/compare');
  const verdict = page.getByRole('region', { name: 'Verdict' });
  await verdict.getByText(/faster by 0\.\d\d s a lap/).first().waitFor();
  const changed = page.getByRole('region', { name: 'What changed on the sheet' });
  await changed.getByText('Body style').first().waitFor();
  await expectAccessible(page);

  // Oils for a cold evening, from the setup page.
  const kits = (await (await page.request.get(`${world.server.baseUrl}/api/kits`)).json()).kits as Array<{ id: number; slug: string }>;
  const stoat = kits.find((k) => k.slug === 'ottervale-stoat-8e')!;
  const listed = (await (await page.request.get(`${world.server.baseUrl}/api/kits/${stoat.id}/setups`)).json()).setups as Array<{ id: number; title: string }>;
  const setupId = listed.find((s) => s.title === 'Hollow Pines — loose and dusty')!.id;
  await page.goto(`${world.server.baseUrl}/setups/${setupId}`);
  await page.getByRole('link', { name: 'Oils for today’s temperature' }).click();
  await page.waitForURL((url) => url.pathname === `/setups/${setupId}/oils`);
  const oils = page.getByRole('region', { name: 'Oils for today' });
  await oils.getByLabel(/Today’s track temperature/).fill('8');
  await oils.getByRole('list', { name: 'Oils for today' }).getByText(/cSt/).first().waitFor();
  await oils.getByRole('note', { name: 'Before you change oil' }).waitFor();
  await expectAccessible(page);

  expect(w.consoleErrors).toEqual([]);
  expect(await w.cspViolations()).toEqual([]);
  await w.context.close();
});
