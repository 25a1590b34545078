import { expectAccessible, openWatchedPage, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(300_000);

const world = useServerAndBrowser();

it('a racer follows another on a phone, sees their new revision in the feed, and the followed racer is told (wide)', async () => {
  const pell = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = pell;
  const pellCsrf = await world.signIn(page.request, 'pell-strand', 'brackwater-ruts-9');
  // Start from not following, whatever other journeys did.
  await page.request.delete(`${world.server.baseUrl}/api/racers/oskar-velde/follow`, { headers: { 'X-CSRF-Token': pellCsrf } });

  await page.goto(`${world.server.baseUrl}/racers/oskar-velde`);
  await page.getByRole('heading', { name: 'Oskar Velde', level: 1 }).waitFor();
  await page.getByRole('button', { name: 'Follow @oskar-velde' }).click();
  await page.getByRole('button', { name: 'Following @oskar-velde. Press to unfollow' }).waitFor();
  await page.getByRole('button', { name: /followers?: show the list/ }).click();
  await page.getByRole('list', { name: 'Followers' }).getByRole('link', { name: '@pell-strand' }).waitFor();
  await expectAccessible(page);

  // Oskar saves a change to one of his public setups.
  const oskar = await openWatchedPage(world.browser, VIEWPORTS.wide);
  const oskarCsrf = await world.signIn(oskar.page.request, 'oskar-velde', 'saltmarsh-marshal-4');
  const garage = await (await oskar.page.request.get(`${world.server.baseUrl}/api/garage`)).json();
  const published = garage.cars.flatMap((c: { setups: Array<{ id: number; visibility: string }> }) => c.setups).find((s: { visibility: string }) => s.visibility === 'public');
  const setup = (await (await oskar.page.request.get(`${world.server.baseUrl}/api/setups/${published.id}`)).json()).setup;
  const note = `Pinion up one tooth for the long straight (${Date.now()})`;
  const saved = await oskar.page.request.post(`${world.server.baseUrl}/api/setups/${setup.id}/revisions`, {
    headers: { 'X-CSRF-Token': oskarCsrf },
    data: { baseRevisionId: setup.currentRevision.id, values: { ...setup.currentRevision.values, 'shock.rear.oil': (setup.currentRevision.values['shock.rear.oil'] as number) + 25 }, changeNote: note },
  });
  expect(saved.status()).toBe(201);
  const number = (await saved.json()).setup.currentRevision.number;

  // Pell's Activity tab shows it first, with the change note and a link to what changed.
  await page.getByRole('link', { name: 'Back to Discover' }).click();
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Activity' }).click();
  await page.waitForURL((url) => url.pathname === '/activity');
  const first = page.getByRole('article').first();
  await first.getByText(note).waitFor();
  await first.getByText(`saved revision ${number} of a setup`).waitFor();
  expect(await first.getByRole('link', { name: `What changed in revision ${number}` }).getAttribute('href')).toBe(
    `/compare?a=${setup.id}&ar=${number - 1}&b=${setup.id}&br=${number}`,
  );
  await expectAccessible(page);

  // Oskar's bell counts the new follower; the list says who, and "mark all read" clears the count.
  await oskar.page.goto(`${world.server.baseUrl}/activity`);
  const bell = oskar.page.getByRole('link', { name: /^Notifications, \d+ unread$/ });
  await bell.click();
  await oskar.page.waitForURL((url) => url.pathname === '/notifications');
  await oskar.page.getByRole('link', { name: 'Unread: @pell-strand started following you' }).waitFor();
  await expectAccessible(oskar.page);
  await oskar.page.getByRole('button', { name: 'Mark all read' }).click();
  await oskar.page.getByRole('link', { name: '@pell-strand started following you' }).waitFor();
  await oskar.page.getByRole('link', { name: 'Back to Activity' }).click();
  await oskar.page.getByRole('link', { name: 'Notifications', exact: true }).waitFor();

  for (const w of [pell, oskar]) {
    expect(w.consoleErrors).toEqual([]);
    expect(await w.cspViolations()).toEqual([]);
    await w.context.close();
  }
});
