import type { BrowserContext } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { runTag } from './api-setup';
import { baseUrl, demoUsers, openBrowser, screenshot, signIn } from './browser';
import { decodeQuotedPrintable, waitForMail } from './mail';

// The admin brings a new person into the shop (PRODUCT.md roles): an invitation by e-mail, and the
// invited user chooses a password from the link and lands signed in with their role's navigation.
describe('admin: invite a user who signs in from the e-mailed link', () => {
  const contexts: BrowserContext[] = [];
  afterAll(async () => {
    await Promise.all(contexts.map((c) => c.close()));
  });

  it('invites a parts clerk; the link from the e-mail sets a password and signs them in', async () => {
    const tag = runTag();
    const email = `new.clerk.${tag}@tidewater.example`;
    const displayName = `Noor Haddad ${tag}`;

    const adminContext = await openBrowser();
    contexts.push(adminContext);
    const admin = await adminContext.newPage();
    await signIn(admin, demoUsers.admin);
    await admin.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Admin', exact: true }).click();
    await admin.getByRole('link', { name: 'Users', exact: true }).click();
    await admin.getByRole('table', { name: 'Users' }).waitFor();
    await admin.getByRole('button', { name: 'Invite user' }).click();
    const form = admin.getByRole('form', { name: 'Invite user' });
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Display name').fill(displayName);
    await form.getByRole('checkbox', { name: /^Parts clerk/ }).check();
    await screenshot(admin, 'admin-1-invite');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await form.getByText(`An invitation is on its way to ${email}`).waitFor();
    await form.getByRole('button', { name: 'Close' }).click();
    await admin.getByRole('table', { name: 'Users' }).getByText(displayName).waitFor();
    await screenshot(admin, 'admin-2-invited');

    // The invitation lands in the fake mail folder with a link back to this app.
    const mail = await waitForMail(email, (m) => /accept-invite\?token=/.test(decodeQuotedPrintable(m.raw)));
    const link = /https?:\/\/[^\s"<>]+\/accept-invite\?token=[A-Za-z0-9_-]+/.exec(decodeQuotedPrintable(mail.raw))?.[0];
    expect(link, 'an accept-invite link in the e-mail').toBeDefined();
    expect(new URL(link!).origin).toBe(new URL(baseUrl).origin);

    // A fresh browser, as on the new user's own machine.
    const newcomerContext = await openBrowser();
    contexts.push(newcomerContext);
    const newcomer = await newcomerContext.newPage();
    await newcomer.goto(link!);
    const choose = newcomer.getByRole('form', { name: 'Choose a password' });
    const password = `clerk-${tag}-pass`;
    await choose.getByLabel('New password').fill(password);
    await choose.getByLabel('Repeat the password').fill(password);
    await screenshot(newcomer, 'admin-3-accept-invite');
    await choose.getByRole('button', { name: 'Set password and sign in' }).click();

    // Signed in as a parts clerk: Builds, Orders, Catalogue and Reference; no Reviews, no Admin.
    const nav = newcomer.getByRole('navigation', { name: 'Sections' });
    await nav.getByRole('link', { name: 'Orders', exact: true }).waitFor();
    for (const [section, shown] of Object.entries({ Builds: 1, Orders: 1, Catalogue: 1, Reference: 1, Reviews: 0, Admin: 0 })) {
      expect(await nav.getByRole('link', { name: section, exact: true }).count(), section).toBe(shown);
    }
    expect(newcomer.url()).not.toContain('/accept-invite');
    await screenshot(newcomer, 'admin-4-newcomer-signed-in');

    // The password works for a normal sign-in too.
    const again = await openBrowser();
    contexts.push(again);
    const page = await again.newPage();
    await signIn(page, email, password);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Orders', exact: true }).waitFor();
  });
});
