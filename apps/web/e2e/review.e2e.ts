import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { api, apiSignIn, runTag, submittedCircuit, type ApiSession, type CircuitRef } from './api-setup';
import { baseUrl, demoUsers, openBrowser, screenshot, signIn } from './browser';

// The reviewer's part of the journey (PRODUCT.md roles): two circuits a fabricator submitted by
// set-up, each a drawn transmission-cooler line whose check raises cautions and no blocker.
describe('reviewer: acknowledge and approve, or return with comments', () => {
  let context: BrowserContext;
  let lead: Page;
  let reviewer: ApiSession;
  let toApprove: CircuitRef;
  let toReturn: CircuitRef;

  beforeAll(async () => {
    const fabricator = await apiSignIn(demoUsers.fabricator);
    reviewer = await apiSignIn(demoUsers.reviewer);
    const tag = runTag();
    toApprove = await submittedCircuit(fabricator, `Cooler for sign-off ${tag}`);
    toReturn = await submittedCircuit(fabricator, `Cooler to return ${tag}`);
    context = await openBrowser();
    lead = await context.newPage();
    await signIn(lead, demoUsers.reviewer);
    await lead.getByRole('navigation', { name: 'Sections' }).waitFor();
  });
  afterAll(async () => {
    await context?.close();
  });

  async function openFromQueue(name: string): Promise<void> {
    await lead.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Reviews' }).click();
    const queue = lead.getByRole('table', { name: 'Review queue' });
    await queue.getByRole('link', { name }).click();
    await lead.getByRole('heading', { name: /^Blockers \(\d+\)/ }).waitFor();
  }

  it('acknowledges each caution with a note, approves, and the shop sheet carries the sign-off', async () => {
    await openFromQueue(toApprove.name);
    await screenshot(lead, 'review-1-review-page');
    expect(await lead.getByRole('heading', { name: /^Blockers \(\d+\)/ }).textContent()).toMatch(/\(0\)/);
    const approve = lead.getByRole('button', { name: /^Approve revision/ });
    // Unacknowledged cautions hold the approval back.
    expect(await approve.isDisabled()).toBe(true);

    // Every caution of the server's check is on screen, also those one acknowledgement covers together.
    const review = await api<{ evaluation: { flags: Array<{ severity: string; message: string }> } }>(reviewer, 'GET', `/circuits/${toApprove.id}/review`);
    const cautionMessages = review.evaluation.flags.filter((f) => f.severity === 'caution').map((f) => f.message);
    expect(cautionMessages.length).toBeGreaterThan(0);
    const cautionList = lead.getByRole('list', { name: 'Cautions' });
    for (const message of new Set(cautionMessages)) {
      const times = cautionMessages.filter((m) => m === message).length;
      await cautionList.getByText(message, { exact: true }).nth(times - 1).waitFor();
    }

    const forms = lead.getByRole('form', { name: /^Acknowledge / });
    expect(await forms.count()).toBeGreaterThan(0);
    while ((await forms.count()) > 0) {
      const before = await forms.count();
      const form = forms.first();
      await form.getByRole('textbox').fill('Checked against the vehicle on the lift; acceptable for this build.');
      await form.getByRole('button', { name: 'Acknowledge caution' }).click();
      await expect.poll(() => forms.count(), { timeout: 10_000 }).toBeLessThan(before);
    }
    await expect.poll(() => approve.isEnabled(), { timeout: 10_000 }).toBe(true);
    await approve.click();
    await lead.getByText('Revision 1 approved and locked').waitFor();
    await lead.getByRole('list', { name: 'History' }).waitFor();
    await screenshot(lead, 'review-2-approved');

    await lead.getByRole('link', { name: 'Shop sheet of revision 1' }).click();
    await lead.getByRole('table', { name: 'Cut list' }).waitFor();
    const signOff = lead.getByRole('region', { name: 'Sign-off' });
    await signOff.waitFor();
    const signOffText = (await signOff.textContent()) ?? '';
    expect(signOffText).toContain(`Approved by (reviewer)${reviewer.user.displayName}`);
    expect(signOffText).toMatch(/Revision1(?!\d)/);
    await lead.getByLabel('Safety').waitFor();
    await screenshot(lead, 'review-3-shop-sheet');
    await lead.emulateMedia({ media: 'print' });
    // Print media drops the app's navigation from the sheet (PrintStyles); wait for the restyle.
    await lead.getByRole('navigation', { name: 'Sections', includeHidden: true }).waitFor({ state: 'hidden', timeout: 5_000 });
    await screenshot(lead, 'review-4-shop-sheet-print');
    await lead.emulateMedia({ media: 'screen' });
  });

  it('returns the second circuit with comments, and the fabricator reads them', async () => {
    const comments = 'Add a clamp on the long run along the frame rail, then submit again.';
    await openFromQueue(toReturn.name);
    const form = lead.getByRole('form', { name: 'Return' });
    await form.getByRole('textbox').fill(comments);
    await form.getByRole('button', { name: 'Return to the fabricator' }).click();
    await lead.getByText('Revision 1 returned to the fabricator').waitFor();
    await lead.getByText(comments).first().waitFor();
    await screenshot(lead, 'review-5-returned');

    // The fabricator finds the circuit returned, with the reviewer's comments, and may submit again.
    const fabricator = await openBrowser();
    try {
      const fab = await fabricator.newPage();
      await signIn(fab, demoUsers.fabricator);
      await fab.getByRole('navigation', { name: 'Sections' }).waitFor();
      await fab.goto(`${baseUrl}/circuits/${toReturn.id}?tab=review`);
      await fab.getByText(comments).first().waitFor();
      await fab.getByRole('button', { name: 'Submit for review' }).waitFor();
      await screenshot(fab, 'review-6-fabricator-sees-return');
    } finally {
      await fabricator.close();
    }
  });
});
