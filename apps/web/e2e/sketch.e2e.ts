import type { BrowserContext, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, demoUsers, openBrowser, screenshot, signIn } from './browser';

/** Screen position of a sketch point, from the view transform the canvas publishes. */
async function toScreen(canvas: Locator, x: number, y: number): Promise<{ x: number; y: number }> {
  const box = (await canvas.boundingBox())!;
  const [zoom, panX, panY] = await Promise.all(['data-zoom', 'data-pan-x', 'data-pan-y'].map((a) => canvas.getAttribute(a)));
  return { x: box.x + Number(panX) + x * Number(zoom), y: box.y + Number(panY) + y * Number(zoom) };
}

async function clickSketch(page: Page, canvas: Locator, x: number, y: number): Promise<void> {
  const p = await toScreen(canvas, x, y);
  await page.mouse.click(p.x, p.y);
}

async function openTransmissionCooler(page: Page): Promise<Locator> {
  await page.goto(`${baseUrl}/builds`);
  await page.getByRole('link', { name: /Redfern/ }).first().click();
  await page.getByRole('link', { name: 'Transmission cooler' }).first().click();
  const canvas = page.getByRole('application', { name: 'Sketch canvas' });
  await canvas.waitFor();
  // The canvas sits under the circuit's header: bring all of it on screen before clicking on it.
  await canvas.evaluate((el) => el.scrollIntoView({ block: 'center' }));
  return canvas;
}

// The demo's transmission-cooler sketch (seed): transmission at (320, 420) with its return port at
// (+48, +24) — it feeds the gear train's lubrication and needs a long-nose fitting — and the cooler at
// (660, 160) with its outlet at (−60, +20).
const returnPort = { x: 368, y: 444 };
const coolerOutlet = { x: 600, y: 180 };

describe('sketching the transmission-cooler circuit', () => {
  let context: BrowserContext;
  beforeAll(async () => {
    context = await openBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('calibrates, places a cooler, draws a line with two bends, picks parts, reads the cut length, and finds it saved', async () => {
    const page = await context.newPage();
    await signIn(page, demoUsers.fabricator);
    await page.getByRole('navigation').first().waitFor();
    let canvas = await openTransmissionCooler(page);
    // A draft left by an earlier run keeps its lines: clear them so both ports are free again.
    const outline = page.getByRole('listbox', { name: 'Sketch items' });
    await outline.waitFor();
    while ((await outline.getByRole('option', { name: /^Line \d+:/ }).count()) > 0) {
      await outline.getByRole('option', { name: /^Line \d+:/ }).first().click();
      await page.getByRole('button', { name: 'Delete line' }).click();
    }
    await page.keyboard.press('f');
    await canvas.evaluate((el) => el.scrollIntoView({ block: 'center' }));

    // Calibrate: two points 200 sketch px apart are 10 in → 20 px per inch.
    await page.keyboard.press('c');
    await clickSketch(page, canvas, 300, 100);
    await clickSketch(page, canvas, 500, 100);
    const calibrate = page.getByRole('dialog', { name: /calibrate/i });
    await calibrate.getByRole('textbox').fill('10');
    await calibrate.getByRole('button', { name: 'Set scale' }).click();
    await page.getByText('Scale: 20.0 px per inch').waitFor();

    // Place a second cooler from the palette; it arrives selected in the inspector.
    await page.getByRole('button', { name: 'Place cooler' }).click();
    await page.getByRole('region', { name: 'Inspector' }).getByText('Ports (2)').waitFor();

    // Draw: return port → two corners → cooler outlet.
    await page.keyboard.press('l');
    await clickSketch(page, canvas, returnPort.x, returnPort.y);
    await clickSketch(page, canvas, 480, 444);
    await clickSketch(page, canvas, 480, 180);
    await clickSketch(page, canvas, coolerOutlet.x, coolerOutlet.y);
    const inspector = page.getByRole('region', { name: 'Inspector' });
    await inspector.getByRole('region', { name: 'Corners' }).waitFor();
    expect(await inspector.getByRole('region', { name: 'Corners' }).getByRole('listitem').count()).toBe(2);

    // Hose rated for ATF at the circuit's pressure and heat, then an end stack per end from the suggestions.
    await inspector.getByRole('combobox', { name: 'Hose', exact: true }).selectOption({ label: '-6 CPE-lined braided rubber hose' });
    const fromSuggestions = inspector.getByRole('list', { name: /Suggestions for Four-speed automatic/ });
    await fromSuggestions.getByRole('button', { name: /long-nose/ }).first().click();
    const toSuggestions = inspector.getByRole('list', { name: /Suggestions for Transmission cooler/ });
    await toSuggestions.getByRole('button').first().click();
    await page.waitForFunction(() => !document.querySelector('[data-flag-code="port-requirement"]'));

    const cutRow = inspector.getByRole('row', { name: /Cut length \(rounded up\)/ });
    await expect.poll(async () => (await cutRow.textContent()) ?? '').toMatch(/\d+(-\d+\/\d+)?"/);
    const cut = (await cutRow.textContent())!.replace('Cut length (rounded up)', '').trim();
    await page.getByRole('status', { name: 'Save state' }).getByText('✓ Saved', { exact: true }).waitFor({ timeout: 15_000 });
    await screenshot(page, 'sketch-transmission-cooler');

    // Reload: the line, its parts and its cut length come back from the saved draft.
    await page.reload();
    canvas = page.getByRole('application', { name: 'Sketch canvas' });
    await canvas.waitFor();
    await page.getByRole('option', { name: /^Line 1:/ }).click();
    await expect.poll(async () => (await page.getByRole('row', { name: /Cut length \(rounded up\)/ }).textContent()) ?? '').toContain(cut);
    expect(await page.locator('[data-flag-code="port-requirement"]').count()).toBe(0);
    await page.close();
  });
});
