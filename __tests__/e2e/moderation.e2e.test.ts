import type { APIRequestContext, Page } from 'playwright-core';
import { expectAccessible, openWatchedPage, useServerAndBrowser, VIEWPORTS, type WatchedPage } from '../support/browser';

jest.setTimeout(180_000);

const world = useServerAndBrowser();

// The seeded demo world (server/seeders/demoModeration.ts and README's demo accounts).
const SPAMMER = { login: 'bargain-bushings-4u', password: 'seventy-percent-off-9' };
const RACER = { login: 'juno_braithwick', password: 'hollow-pines-laps-2' };
const MODERATOR = { login: 'oskar-velde', password: 'saltmarsh-marshal-4' };
const ADMIN = { login: 'tamsin_q', password: 'kiln-timing-desk-7' };

const escapeRegExp = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/**
 * A spam setup the racer can see and has not reported yet. The seed hides one automatically and
 * has the racer's open reports on others, so the target is picked from what search shows her.
 */
async function pickSpamSetup(request: APIRequestContext): Promise<{ id: number; title: string }> {
  const search = await (await request.get(`${world.server.baseUrl}/api/search?q=${encodeURIComponent(SPAMMER.login)}`)).json();
  const mine = await (await request.get(`${world.server.baseUrl}/api/reports/mine`)).json();
  const reported = new Set(
    (mine.reports as Array<{ targetType: string; targetId: number }>).filter((r) => r.targetType === 'setup').map((r) => r.targetId),
  );
  const target = (search.setups as Array<{ id: number; title: string; ownerHandle: string }>).find(
    (s) => s.ownerHandle === SPAMMER.login && !reported.has(s.id),
  );
  if (!target) throw new Error('the demo seed has no public spam setup left for the racer to report');
  return { id: target.id, title: target.title };
}

/** The review queue showing appeals only, with the appeal about the setup in view. */
async function openAppeal(page: Page, title: string) {
  await page.goto(`${world.server.baseUrl}/moderation`);
  await page.getByRole('radiogroup', { name: 'Show' }).getByRole('radio', { name: 'Appeals' }).click();
  const row = page.getByRole('article', { name: `Appeal about Setup: ${title}`, exact: true });
  await row.waitFor();
  return row;
}

it('a racer reports a spam setup, a moderator hides it from the queue, the spammer appeals and an admin decides (phone)', async () => {
  const opened: WatchedPage[] = [];
  const open = async () => {
    const w = await openWatchedPage(world.browser, VIEWPORTS.phone);
    opened.push(w);
    return w;
  };

  // The racer finds the spam through Discover's search and reports it.
  const racer = await open();
  await world.signIn(racer.page.request, RACER.login, RACER.password);
  const target = await pickSpamSetup(racer.page.request);
  const juno = racer.page;
  await juno.goto(`${world.server.baseUrl}/`);
  await juno.getByRole('textbox', { name: 'Search setups' }).fill(SPAMMER.login);
  await juno.getByRole('link', { name: new RegExp(`^${escapeRegExp(target.title)}\\.`) }).first().click();
  await juno.waitForURL((url) => url.pathname === `/setups/${target.id}`);
  await juno.getByRole('button', { name: 'Report this setup' }).click();
  const dialog = juno.getByRole('dialog', { name: 'Report this setup' }).last();
  await dialog.getByRole('radio', { name: /^Spam or advertising/ }).click();
  await dialog.getByRole('textbox', { name: 'Note for the moderators (optional)' }).fill('Shop links and a discount code, nothing about a car.');
  await dialog.getByRole('button', { name: 'Send report' }).click();
  await dialog.getByText('Thanks — moderators will look at it; follow it in My reports.').waitFor();
  await dialog.getByRole('button', { name: 'Close' }).click();

  // The moderator finds it in the queue and hides it with a reason of their own.
  const hideReason = 'Advertising for a parts shop with discount codes; setups here are for tuning.';
  const moderator = await open();
  await world.signIn(moderator.page.request, MODERATOR.login, MODERATOR.password);
  const oskar = moderator.page;
  await oskar.goto(`${world.server.baseUrl}/profile`);
  await oskar.getByRole('navigation', { name: 'Your account' }).getByRole('link', { name: 'Review queue' }).click();
  await oskar.waitForURL((url) => url.pathname === '/moderation');
  const row = oskar.getByRole('article', { name: `Setup: ${target.title}`, exact: true });
  await row.getByText(/Spam or advertising ×\d+/).waitFor();
  await expectAccessible(oskar);
  await row.getByRole('button', { name: `Hide as spam: ${target.title}` }).click();
  const reason = row.getByRole('textbox', { name: 'Reason (the author sees it)' });
  expect(await reason.inputValue()).toBe('Spam or advertising.');
  await reason.fill(hideReason);
  await row.getByRole('button', { name: 'Hide it' }).click();
  await oskar
    .getByRole('region', { name: 'Done just now' })
    .getByText(new RegExp(`Hidden: setup “${escapeRegExp(target.title)}” — \\d+ reports? resolved\\.`))
    .waitFor();
  await row.waitFor({ state: 'detached' });

  // The racer sees the outcome in plain words, without the moderator's name, and the setup is gone for her.
  await juno.goto(`${world.server.baseUrl}/profile`);
  await juno.getByRole('navigation', { name: 'Your account' }).getByRole('link', { name: 'My reports' }).click();
  await juno.waitForURL((url) => url.pathname === '/reports');
  const report = juno.getByRole('list', { name: 'Your reports' }).getByRole('listitem').filter({ hasText: target.title });
  await report.getByText('The moderators hid it.').waitFor();
  await report.getByText('Resolved', { exact: true }).waitFor();
  // Hidden from her, so no longer a link to open.
  expect(await report.getByRole('link').count()).toBe(0);
  const reportsText = await juno.getByRole('main').innerText();
  expect(reportsText).not.toMatch(/oskar/i);
  await expectAccessible(juno);
  await juno.goto(`${world.server.baseUrl}/setups/${target.id}`);
  await juno.getByText('No setup at this address').waitFor();
  expect(await juno.getByText(target.title).count()).toBe(0);

  // The spammer sees the banner on the setup and appeals from "Moderation of my posts".
  const appealText = 'These are real parts for this buggy; I will take the shop links out.';
  const spammer = await open();
  await world.signIn(spammer.page.request, SPAMMER.login, SPAMMER.password);
  const shop = spammer.page;
  await shop.goto(`${world.server.baseUrl}/setups/${target.id}`);
  const banner = shop.getByRole('region', { name: 'Hidden by moderators' });
  await banner.getByText(hideReason).waitFor();
  await banner.getByText('Only you and the moderators can see this setup.', { exact: false }).waitFor();
  await banner.getByRole('link', { name: 'Appeal' }).click();
  await shop.waitForURL((url) => url.pathname === '/moderation/mine');
  await shop.getByRole('heading', { name: 'Moderation of my posts' }).waitFor();
  const action = shop.getByRole('list', { name: 'Moderation of your posts' }).getByRole('listitem').filter({ hasText: target.title }).filter({ hasText: hideReason });
  await action.getByText('Hidden by moderators', { exact: true }).waitFor();
  await action.getByRole('textbox', { name: 'Your appeal' }).fill(appealText);
  await action.getByRole('button', { name: 'Send appeal' }).click();
  await action.getByText('Appeal waiting').waitFor();

  // The moderator who hid it sees the appeal but may not decide it.
  const ownAppeal = await openAppeal(oskar, target.title);
  await ownAppeal.getByText(`“${appealText}”`).waitFor();
  await ownAppeal.getByRole('note').getByText('You took the action under appeal, so another moderator (or an admin) must decide it.').waitFor();
  await ownAppeal.getByRole('button', { name: 'Decide the appeal', disabled: true }).waitFor();

  // The admin decides it: the hide stands.
  const decisionReason = 'The notes are still an advert with shop links; post the sheet without them.';
  const admin = await open();
  await world.signIn(admin.page.request, ADMIN.login, ADMIN.password);
  const tamsin = admin.page;
  const appeal = await openAppeal(tamsin, target.title);
  // An admin may decide any appeal: no "another moderator must decide" note, the button is live.
  expect(await appeal.getByRole('note').count()).toBe(0);
  expect(await appeal.getByRole('button', { name: 'Decide the appeal', disabled: false }).count()).toBe(1);
  await appeal.getByRole('radio', { name: 'Uphold — the action stands' }).click();
  await appeal.getByRole('textbox', { name: 'Reason for the decision (the author sees it)' }).fill(decisionReason);
  await appeal.getByRole('button', { name: 'Decide the appeal' }).click();
  await tamsin.getByRole('region', { name: 'Done just now' }).getByText(`Appeal upheld: setup “${target.title}”.`).waitFor();
  await appeal.waitFor({ state: 'detached' });

  // The spammer is told the decision: on "Moderation of my posts" and in the notifications.
  await shop.reload();
  await action.getByText('Appeal turned down').waitFor();
  await action.getByText(`The decision stands`, { exact: false }).waitFor();
  await action.getByText(decisionReason, { exact: false }).waitFor();
  await shop.goto(`${world.server.baseUrl}/notifications`);
  await shop.getByText(`Your appeal was reviewed and the decision stands. Reason: ${decisionReason}`).waitFor();

  for (const w of opened) {
    expect(w.consoleErrors).toEqual([]);
    expect(await w.cspViolations()).toEqual([]);
    await w.context.close();
  }
});
