import { loadConfig } from '../../server/config';
import { createUnsubscribeToken } from '../../server/services/unsubscribe';
import { openWatchedPage, seriousAccessibilityViolations, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(180_000);

const world = useServerAndBrowser();

/** The server signs links with the secret its own environment derives (test mode, no SESSION_SECRET set here). */
const unsubscribeSecret = () => loadConfig({ ...process.env, NODE_ENV: 'test' }).notificationMail.unsubscribeSecret;

it('changes notification e-mail settings, then stops one kind from an e-mail link without signing in (phone)', async () => {
  const w = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const { page } = w;
  await page.goto(`${world.server.baseUrl}/sign-in`);
  await page.getByLabel('E-mail or handle').fill('pell-strand');
  await page.getByLabel('Password', { exact: true }).fill('brackwater-ruts-9');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-in');

  await page.goto(`${world.server.baseUrl}/settings`);
  await page.getByRole('heading', { name: 'Notification e-mail' }).waitFor();
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
  await page.getByRole('checkbox', { name: 'Forks of my setups' }).click();
  await page.getByText('E-mail settings saved.').waitFor();
  // The choice shows at once; the test reads the server only after the save has been answered.
  const digestSaved = page.waitForResponse(
    (res) => res.url().endsWith('/api/me/email-preferences') && res.request().method() === 'PUT' && res.ok(),
  );
  await page.getByRole('radio', { name: 'One digest e-mail a day' }).click();
  await page.getByRole('radio', { name: 'One digest e-mail a day', checked: true }).waitFor();
  await digestSaved;
  const saved = await (await page.request.get(`${world.server.baseUrl}/api/me/email-preferences`)).json();
  expect(saved.preferences).toMatchObject({ enabled: true, delivery: 'daily-digest', types: { 'setup-forked': false, 'comment-on-setup': true } });
  const me = await (await page.request.get(`${world.server.baseUrl}/api/me`)).json();

  // The link from a mail, opened where nobody is signed in.
  const anonymous = await openWatchedPage(world.browser, VIEWPORTS.phone);
  const token = createUnsubscribeToken(unsubscribeSecret(), me.user.id, 'comment-on-setup');
  await anonymous.page.goto(`${world.server.baseUrl}/unsubscribe?token=${token}`);
  await anonymous.page.getByRole('heading', { name: 'Stop e-mail about comments on my setups?' }).waitFor();
  expect(await seriousAccessibilityViolations(anonymous.page)).toEqual([]);
  await anonymous.page.getByRole('button', { name: 'Stop e-mail about comments on my setups' }).click();
  await anonymous.page.getByText(/You will get no more e-mail about: comments on my setups/).waitFor();
  expect(await seriousAccessibilityViolations(anonymous.page)).toEqual([]);
  const after = await (await page.request.get(`${world.server.baseUrl}/api/me/email-preferences`)).json();
  expect(after.preferences.types['comment-on-setup']).toBe(false);

  // A changed link is refused in words, and nothing changes.
  await anonymous.page.goto(`${world.server.baseUrl}/unsubscribe?token=${me.user.id}.all.${token.split('.')[2]}`);
  await anonymous.page.getByText('That link did not work').waitFor();
  expect(await seriousAccessibilityViolations(anonymous.page)).toEqual([]);
  expect((await (await page.request.get(`${world.server.baseUrl}/api/me/email-preferences`)).json()).preferences.enabled).toBe(true);

  for (const watched of [w, anonymous]) {
    expect(watched.consoleErrors).toEqual([]);
    expect(await watched.cspViolations()).toEqual([]);
    await watched.context.close();
  }
});
