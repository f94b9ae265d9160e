// Debian's Chromium driven by playwright-core, with the flags this machine needs; screenshots kept as artifacts.
import fs from 'node:fs';
import path from 'node:path';

import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';

/** Where screenshots go (git-ignored). */
export const ARTIFACTS = path.resolve(__dirname, '../../test-artifacts/screenshots');

/** The two sizes every screen is checked at, in CSS pixels. */
export const VIEWPORTS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
] as const;

/**
 * One Chromium for a test file: launched before its tests and closed after them; call at the top
 * level of the file and use the returned getter inside tests.
 */
export function useChromium(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await launchChromium();
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('Chromium is not running: useChromium() must be called at the top level of the test file.');
    return browser;
  };
}

/** Launches headless Chromium from /usr/bin/chromium (never a downloaded browser). */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** Collects console errors, page errors and every requested URL of a page. */
export function watchPage(page: Page): { errors: string[]; requests: string[] } {
  const seen = { errors: [] as string[], requests: [] as string[] };
  page.on('console', (msg) => {
    if (msg.type() === 'error') seen.errors.push(msg.text());
  });
  page.on('pageerror', (err) => seen.errors.push(err.message));
  page.on('request', (req) => seen.requests.push(req.url()));
  return seen;
}

/** Saves a full-page screenshot as test-artifacts/screenshots/<name>.png. */
export async function shoot(page: Page, name: string): Promise<void> {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true });
}

/** The demo password seeded by the server (demo accounts only). */
export const DEMO_PASSWORD = 'ligandry-demo';

/** Signs the browser context in through the API (the session cookie lands in the context). */
export async function signInByApi(context: BrowserContext, base: string, email: string, password = DEMO_PASSWORD): Promise<void> {
  const res = await context.request.post(`${base}/api/auth/sign-in`, { data: { email, password }, headers: { Origin: base } });
  if (res.status() !== 200) throw new Error(`sign-in of ${email} answered ${res.status()}: ${await res.text()}`);
}

/** A new browser context at a viewport, signed in as the demo account `<who>@ligandry.test`, and its first page. */
export async function signedInPage(browser: Browser, base: string, who: string, viewport: { width: number; height: number }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: { width: viewport.width, height: viewport.height } });
  await signInByApi(context, base, `${who}@ligandry.test`);
  return { context, page: await context.newPage() };
}

/** The id of the demo bath with this name (as the signed-in context sees the bath list). */
export async function demoBathId(context: BrowserContext, base: string, name: string): Promise<string> {
  const list = (await (await context.request.get(`${base}/api/baths`)).json()) as { id: string; name: string }[];
  const hit = list.find((b) => b.name === name);
  if (!hit) throw new Error(`no demo bath ${name}`);
  return hit.id;
}

/** Whether the page is wider than its viewport (something sticks out sideways). */
export async function overflowsSideways(page: Page): Promise<boolean> {
  return (await page.evaluate('document.documentElement.scrollWidth > window.innerWidth + 1')) as boolean;
}
