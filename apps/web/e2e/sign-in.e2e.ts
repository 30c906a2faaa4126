import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { demoUsers, openBrowser, screenshot, signIn } from './browser';

// Navigation by role, as designed in PRODUCT.md (roles) and the app shell.
const expectedNav: Record<keyof typeof demoUsers, string[]> = {
  admin: ['Builds', 'Reviews', 'Orders', 'Catalogue', 'Reference', 'Admin'],
  fabricator: ['Builds', 'Catalogue', 'Reference'],
  partsClerk: ['Builds', 'Orders', 'Catalogue', 'Reference'],
  reviewer: ['Builds', 'Reviews', 'Reference'],
};
const allSections = ['Builds', 'Reviews', 'Orders', 'Catalogue', 'Reference', 'Admin'];

describe('demo users sign in and see the navigation of their role', () => {
  // A fresh profile per test: a signed-in session (refresh cookie) must not leak into the next.
  let context: BrowserContext;
  beforeEach(async () => {
    context = await openBrowser();
  });
  afterEach(async () => {
    await context?.close();
  });

  for (const [role, email] of Object.entries(demoUsers) as Array<[keyof typeof demoUsers, string]>) {
    it(`${role} (${email})`, async () => {
      const page = await context.newPage();
      await signIn(page, email);
      const nav = page.getByRole('navigation', { name: 'Sections' });
      await nav.getByRole('link', { name: 'Reference' }).waitFor();
      for (const section of allSections) {
        const count = await nav.getByRole('link', { name: section, exact: true }).count();
        expect(count, `${section} link for ${role}`).toBe(expectedNav[role].includes(section) ? 1 : 0);
      }
      await screenshot(page, `sign-in-${role}`);
      await page.close();
    });
  }

  it('rejects a wrong password with a message and stays on the sign-in page', async () => {
    const page = await context.newPage();
    await signIn(page, demoUsers.admin, 'not-the-password');
    await page.getByText(/e-mail or password/i).waitFor();
    expect(page.url()).toContain('/sign-in');
    await page.close();
  });
});
