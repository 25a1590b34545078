import { openWatchedPage, seriousAccessibilityViolations, useServerAndBrowser, VIEWPORTS } from '../support/browser';

jest.setTimeout(120_000);

const DESTINATIONS = [
  { label: 'Discover', path: '/', heading: 'Discover' },
  { label: 'Garage', path: '/garage', heading: 'Garage' },
  { label: 'Activity', path: '/activity', heading: 'Activity' },
  { label: 'Profile', path: '/profile', heading: 'Profile' },
];

const world = useServerAndBrowser();

describe.each(Object.entries(VIEWPORTS))('app shell at %s size', (size, viewport) => {
  it('renders Discover in the shipped font with the server reachable and the demo kits listed', async () => {
    const w = await openWatchedPage(world.browser, viewport);
    await w.page.goto(world.server.baseUrl + '/');
    await w.page.getByText('Server and database reachable').waitFor();
    await w.page.getByText('Ottervale Kitworks Stoat 8N').waitFor();
    const font = await w.page.getByRole('heading', { name: 'Discover', level: 1 }).evaluate((el) => getComputedStyle(el).fontFamily);
    expect(font).toContain('AtkinsonHyperlegible_700Bold');
    const loaded = await w.page.evaluate(async () => {
      await document.fonts.ready;
      return document.fonts.check('16px AtkinsonHyperlegible_400Regular') && document.fonts.check('16px AtkinsonHyperlegible_700Bold');
    });
    expect(loaded).toBe(true);
    expect(w.consoleErrors).toEqual([]);
    expect(await w.cspViolations()).toEqual([]);
    await w.context.close();
  });

  it('navigates every destination from the tab bar or rail, each screen clean under axe', async () => {
    const w = await openWatchedPage(world.browser, viewport);
    await w.page.goto(world.server.baseUrl + '/');
    await w.page.getByText('Server and database reachable').waitFor();
    const nav = w.page.getByRole('navigation', { name: 'Main' });
    for (const d of DESTINATIONS) {
      await nav.getByRole('link', { name: d.label }).click();
      await w.page.waitForURL((url) => url.pathname === d.path);
      await w.page.getByRole('heading', { name: d.heading, level: 1 }).waitFor();
      expect(await nav.getByRole('link', { name: d.label }).getAttribute('aria-current')).toBe('page');
      const box = await nav.getByRole('link', { name: d.label }).boundingBox();
      expect(box && box.height >= 44 && box.width >= 44).toBe(true);
      expect(await seriousAccessibilityViolations(w.page)).toEqual([]);
    }
    expect(w.consoleErrors).toEqual([]);
    expect(await w.cspViolations()).toEqual([]);
    await w.context.close();
  });

  it('puts the navigation at the bottom on phones and in a side rail on wide screens', async () => {
    const w = await openWatchedPage(world.browser, viewport);
    await w.page.goto(world.server.baseUrl + '/garage');
    const box = await w.page.getByRole('navigation', { name: 'Main' }).boundingBox();
    expect(box).not.toBeNull();
    if (size === 'phone') {
      expect(box!.y + box!.height).toBeGreaterThan(viewport.height - 2);
      expect(box!.width).toBeGreaterThan(viewport.width - 2);
    } else {
      expect(box!.x).toBeLessThan(2);
      expect(box!.height).toBeGreaterThan(viewport.height - 2);
      expect(box!.width).toBeLessThan(300);
    }
    await w.context.close();
  });

  it('shows a not-found screen for an unknown address, and the API still answers JSON 404s', async () => {
    const w = await openWatchedPage(world.browser, viewport);
    await w.page.goto(world.server.baseUrl + '/no/such/page');
    await w.page.getByRole('heading', { name: 'Nothing here' }).waitFor();
    expect(await seriousAccessibilityViolations(w.page)).toEqual([]);
    const api = await w.page.request.get(world.server.baseUrl + '/api/no/such/route');
    expect(api.status()).toBe(404);
    expect(await api.json()).toMatchObject({ error: { code: 'not_found' } });
    await w.context.close();
  });
});
