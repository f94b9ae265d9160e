// The constants library as its people use it, in Chromium against the real server and the seeded
// starting library: a chemist saves a run and proposes a revision, a reviewer approves it, the
// next calculation uses the new value while the earlier run still shows the old one. Also the
// library list at both sizes and a CSV import with a bad row.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import type { BrowserContext, Page } from 'playwright-core';

import { overflowsSideways, shoot, signedInPage, useChromium, VIEWPORTS, watchPage } from '@/__tests__/support/browser';

const BASE = process.env.LIGANDRY_BROWSER_URL as string;
const PHONE = VIEWPORTS[0] as (typeof VIEWPORTS)[number];
const WIDE = VIEWPORTS[VIEWPORTS.length - 1] as (typeof VIEWPORTS)[number];

jest.setTimeout(180_000);

const browser = useChromium();

const signedIn = (who: string, viewport: { width: number; height: number }) => signedInPage(browser(), BASE, who, viewport);

type Summary = { id: number; version: number; logValue: number; defines: string; reaction: string };

async function approvedDefining(context: BrowserContext, formula: string): Promise<Summary> {
  const res = await context.request.get(`${BASE}/api/constants?status=approved`);
  const hit = ((await res.json()) as Summary[]).find((c) => c.defines === formula);
  if (!hit) throw new Error(`no approved constant defines ${formula}`);
  return hit;
}

/** Fills the speciation form for silver chloride in ammonia at pH 10 and calculates. */
async function calculateSilverAmmine(page: Page): Promise<void> {
  await page.goto(`${BASE}/calculate/system`, { waitUntil: 'networkidle' });
  await page.getByRole('checkbox', { name: /\(Ag\+\)$/ }).click();
  await page.getByRole('checkbox', { name: /\(NH3\)$/ }).click();
  await page.getByRole('checkbox', { name: /\(Cl-\)$/ }).click();
  await page.getByLabel('Total Ag+ (mol/L)').fill('0.05');
  await page.getByLabel('Total NH3 (mol/L)').fill('1');
  await page.getByLabel('Total Cl- (mol/L)').fill('0.05');
  await page.getByLabel('pH (optional, measured)').fill('10');
  await page.getByRole('button', { name: 'Calculate', exact: true }).click();
  await page.getByRole('list', { name: 'Constants used' }).waitFor();
}

describe('a reviewed revision reaches the next calculation, and an earlier run keeps the old value', () => {
  it('runs from proposal to approval across a phone and a wide screen', async () => {
    const chemist = await signedIn('chemist', PHONE);
    const seen = watchPage(chemist.page);
    const v1 = await approvedDefining(chemist.context, 'Ag(NH3)2+');
    const revised = Math.round((v1.logValue + 0.15) * 100) / 100;

    // 1. The chemist calculates and saves a run with today's library.
    await calculateSilverAmmine(chemist.page);
    const usedBefore = chemist.page.getByRole('list', { name: 'Constants used' });
    await usedBefore.getByText(v1.reaction, { exact: true }).first().waitFor();
    await shoot(chemist.page, 'phone-speciation-before-revision');
    expect(await overflowsSideways(chemist.page)).toBe(false);
    await chemist.page.getByLabel('Title of the run').fill('Strike rinse check, before the revision');
    await chemist.page.getByRole('button', { name: 'Save run' }).click();
    await chemist.page.waitForURL(/\/calculate\/runs\/[0-9a-f-]{36}$/);
    const runUrl = chemist.page.url();
    await chemist.page.getByText('Strike rinse check, before the revision').first().waitFor();

    // 2. The chemist finds the constant in the library and proposes a revision.
    await chemist.page.goto(`${BASE}/library`, { waitUntil: 'networkidle' });
    await chemist.page.getByLabel('Search').fill('Ag(NH3)2+');
    await chemist.page.getByText(v1.reaction, { exact: true }).first().click();
    await chemist.page.waitForURL(new RegExp(`/library/constant/${v1.id}$`));
    await chemist.page.getByRole('button', { name: 'Propose a revision' }).click();
    await chemist.page.waitForURL(new RegExp(`/library/revise/${v1.id}$`));
    await chemist.page.getByLabel('Log value').fill(String(revised));
    await chemist.page.getByLabel('Source').fill('Shop re-measurement, Harbourside lab book 7, p. 12 (invented for this test)');
    await chemist.page.getByLabel('What changed and why').fill('Re-measured at 25 °C; the old value came from memory.');
    await shoot(chemist.page, 'phone-revision-form');
    await chemist.page.getByRole('button', { name: 'Send for review' }).click();
    await chemist.page.waitForURL(/\/library\/constant\/\d+$/);
    const draftId = Number(chemist.page.url().split('/').pop());
    expect(draftId).not.toBe(v1.id);
    await chemist.page.getByText('Draft, waiting for review', { exact: true }).first().waitFor();

    // 3. The reviewer, on a wide screen, approves it from the review queue.
    const reviewer = await signedIn('reviewer', WIDE);
    await reviewer.page.goto(`${BASE}/library/review`, { waitUntil: 'networkidle' });
    await reviewer.page.getByText(v1.reaction, { exact: true }).first().waitFor();
    await shoot(reviewer.page, 'wide-review-queue');
    await reviewer.page.goto(`${BASE}/library/constant/${draftId}`, { waitUntil: 'networkidle' });
    await reviewer.page.getByLabel('Note for the proposer').fill('Lab book entry checked; approved.');
    await reviewer.page.getByRole('button', { name: `Approve version ${v1.version + 1}` }).click();
    await reviewer.page.getByText('Approved', { exact: true }).first().waitFor();
    await shoot(reviewer.page, 'wide-revision-approved');
    expect((await approvedDefining(reviewer.context, 'Ag(NH3)2+')).id).toBe(draftId);

    // 4. The chemist's next calculation uses the new version.
    await calculateSilverAmmine(chemist.page);
    const usedAfter = chemist.page.getByRole('list', { name: 'Constants used' });
    await usedAfter.getByText(new RegExp(`v${v1.version + 1}\\b`)).first().waitFor();
    await usedAfter.scrollIntoViewIfNeeded();
    await shoot(chemist.page, 'phone-speciation-after-revision');

    // 5. The earlier run still shows the version it used, and what replaced it.
    await chemist.page.goto(runUrl, { waitUntil: 'networkidle' });
    await chemist.page.getByText(/since replaced by v\d+/).first().waitFor();
    const text = await chemist.page.locator('body').innerText();
    expect(text).toContain(`v${v1.version} (log β ${v1.logValue.toFixed(2)})`);
    expect(text).toMatch(new RegExp(`since replaced by v${v1.version + 1} \\(log β ${revised.toFixed(2)}\\)`));
    await chemist.page.getByText(/since replaced by v\d+/).first().scrollIntoViewIfNeeded();
    await shoot(chemist.page, 'phone-earlier-run-keeps-old-version');
    expect(seen.errors).toEqual([]);

    await reviewer.context.close();
    await chemist.context.close();
  });
});

describe.each(VIEWPORTS)('the library at $name size', (viewport) => {
  it('lists, filters and opens constants without sideways scrolling', async () => {
    const { context, page } = await signedIn('technician', viewport);
    const seen = watchPage(page);
    await page.goto(`${BASE}/library`, { waitUntil: 'networkidle' });
    await page.getByText(/\d+ constants/).first().waitFor();
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, `${viewport.name}-library`);
    // A technician neither proposes nor imports.
    expect(await page.getByRole('button', { name: 'Propose a constant' }).count()).toBe(0);
    await page.getByLabel('Search').fill('AgBr');
    await page.getByText('AgBr(s) = Ag+ + Br-', { exact: true }).first().waitFor();
    await page.getByText('AgBr(s) = Ag+ + Br-', { exact: true }).first().click();
    await page.waitForURL(/\/library\/constant\/\d+$/);
    await page.getByText(/from memory/).first().waitFor();
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, `${viewport.name}-constant-detail`);
    expect(seen.errors).toEqual([]);
    await context.close();
  });
});

describe('CSV import', () => {
  it('reports a bad row by row and column and writes nothing, at phone size', async () => {
    const { context, page } = await signedIn('chemist', PHONE);
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'ligandry-import-')), 'new-values.csv');
    fs.writeFileSync(file, ['kind,reaction,log_value,source', 'beta,Ag+ + 4 Br- = AgBr4-3,8.9,Shop notes (invented)', 'ksp,AgCl(s) = Ag+ + Cl-,lots,Shop notes (invented)'].join('\n'));
    await page.goto(`${BASE}/library/import`, { waitUntil: 'networkidle' });
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: /Choose a CSV file/i }).click();
    await (await chooser).setFiles(file);
    await page.getByText('new-values.csv').first().waitFor();
    await page.getByRole('button', { name: /^Import/ }).last().click();
    await page.getByText('Nothing was written', { exact: false }).first().waitFor();
    const body = await page.locator('body').innerText();
    expect(body).toMatch(/log_value/);
    expect(body).toMatch(/"lots" is not a number/);
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, 'phone-import-report');
    await context.close();
  });
});
