import type { BrowserContext, Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { baseUrl, demoUsers, openBrowser, screenshot, signIn } from './browser';

// The seeded demo build (PRODUCT.md "Demo scenario") and its circuits, in the order this journey tries them.
const circuitNames = ['Engine-oil cooler', 'Transmission cooler', 'Fuel return system'];

async function openDemoBuild(page: Page): Promise<void> {
  await page.goto(`${baseUrl}/builds`);
  await page.getByRole('link', { name: /Redfern|Abernathy/ }).first().click();
  await page.getByRole('link', { name: circuitNames[0] }).waitFor();
}

/** Opens the first demo circuit the fabricator can still submit; returns its name and address. */
async function submittableCircuit(page: Page): Promise<{ name: string; url: string } | null> {
  for (const name of circuitNames) {
    await openDemoBuild(page);
    await page.getByRole('link', { name }).click();
    await page.getByRole('heading', { name, level: 1 }).waitFor();
    await page.getByRole('tab', { name: 'Review' }).waitFor();
    if (await page.getByRole('button', { name: 'Submit for review' }).count()) return { name, url: page.url().split('?')[0] };
  }
  return null;
}

describe('review journey: submit, review, decide, print', () => {
  const contexts: BrowserContext[] = [];
  afterEach(async () => {
    await Promise.all(contexts.splice(0).map((c) => c.close()));
  });

  it('the fabricator submits a circuit, the reviewer decides on it, and the shop sheet prints', async () => {
    // --- Fabricator: submit --------------------------------------------------------------------
    const fabricator = await openBrowser();
    contexts.push(fabricator);
    const fab = await fabricator.newPage();
    await signIn(fab, demoUsers.fabricator);
    await fab.getByRole('navigation', { name: 'Sections' }).waitFor();
    const circuit = await submittableCircuit(fab);
    expect(circuit, 'a demo circuit in draft or returned').not.toBeNull();
    await fab.getByRole('button', { name: 'Submit for review' }).click();
    const dialog = fab.getByRole('dialog');
    await dialog.getByRole('textbox').fill('Ports and units placed; ready for a first look.');
    await dialog.getByRole('button', { name: 'Submit', exact: true }).click();
    await fab.getByText('In review').first().waitFor();
    await screenshot(fab, 'review-1-submitted');

    // --- Reviewer: queue, acknowledge, decide -----------------------------------------------------
    const reviewer = await openBrowser();
    contexts.push(reviewer);
    const lead = await reviewer.newPage();
    await signIn(lead, demoUsers.reviewer);
    await lead.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Reviews' }).click();
    const queue = lead.getByRole('table', { name: 'Review queue' });
    await queue.waitFor();
    await screenshot(lead, 'review-2-queue');
    await queue.getByRole('link', { name: circuit!.name }).first().click();
    await lead.getByRole('heading', { name: /^Blockers \(\d+\)/ }).waitFor();
    await screenshot(lead, 'review-3-review-page');

    const blockers = Number((await lead.getByRole('heading', { name: /^Blockers \(\d+\)/ }).textContent())?.match(/\((\d+)\)/)?.[1]);
    if (blockers === 0) {
      // Acknowledge every caution with a note, then approve.
      const forms = lead.getByRole('form', { name: /^Acknowledge / });
      while ((await forms.count()) > 0) {
        const before = await forms.count();
        const form = forms.first();
        await form.getByRole('textbox').fill('Checked against the vehicle on the lift; acceptable for this build.');
        await form.getByRole('button', { name: 'Acknowledge caution' }).click();
        await expect.poll(() => forms.count(), { timeout: 10_000 }).toBeLessThan(before);
      }
      const approve = lead.getByRole('button', { name: /^Approve revision/ });
      await expect.poll(() => approve.isEnabled(), { timeout: 10_000 }).toBe(true);
      await approve.click();
      await lead.getByText(/approved and locked/).waitFor();
    } else {
      // A blocker cannot be signed off: approval stays disabled and the circuit goes back with comments.
      expect(await lead.getByRole('button', { name: /^Approve revision/ }).isDisabled()).toBe(true);
      const form = lead.getByRole('form', { name: 'Return' });
      await form.getByRole('textbox').fill('Calibrate the sketch and draw the lines, then submit again.');
      await form.getByRole('button', { name: 'Return to the fabricator' }).click();
      await lead.getByText(/returned to the fabricator/).first().waitFor();
    }
    await lead.getByRole('list', { name: 'History' }).waitFor();
    await screenshot(lead, 'review-4-decided');

    // --- Shop sheet of the revision ----------------------------------------------------------------
    await lead.getByRole('link', { name: /^Shop sheet of revision/ }).click();
    await lead.getByRole('button', { name: 'Print' }).waitFor();
    await lead.getByRole('table', { name: 'Cut list' }).waitFor();
    if (blockers === 0) await lead.getByRole('region', { name: 'Sign-off' }).waitFor();
    else await lead.getByText(/NOT APPROVED — do not build/).waitFor();
    await lead.getByLabel('Safety').waitFor();
    await screenshot(lead, 'review-5-shop-sheet');
    await lead.emulateMedia({ media: 'print' });
    expect(await lead.getByRole('navigation', { name: 'Sections' }).isVisible()).toBe(false);
    await screenshot(lead, 'review-6-shop-sheet-print');
  });
});
