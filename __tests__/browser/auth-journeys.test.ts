// Sign-in, invitations and password reset as people use them, in Chromium at phone and wide
// sizes, against the real server and its local mail server (read through the outbox).
import type { BrowserContext, Page } from 'playwright-core';

import { overflowsSideways, shoot, signInByApi, useChromium, VIEWPORTS, watchPage } from '@/__tests__/support/browser';
import { linkPath } from '@/__tests__/support/mail-links';

const BASE = process.env.LIGANDRY_BROWSER_URL as string;

jest.setTimeout(120_000);

const browser = useChromium();

async function newPage(viewport: { width: number; height: number }): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser().newContext({ viewport: { width: viewport.width, height: viewport.height } });
  return { context, page: await context.newPage() };
}

/** The newest outbox message to `to` (read as the demo admin), polling until it arrives. */
async function mailTo(admin: BrowserContext, to: string, subject: RegExp): Promise<string> {
  for (let i = 0; i < 100; i++) {
    const res = await admin.request.get(`${BASE}/api/dev/outbox`);
    const messages = (await res.json()) as { to: string[]; subject: string; text: string }[];
    const hit = messages.find((m) => m.to.includes(to) && subject.test(m.subject));
    if (hit) return hit.text;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to}`);
}

describe.each(VIEWPORTS)('signing in at $name size', (viewport) => {
  it('sends a signed-out visitor to sign in, then back where they were going; signs out', async () => {
    const { context, page } = await newPage(viewport);
    const seen = watchPage(page);
    await page.goto(`${BASE}/library`, { waitUntil: 'networkidle' });
    await page.waitForURL(/\/sign-in\?next=/);
    await shoot(page, `${viewport.name}-sign-in`);

    await page.getByLabel('E-mail').fill('chemist@ligandry.test');
    await page.getByLabel('Password').fill('not the password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('E-mail or password is wrong.').waitFor();
    await shoot(page, `${viewport.name}-sign-in-wrong`);

    await page.getByLabel('Password').fill('ligandry-demo');
    await page.getByLabel('Password').press('Enter');
    await page.waitForURL(`${BASE}/library`);
    await page.getByRole('tab', { name: 'Account' }).click();
    await page.waitForURL(`${BASE}/account`);
    await page.getByText('chemist@ligandry.test').first().waitFor();
    await shoot(page, `${viewport.name}-account-chemist`);
    // A chemist sees no administration.
    expect(await page.getByText('Team', { exact: true }).count()).toBe(0);

    await page.getByRole('button', { name: 'Sign out', exact: true }).click();
    await page.waitForURL(/\/sign-in/);
    await page.goto(`${BASE}/account`, { waitUntil: 'networkidle' });
    await page.waitForURL(/\/sign-in/);
    expect(seen.errors.filter((e) => !/401|Password field is not contained in a form/.test(e))).toEqual([]);
    await context.close();
  });

  it('keeps the team screen usable on this width', async () => {
    const { context, page } = await newPage(viewport);
    await signInByApi(context, BASE, 'admin@ligandry.test');
    await page.goto(`${BASE}/account/team`, { waitUntil: 'networkidle' });
    await page.getByText('Mara Lindqvist').first().waitFor();
    expect(await overflowsSideways(page)).toBe(false);
    await shoot(page, `${viewport.name}-team`);
    await context.close();
  });
});

describe('an admin invites a newcomer, who joins through the mailed link and later resets the password', () => {
  it('works end to end in the browser', async () => {
    const email = `newcomer.${Date.now()}@harbourside.test`;
    const { context: admin, page } = await newPage({ width: 1280, height: 800 });
    await signInByApi(admin, BASE, 'admin@ligandry.test');
    await page.goto(`${BASE}/account/team`, { waitUntil: 'networkidle' });
    await page.getByLabel('E-mail of the person to invite').fill(email);
    await page.getByRole('checkbox', { name: 'Technician', exact: true }).click();
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText(`Invitation sent to ${email}`).waitFor();

    // The mail, as the admin sees it in the outbox.
    await page.goto(`${BASE}/account/outbox`, { waitUntil: 'networkidle' });
    await page.getByText(`To ${email}`).first().click();
    await page.getByText(/\/welcome\//).first().waitFor();
    await shoot(page, 'wide-outbox-invitation');
    const welcome = linkPath(await mailTo(admin, email, /invited you/), '/welcome/');

    // The newcomer, on a phone, not signed in.
    const { context: phone, page: p } = await newPage({ width: 390, height: 844 });
    await p.goto(`${BASE}${welcome}`, { waitUntil: 'networkidle' });
    await p.getByText(email).waitFor();
    await p.getByLabel('Your name').fill('Wren Calloway');
    await p.getByLabel('Password', { exact: true }).fill('plating line 7');
    await p.getByLabel('Password again').fill('plating line 8');
    await p.getByRole('button', { name: 'Join the team' }).click();
    await p.getByText(/do not match|does not match|same password/i).first().waitFor();
    await p.getByLabel('Password again').fill('plating line 7');
    await shoot(p, 'phone-welcome');
    await p.getByRole('button', { name: 'Join the team' }).click();
    await p.getByRole('tab', { name: 'Account' }).waitFor();
    const me = await phone.request.get(`${BASE}/api/me`);
    expect(await me.json()).toMatchObject({ email, name: 'Wren Calloway', roles: ['technician'] });

    // The link works once.
    const { context: other, page: q } = await newPage({ width: 390, height: 844 });
    await q.goto(`${BASE}${welcome}`, { waitUntil: 'networkidle' });
    await q.getByText(/already been used/).waitFor();
    await other.close();

    // Later the newcomer forgets the password.
    await phone.clearCookies();
    await p.goto(`${BASE}/sign-in`, { waitUntil: 'networkidle' });
    await p.getByText('Forgot your password?').click();
    await p.waitForURL(/\/forgot-password/);
    await p.getByLabel('E-mail').fill(email);
    await p.getByRole('button', { name: 'Send the link' }).click();
    await p.getByText(/If an account exists for that address/).waitFor();
    const reset = linkPath(await mailTo(admin, email, /new Ligandry password/), '/new-password/');
    await p.goto(`${BASE}${reset}`, { waitUntil: 'networkidle' });
    await p.getByLabel('New password', { exact: true }).fill('anodes and racks 9');
    await p.getByLabel('New password again').fill('anodes and racks 9');
    await p.getByRole('button', { name: 'Save and sign in' }).click();
    await p.getByRole('tab', { name: 'Account' }).waitFor();
    expect((await phone.request.get(`${BASE}/api/me`)).status()).toBe(200);
    await p.goto(`${BASE}${reset}`, { waitUntil: 'networkidle' });
    await p.getByText(/no longer works|already been used/).first().waitFor();
    await shoot(p, 'phone-reset-link-used');

    // The admin sees the whole story in the activity list.
    await page.goto(`${BASE}/account/activity`, { waitUntil: 'networkidle' });
    await page.getByText(email).first().waitFor();
    await shoot(page, 'wide-activity');
    await phone.close();
    await admin.close();
  });
});
