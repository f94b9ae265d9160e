import { shoot, signInByApi, useChromium, VIEWPORTS, watchPage } from '@/__tests__/support/browser';

const BASE = process.env.LIGANDRY_BROWSER_URL as string;
const TABS = [
  { label: 'Baths', path: '/baths' },
  { label: 'Calculate', path: '/calculate' },
  { label: 'Library', path: '/library' },
  { label: 'Safety', path: '/safety' },
  { label: 'Account', path: '/account' },
];

jest.setTimeout(120_000);

const browser = useChromium();

describe.each(VIEWPORTS)('app shell at $name size ($width x $height)', (viewport) => {
  it('renders every tab with the bundled font, no console errors and no outside requests', async () => {
    const context = await browser().newContext({ viewport: { width: viewport.width, height: viewport.height } });
    await signInByApi(context, BASE, 'chemist@ligandry.test');
    const page = await context.newPage();
    const seen = watchPage(page);

    await page.goto(`${BASE}/`, { waitUntil: 'networkidle' });
    await page.waitForURL(`${BASE}/baths`);
    const tabs = page.getByRole('tab');
    await tabs.first().waitFor();
    expect(await tabs.count()).toBe(TABS.length);

    // The navigation sits at the bottom on a phone and as a rail on the left when wide.
    const box = await page.getByRole('tablist').boundingBox();
    expect(box).not.toBeNull();
    if (viewport.name === 'phone') {
      expect(box!.y + box!.height).toBeGreaterThan(viewport.height - 4);
      expect(box!.width).toBeGreaterThan(viewport.width - 4);
    } else {
      expect(box!.x + box!.width).toBeLessThan(320);
      expect(box!.height).toBeGreaterThan(box!.width);
    }

    for (const tab of TABS) {
      await page.getByRole('tab', { name: tab.label }).click();
      await page.waitForURL(`${BASE}${tab.path}`);
      await expect(page.getByRole('tab', { name: tab.label }).getAttribute('aria-selected')).resolves.toBe('true');
      await page.waitForLoadState('networkidle');
      await shoot(page, `${viewport.name}-light${tab.path.replace('/', '-')}`);
    }

    // Source Sans 3 is loaded from the app's own bundle and applied to text.
    // NOTE: page code is passed as strings: Babel's helpers in transpiled functions do not exist in the page.
    const fonts = (await page.evaluate(
      `document.fonts.ready.then(() => Array.from(document.fonts).filter((f) => f.status === 'loaded').map((f) => f.family.replace(/"/g, '')))`,
    )) as string[];
    expect(fonts).toEqual(expect.arrayContaining(['SourceSans3_400Regular', 'SourceSans3_600SemiBold']));
    // Every leaf element that shows text uses a Source Sans 3 face.
    const families = (await page.evaluate(`Array.from(document.querySelectorAll('#root *'))
      .filter((e) => e.children.length === 0 && (e.textContent || '').trim().length > 2)
      .map((e) => getComputedStyle(e).fontFamily)`)) as string[];
    expect(families.length).toBeGreaterThan(5);
    expect(families.filter((f) => !/SourceSans3/.test(f))).toEqual([]);

    expect(seen.errors).toEqual([]);
    const outside = seen.requests.filter((u) => !u.startsWith(BASE) && !/^(data|blob):/.test(u));
    expect(outside).toEqual([]);
    await context.close();
  });

  it('moves between sections by keyboard alone, and each screen has one h1 naming it', async () => {
    const context = await browser().newContext({ viewport: { width: viewport.width, height: viewport.height } });
    await signInByApi(context, BASE, 'chemist@ligandry.test');
    const page = await context.newPage();
    await page.goto(`${BASE}/baths`, { waitUntil: 'networkidle' });
    await page.getByRole('tab', { name: 'Calculate' }).focus();
    await page.keyboard.press('Enter');
    await page.waitForURL(`${BASE}/calculate`);
    await expect(page.title()).resolves.toMatch(/^Calculate/);
    const visibleH1 = (await page.evaluate(
      `Array.from(document.querySelectorAll('h1')).filter((h) => h.offsetParent !== null).map((h) => h.textContent)`,
    )) as string[];
    expect(visibleH1).toEqual(['Calculate']);
    await expect(page.getByRole('heading', { level: 2, name: 'Headroom' }).isVisible()).resolves.toBe(true);
    await context.close();
  });

  it('follows the dark colour scheme', async () => {
    const context = await browser().newContext({
      viewport: { width: viewport.width, height: viewport.height },
      colorScheme: 'dark',
    });
    await signInByApi(context, BASE, 'chemist@ligandry.test');
    const page = await context.newPage();
    await page.goto(`${BASE}/safety`, { waitUntil: 'networkidle' });
    await page.getByRole('tab').first().waitFor();
    // The first element under #root with an opaque background is the shell's own.
    const background = (await page.evaluate(`(() => {
      const all = Array.from(document.querySelectorAll('#root *'));
      const el = all.find((e) => !/rgba\\(0, 0, 0, 0\\)|transparent/.test(getComputedStyle(e).backgroundColor));
      return el ? getComputedStyle(el).backgroundColor : getComputedStyle(document.body).backgroundColor;
    })()`)) as string;
    const [r, g, b] = (background.match(/\d+/g) ?? ['255', '255', '255']).map(Number) as [number, number, number];
    expect(0.2126 * r + 0.7152 * g + 0.0722 * b).toBeLessThan(80);
    await shoot(page, `${viewport.name}-dark-safety`);
    await context.close();
  });
});
