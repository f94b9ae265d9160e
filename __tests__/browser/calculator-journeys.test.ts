// The main job, in Chromium against the real server, the seeded library and the demo shop: the
// demo chemist opens the demo cyanide silver bath, reads its headroom and speciation, draws free
// cyanide against silver, saves the run, finds it in the list and opens its print view; the demo
// technician reads the fixer loading of the demo fixer bath. Phone and wide sizes.
import type { BrowserContext, Page } from 'playwright-core';

import { demoBathId, overflowsSideways, shoot, signedInPage, useChromium, VIEWPORTS, watchPage } from '@/__tests__/support/browser';

const BASE = process.env.LIGANDRY_BROWSER_URL as string;
const PHONE = VIEWPORTS[0] as (typeof VIEWPORTS)[number];
const WIDE = VIEWPORTS[VIEWPORTS.length - 1] as (typeof VIEWPORTS)[number];

jest.setTimeout(180_000);

const browser = useChromium();

const signedIn = (who: string, viewport: { width: number; height: number }) => signedInPage(browser(), BASE, who, viewport);

const bathId = (context: BrowserContext, name: string) => demoBathId(context, BASE, name);

/** Presses Calculate and waits for the verdict; returns its text. */
async function calculate(page: Page): Promise<string> {
  await page.getByRole('button', { name: 'Calculate', exact: true }).locator('visible=true').last().click();
  const verdict = page.getByTestId('calculator-verdict').locator('visible=true').first();
  await verdict.waitFor();
  return verdict.innerText();
}

describe.each([PHONE, WIDE])('the plating chemist at $name size', (viewport) => {
  it('reads headroom and speciation of the silver bath, draws free cyanide against silver, saves, finds and prints the run', async () => {
    const { context, page } = await signedIn('chemist', viewport);
    const seen = watchPage(page);
    const id = await bathId(context, 'Bright silver, line 2');

    await page.goto(`${BASE}/baths/${id}`, { waitUntil: 'networkidle' });
    await page.getByRole('link', { name: 'Headroom for Bright silver, line 2' }).click();
    await page.waitForURL(/\/calculate\/headroom\?bath=/);
    await page.getByText(/Filled from Bright silver, line 2/).locator('visible=true').first().waitFor();
    const headroom = await calculate(page);
    expect(headroom).toMatch(/AgCN|more|takes|solid/i);
    expect(headroom).not.toMatch(/NaN/);
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, `${viewport.name}-headroom-silver-bath`);

    await page.goto(`${BASE}/calculate/speciation?bath=${id}`, { waitUntil: 'networkidle' });
    await page.getByText(/Filled from Bright silver, line 2/).locator('visible=true').first().waitFor();
    const speciation = await calculate(page);
    expect(speciation).toMatch(/Ag\+ is held mostly as Ag\(CN\)/);
    await shoot(page, `${viewport.name}-speciation-silver-bath`);

    await page.goto(`${BASE}/calculate/curves?bath=${id}`, { waitUntil: 'networkidle' });
    await page.getByText(/Filled from Bright silver, line 2/).locator('visible=true').first().waitFor();
    const curve = await calculate(page);
    expect(curve).toMatch(/points/);
    await page.getByRole('img', { name: /CN-/ }).first().waitFor();
    await shoot(page, `${viewport.name}-curve-free-cyanide`);
    const title = `Free cyanide against silver (${viewport.name})`;
    await page.getByLabel('Title of the run').fill(title);
    await page.getByRole('button', { name: 'Save run' }).click();
    await page.waitForURL(/\/calculate\/runs\/[0-9a-f-]{36}$/);
    const runUrl = page.url();

    await page.goto(`${BASE}/calculate/runs`, { waitUntil: 'networkidle' });
    await page.getByText(title).first().waitFor();
    await shoot(page, `${viewport.name}-runs-list`);
    await page.getByText(title).first().click();
    await page.waitForURL(runUrl);
    await page.getByRole('button', { name: 'Print' }).click();
    await page.waitForURL(/\/print\/run\/[0-9a-f-]{36}$/);
    await page.getByText(title).first().waitFor();
    await page.getByText(/SDS, local codes and licensed practice/).first().waitFor();
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, `${viewport.name}-run-print`);
    expect(seen.errors).toEqual([]);
    await context.close();
  });
});

describe('the recovery technician', () => {
  it('reads the fixer loading of the demo fixer bath, at phone size', async () => {
    const { context, page } = await signedIn('technician', PHONE);
    const id = await bathId(context, 'Fixer tank A, radiography');
    await page.goto(`${BASE}/baths/${id}`, { waitUntil: 'networkidle' });
    await page.getByRole('link', { name: 'Fixer loading for Fixer tank A, radiography' }).click();
    await page.waitForURL(/\/calculate\/fixer-loading\?bath=/);
    await page.getByText(/Filled from Fixer tank A, radiography/).locator('visible=true').first().waitFor();
    const verdict = await calculate(page);
    expect(verdict).toMatch(/%/);
    expect(verdict).not.toMatch(/NaN/);
    await shoot(page, 'phone-fixer-loading');
    await context.close();
  });
});
