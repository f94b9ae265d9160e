// The safety desk in Chromium against the real server and the demo shop: the demo chemist works
// out the demo silver strike at pH 10, sees the hazard banner, saves the run and finds it held for
// the desk; the demo safety officer opens it from the desk and signs it off with a condition; the
// chemist then sees the condition on the run and releases it. Phone and wide sizes.
import type { BrowserContext, Page } from 'playwright-core';

import { demoBathId, overflowsSideways, shoot, signedInPage, useChromium, VIEWPORTS, watchPage } from '@/__tests__/support/browser';

const BASE = process.env.LIGANDRY_BROWSER_URL as string;

jest.setTimeout(180_000);

const browser = useChromium();

const signedIn = (who: string, viewport: { width: number; height: number }) => signedInPage(browser(), BASE, who, viewport);

const bathId = (context: BrowserContext, name: string) => demoBathId(context, BASE, name);

const visible = (page: Page, testId: string) => page.getByTestId(testId).locator('visible=true').first();

describe.each(VIEWPORTS)('a cyanide strike at pH 10, chemist then safety officer, at $name size', (viewport) => {
  it('shows the caution, reaches the desk, is signed off with a condition, and the chemist sees it', async () => {
    const title = `Strike at pH 10 (${viewport.name})`;
    const condition = `Extraction on and an HCN monitor in the room (${viewport.name}).`;

    // The chemist: the strike bath at pH 10 through the speciation calculator.
    const chem = await signedIn('chemist', viewport);
    const seenChem = watchPage(chem.page);
    const id = await bathId(chem.context, 'Silver strike, line 2');
    await chem.page.goto(`${BASE}/calculate/speciation?bath=${id}`, { waitUntil: 'networkidle' });
    await chem.page.getByText(/Filled from Silver strike, line 2/).locator('visible=true').first().waitFor();
    await chem.page.getByLabel('pH (optional, measured)').locator('visible=true').first().fill('10');
    await chem.page.getByRole('button', { name: 'Calculate', exact: true }).locator('visible=true').last().click();
    await visible(chem.page, 'calculator-verdict').waitFor();
    const banner = visible(chem.page, 'hazard-banner');
    await banner.waitFor();
    expect(await banner.innerText()).toMatch(/Danger/);
    await visible(chem.page, 'hazard-cyanide_low_ph').waitFor();
    await visible(chem.page, 'flag-explained').waitFor();
    expect(await overflowsSideways(chem.page)).toBe(false);
    await banner.scrollIntoViewIfNeeded();
    await shoot(chem.page, `${viewport.name}-safety-banner-on-result`);

    await chem.page.getByLabel('Title of the run').locator('visible=true').first().fill(title);
    await chem.page.getByRole('button', { name: 'Save run' }).locator('visible=true').first().click();
    await chem.page.waitForURL(/\/calculate\/runs\/[0-9a-f-]{36}$/);
    const runUrl = chem.page.url();
    await visible(chem.page, 'run-review-status').waitFor();
    expect(await visible(chem.page, 'run-review-status').innerText()).toMatch(/Waiting for the safety desk/);
    await visible(chem.page, 'release-held').waitFor();
    expect(await chem.page.getByTestId('release-run').locator('visible=true').first().isDisabled()).toBe(true);
    await visible(chem.page, 'run-safety').scrollIntoViewIfNeeded();
    await shoot(chem.page, `${viewport.name}-safety-run-held`);
    expect(seenChem.errors).toEqual([]);

    // The safety officer: the desk, the evidence, the sign-off with a condition.
    const officer = await signedIn('safety', viewport);
    const seenOfficer = watchPage(officer.page);
    await officer.page.goto(`${BASE}/safety`, { waitUntil: 'networkidle' });
    const item = officer.page.getByRole('link', { name: new RegExp(title.replace(/[()]/g, '\\$&')) }).locator('visible=true').first();
    await item.waitFor();
    expect(await overflowsSideways(officer.page)).toBe(false);
    await shoot(officer.page, `${viewport.name}-safety-desk-queue`);
    await item.click();
    await officer.page.waitForURL(/\/safety\/review\/[0-9a-f-]{36}$/);
    await visible(officer.page, 'hazard-cyanide_low_ph').waitFor();
    expect(await visible(officer.page, 'hazard-banner').innerText()).toMatch(/pH/);
    await officer.page.getByLabel('Conditions').locator('visible=true').first().fill(condition);
    await visible(officer.page, 'hazard-banner').scrollIntoViewIfNeeded();
    await shoot(officer.page, `${viewport.name}-safety-review-evidence`);
    await officer.page.getByTestId('sign-off').locator('visible=true').first().click();
    await visible(officer.page, 'review-done').waitFor();
    expect(await visible(officer.page, 'review-conditions').innerText()).toContain(condition);
    await shoot(officer.page, `${viewport.name}-safety-review-signed-off`);
    expect(seenOfficer.errors).toEqual([]);
    await officer.context.close();

    // The chemist again: the condition on the run, then the release.
    await chem.page.goto(runUrl, { waitUntil: 'networkidle' });
    await visible(chem.page, 'run-review-conditions').waitFor();
    expect(await visible(chem.page, 'run-review-conditions').innerText()).toContain(condition);
    await chem.page.getByTestId('release-run').locator('visible=true').first().click();
    await visible(chem.page, 'run-released').waitFor();
    await visible(chem.page, 'run-safety').scrollIntoViewIfNeeded();
    await shoot(chem.page, `${viewport.name}-safety-run-released`);
    await chem.context.close();
  });
});
