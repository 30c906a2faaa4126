import type { BrowserContext, Locator, Page } from 'playwright-core';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { demoUsers, openBrowser, screenshot, signIn } from './browser';

async function openReference(page: Page, tab: string): Promise<void> {
  await signIn(page, demoUsers.fabricator);
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Reference', exact: true }).click();
  await page.getByRole('tab', { name: tab }).click();
}

async function pickEnd(page: Page, legend: string, family: string, size: string, gender: 'Male' | 'Female'): Promise<void> {
  const end: Locator = page.getByRole('group', { name: legend });
  await end.getByRole('combobox', { name: 'Family' }).selectOption(family);
  await end.getByRole('combobox', { name: 'Size' }).selectOption(size);
  await end.getByRole('radio', { name: gender, exact: true }).check();
}

// The bench look-ups of the Reference section against the running server (the identifier asks the API).
describe('reference: thread identifier and joint checker', () => {
  // A fresh profile per test: the sign-in page is only there for a browser without a session.
  let context: BrowserContext;
  beforeEach(async () => {
    context = await openBrowser();
  });
  afterEach(async () => {
    await context?.close();
  });

  it('identifies a 0.56 in, 18 TPI reading as 9/16-18 UNF (-6 37° flare or O-ring boss)', async () => {
    const page = await context.newPage();
    await openReference(page, 'Thread identifier');
    await page.getByRole('textbox', { name: /Measured outside diameter/ }).fill('0.56');
    await page.getByRole('textbox', { name: /Threads per inch/ }).fill('18');
    const answered = page.waitForResponse((r) => r.url().endsWith('/api/reference/identify'));
    await page.getByRole('button', { name: 'Identify' }).click();
    expect((await answered).status()).toBe(200);

    const table = page.getByRole('table', { name: 'Candidate threads' });
    await table.waitFor();
    const rows = table.locator('tbody tr');
    // SAE J514 and SAE J1926-1: -6 37° flare and -6 O-ring boss both use 9/16-18 UNF (0.5625 in major).
    const firstTwo = await Promise.all([0, 1].map((i) => rows.nth(i).locator('td').nth(2).textContent()));
    expect(firstTwo.sort()).toEqual(['37° flare -6', 'O-ring boss -6']);
    expect(await rows.first().locator('td').nth(1).textContent()).toContain('9/16-18 UNF');
    // ASME B1.20.1: 1/4-18 NPT (0.540 in at the gauge plane, 18 TPI) is the look-alike, ranked lower.
    const designations = await rows.locator('td:nth-child(3)').allTextContents();
    expect(designations.indexOf('NPT pipe thread 1/4')).toBeGreaterThan(1);
    await screenshot(page, 'reference-identify-9-16-18');
    await page.close();
  });

  it('checks joints: -6 37° flare joins its female; against a 3/8 45° flare female the threads differ', async () => {
    const page = await context.newPage();
    await openReference(page, 'Joint checker');
    const result = page.getByRole('status', { name: 'Joint check result' });
    await pickEnd(page, 'End A', 'flare37', '-6', 'Male');
    await pickEnd(page, 'End B', 'flare37', '-6', 'Female');
    await expect.poll(() => result.textContent()).toContain('Joins');

    // SAE J514 vs SAE J512: at 3/8 in tube 37° flare is 9/16-18 and 45° flare 5/8-18.
    await pickEnd(page, 'End B', 'flare45', '3/8', 'Female');
    await expect.poll(() => result.textContent()).toContain('Blocker: the threads differ');
    expect(await result.textContent()).toMatch(/9\/16-18[\s\S]*5\/8-18|5\/8-18[\s\S]*9\/16-18/);

    // SAE J514 and SAE J512 both put 7/16-20 UNF on 1/4 in tube: the thread engages, the seat (37° vs 45°) leaks.
    await pickEnd(page, 'End A', 'flare37', '-4', 'Male');
    await pickEnd(page, 'End B', 'flare45', '1/4', 'Female');
    await expect.poll(() => result.textContent()).toContain('Blocker: the seats differ');
    await screenshot(page, 'reference-joint-seats-differ');
    await page.close();
  });
});
