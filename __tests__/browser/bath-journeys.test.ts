// Baths as a recovery technician uses them, in Chromium against the real server and the seeded demo
// shop: open the demo fixer bath, upload a CSV of analyses with one bad row (reported clearly,
// nothing written), upload the valid rows, see the trend and the log take them in, and attach a
// PDF lab report, then read the fixer loading from the new latest analysis; at phone and wide
// sizes. Also a chemist creating a bath.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import type { Page } from 'playwright-core';

import { overflowsSideways, shoot, signedInPage, useChromium, VIEWPORTS, watchPage } from '@/__tests__/support/browser';

const BASE = process.env.LIGANDRY_BROWSER_URL as string;

jest.setTimeout(180_000);

const browser = useChromium();

const signedIn = (who: string, viewport: { width: number; height: number }) => signedInPage(browser(), BASE, who, viewport);

function tempFile(name: string, content: string | Buffer): string {
  const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'ligandry-bath-')), name);
  fs.writeFileSync(file, content);
  return file;
}

async function pick(page: Page, button: RegExp, file: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: button }).click();
  await (await chooser).setFiles(file);
}

describe.each(VIEWPORTS)('the recovery technician at $name size', (viewport) => {
  it('uploads analyses to a demo fixer bath, sees a bad row reported, the trend take the rest, and attaches a PDF', async () => {
    const { context, page } = await signedIn('technician', viewport);
    const seen = watchPage(page);
    await page.goto(`${BASE}/baths`, { waitUntil: 'networkidle' });
    await page.getByText('Fixer tank B, minilab', { exact: true }).first().waitFor();
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, `${viewport.name}-baths`);
    await page.getByText('Fixer tank B, minilab', { exact: true }).first().click();
    await page.waitForURL(/\/baths\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Fixer tank B, minilab' }).waitFor();
    const countText = await page.getByText(/\d+ in all/).first().innerText();
    const before = Number(/(\d+) in all/.exec(countText)?.[1]);

    // Dates a few days back, distinct per viewport so both runs add their own rows.
    const day = (n: number) => new Date(Date.now() - n * 86_400_000).toISOString().slice(0, 10);
    const offset = viewport.name === 'phone' ? 0 : 3;
    const csv = tempFile(
      'minilab-assays.csv',
      [
        'sampled_at,analyst,metal,metal_unit,free_ligand,ph,notes',
        `${day(9 + offset)},T. Okafor,3.9,g/L,121,4.8,weekly`,
        `${day(8 + offset)},T. Okafor,4.4,g/L,lots,4.9,`,
        `${day(7 + offset)},T. Okafor,5.6,g/L,112,5.0,near exhaustion`,
      ].join('\n'),
    );

    await page.getByRole('button', { name: 'Upload a CSV file' }).click();
    await pick(page, /^Choose a CSV file$/, csv);
    await page.getByText('minilab-assays.csv').first().waitFor();
    await page.getByRole('button', { name: 'Upload the analyses' }).click();
    await page.getByText(/Nothing was (written|imported)/).first().waitFor();
    const report = await page.locator('body').innerText();
    expect(report).toMatch(/"lots" is not a number/);
    expect(report).toMatch(/free_ligand/);
    await page.getByText(/"lots" is not a number/).first().scrollIntoViewIfNeeded();
    await shoot(page, `${viewport.name}-bath-csv-report`);
    await page.getByText(`${before} in all`, { exact: false }).first().waitFor();

    await page.getByRole('radio', { name: /valid rows/i }).click();
    await page.getByRole('button', { name: 'Upload the analyses' }).click();
    await page.getByText(`${before + 2} in all`, { exact: false }).first().waitFor();
    // The newest analysis (5.6 g/L, over the 5 g/L limit) is flagged in the log.
    await page.getByText(/5\.60 g\/L/).first().waitFor();
    await page.getByText('Trends', { exact: true }).first().scrollIntoViewIfNeeded();
    await shoot(page, `${viewport.name}-bath-trend-after-upload`);
    const chart = page.getByLabel(new RegExp(`Ag metal over ${before + 2} analyses`)).first();
    await chart.waitFor();

    const pdf = tempFile('minilab-assay.pdf', '%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n');
    await pick(page, /^Choose a PDF, PNG or JPEG$/, pdf);
    await page.getByLabel('Title').fill(`Outside lab assay (${viewport.name})`);
    await page.getByRole('button', { name: 'Upload the file' }).click();
    await page.getByRole('link', { name: `Download Outside lab assay (${viewport.name})` }).or(page.getByRole('button', { name: `Download Outside lab assay (${viewport.name})` })).first().waitFor();
    await page.getByText(`Outside lab assay (${viewport.name})`).first().scrollIntoViewIfNeeded();
    await shoot(page, `${viewport.name}-bath-attachment`);
    expect(await overflowsSideways(page)).toBe(false);

    // The file comes back as it went in, to anyone on the team.
    const bathId = page.url().split('/').pop() as string;
    const list = (await (await context.request.get(`${BASE}/api/baths/${bathId}/attachments`)).json()) as { id: string; title: string }[];
    const mine = list.find((a) => a.title === `Outside lab assay (${viewport.name})`);
    const download = await context.request.get(`${BASE}/api/baths/${bathId}/attachments/${mine?.id}`);
    expect((await download.body()).subarray(0, 8).toString('latin1')).toBe('%PDF-1.4');

    // Fixer loading from the bath's page: filled from the analysis just uploaded (5.6 g/L silver).
    await page.getByRole('link', { name: 'Fixer loading for Fixer tank B, minilab' }).first().click();
    await page.waitForURL(/\/calculate\/fixer-loading\?bath=/);
    await page.getByText(/Filled from Fixer tank B, minilab/).locator('visible=true').first().waitFor();
    await page.getByRole('button', { name: 'Calculate', exact: true }).locator('visible=true').last().click();
    const verdict = page.getByTestId('calculator-verdict').locator('visible=true').first();
    await verdict.waitFor();
    await verdict.scrollIntoViewIfNeeded();
    expect(await verdict.innerText()).toMatch(/%/);
    expect(await verdict.innerText()).not.toMatch(/NaN/);
    await shoot(page, `${viewport.name}-fixer-loading-after-upload`);
    expect(seen.errors.filter((e) => !/422/.test(e))).toEqual([]);
    await context.close();
  });
});

describe('a chemist', () => {
  it('creates a bath and lands on it, at phone size', async () => {
    const phone = VIEWPORTS[0] as (typeof VIEWPORTS)[number];
    const { context, page } = await signedIn('chemist', phone);
    await page.goto(`${BASE}/baths/new`, { waitUntil: 'networkidle' });
    await page.getByLabel('Name').first().fill('Silver strike, line 3');
    await page.getByRole('radio', { name: /Silver strike/ }).click();
    await page.getByLabel(/Tank volume/).first().fill('250');
    await shoot(page, 'phone-bath-form');
    await page.getByRole('button', { name: /^Save/ }).last().click();
    await page.waitForURL(/\/baths\/[0-9a-f-]{36}$/);
    await page.getByRole('heading', { name: 'Silver strike, line 3' }).waitFor();
    await context.close();
  });
});
