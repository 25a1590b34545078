import { expectAccessible, openWatchedPage, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(300_000);

const world = useServerAndBrowser();

it('a newcomer forks a demo setup for their stock kit, takes one of two later changes from the original, and comments on it (phone)', async () => {
  const rafi = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = rafi;
  await world.signIn(page.request, 'rafi_new', 'first-season-stoat-8e');

  // Find the demo setup from the kit: Discover → the kit's page → the setup.
  await page.goto(`${world.server.baseUrl}/`);
  await page.getByRole('link', { name: /Ottervale Kitworks Stoat 8E/ }).click();
  await page.waitForURL((url) => /^\/kits\/\d+$/.test(url.pathname));
  await page.getByRole('heading', { name: /Stoat 8E/, level: 1 }).waitFor();
  await expectAccessible(page);
  await page.getByRole('link', { name: /Hollow Pines — loose and dusty/ }).click();
  await page.waitForURL((url) => /^\/setups\/\d+$/.test(url.pathname));
  const originalPath = new URL(page.url()).pathname;
  const originalId = Number(originalPath.split('/')[2]);

  // Fork it onto the stock car: the two option parts start on the stock value; keep one of them.
  await page.getByRole('link', { name: 'Fork this setup' }).click();
  await page.waitForURL((url) => url.pathname === `${originalPath}/fork`);
  await page.getByRole('radio', { name: /First Stoat/ }).click();
  const parts = page.getByRole('region', { name: 'Option parts' });
  await parts.getByRole('group', { name: 'Rear chassis brace' }).waitFor();
  await expect(parts.getByRole('radio', { name: /Rear chassis brace: take the stock/ }).getAttribute('aria-checked')).resolves.toBe('true');
  await parts.getByRole('radio', { name: /Body style: keep the original’s/ }).click();
  await page.getByLabel('Title for your copy').fill('Hollow Pines on my stock Stoat');
  await expectAccessible(page);
  await page.getByRole('button', { name: 'Start from this setup' }).click();
  await page.waitForURL((url) => /^\/setups\/\d+$/.test(url.pathname) && url.pathname !== originalPath);
  const forkPath = new URL(page.url()).pathname;
  const forkId = Number(forkPath.split('/')[2]);
  await page.getByRole('heading', { name: 'Hollow Pines on my stock Stoat', level: 1 }).waitFor();
  await page.getByRole('link', { name: /Forked from “Hollow Pines — loose and dusty” by @juno_braithwick \(revision \d+\)/ }).waitFor();
  await expectAccessible(page);

  const fork = (await (await page.request.get(`${world.server.baseUrl}/api/setups/${forkId}`)).json()).setup;
  expect(fork.currentRevision.values['chassis.rear-brace']).not.toBe('stiff');
  expect(fork.currentRevision.values['body.style']).toBe('high-downforce');
  expect(fork.currentRevision.changeNote).toMatch(/Rear chassis brace/);

  // The original's owner changes two things.
  const juno = await world.browser.newContext();
  const junoCsrf = await world.signIn(juno.request, 'juno_braithwick', 'hollow-pines-laps-2');
  const original = (await (await juno.request.get(`${world.server.baseUrl}/api/setups/${originalId}`)).json()).setup;
  const saved = await juno.request.post(`${world.server.baseUrl}/api/setups/${originalId}/revisions`, {
    headers: { 'X-CSRF-Token': junoCsrf },
    data: {
      baseRevisionId: original.currentRevision.id,
      values: { ...original.currentRevision.values, 'shock.rear.oil': 400, 'diff.centre.oil': 5000 },
      changeNote: 'Softer rear shocks and a thinner centre diff for the dry afternoon.',
    },
  });
  expect(saved.status()).toBe(201);
  await juno.close();

  // Back on the fork: the original changed 2 fields; take only the rear shock oil.
  await page.goto(`${world.server.baseUrl}${forkPath}`);
  const banner = page.getByRole('region', { name: 'Changes in the original' });
  await banner.getByText(/changed 2 fields/).waitFor();
  await banner.getByRole('link', { name: 'Review the changes' }).click();
  await page.waitForURL((url) => url.pathname === `${forkPath}/sync`);
  await page.getByRole('checkbox', { name: 'Take the original’s Rear shock oil' }).click();
  await expectAccessible(page);
  await page.getByRole('button', { name: 'Apply 1 change' }).click();
  await page.waitForURL((url) => url.pathname === forkPath);
  await page.getByText(/Saved as revision 2/).first().waitFor();

  const synced = (await (await page.request.get(`${world.server.baseUrl}/api/setups/${forkId}`)).json()).setup;
  expect(synced.currentRevision.values['shock.rear.oil']).toBe(400);
  expect(synced.currentRevision.values['diff.centre.oil']).toBe(fork.currentRevision.values['diff.centre.oil']);
  expect(synced.currentRevision.changeNote).toMatch(/Rear shock oil/);
  // The change not taken is still offered; the one taken is not.
  const upstream = await (await page.request.get(`${world.server.baseUrl}/api/setups/${forkId}/upstream`)).json();
  expect(upstream.rows.map((r: { key: string }) => r.key)).toEqual(['diff.centre.oil']);

  // Comment on that change, on the field it touched; the comment shows beside revision 2.
  await page.getByRole('link', { name: 'History of changes' }).click();
  await page.waitForURL((url) => url.pathname === `${forkPath}/history`);
  const revision2 = page.getByRole('article', { name: 'Revision 2' });
  await revision2.getByRole('button', { name: 'Comment on Rear shock oil' }).click();
  await revision2.getByLabel('Comment on revision 2').fill('Took the softer rear oil; the rear stays down over the braking bumps now.');
  await revision2.getByRole('button', { name: 'Post comment' }).click();
  const comments = revision2.getByRole('region', { name: 'Comments on revision 2' });
  await comments.getByText('Took the softer rear oil; the rear stays down over the braking bumps now.').waitFor();
  await comments.getByText(/Rear shock oil/).first().waitFor();
  await expectAccessible(page);

  expect(rafi.consoleErrors).toEqual([]);
  expect(await rafi.cspViolations()).toEqual([]);
  await rafi.context.close();
});

it('compares two revisions side by side on a wide screen, from a shareable address', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.wide);
  const { page } = w;
  const kits = (await (await page.request.get(`${world.server.baseUrl}/api/kits`)).json()).kits as Array<{ id: number; slug: string }>;
  const stoat = kits.find((k) => k.slug === 'ottervale-stoat-8e')!;
  const listed = (await (await page.request.get(`${world.server.baseUrl}/api/kits/${stoat.id}/setups`)).json()).setups as Array<{ id: number; title: string }>;
  const id = listed.find((s) => s.title === 'Hollow Pines — loose and dusty')!.id;
  await page.goto(`${world.server.baseUrl}/compare?a=${id}&ar=1&b=${id}&br=2`);
  await page.getByRole('table').first().waitFor();
  await page.getByText('Centre diff oil').first().waitFor();
  await expectAccessible(page);
  expect(w.consoleErrors).toEqual([]);
  await w.context.close();
});
