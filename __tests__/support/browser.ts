// Debian's Chromium driven by playwright-core, with the flags this machine needs; screenshots kept as artifacts.
import fs from 'node:fs';
import path from 'node:path';

import { chromium, type Browser, type Page } from 'playwright-core';

/** Where screenshots go (git-ignored). */
export const ARTIFACTS = path.resolve(__dirname, '../../test-artifacts/screenshots');

/** The two sizes every screen is checked at, in CSS pixels. */
export const VIEWPORTS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1280, height: 800 },
] as const;

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
