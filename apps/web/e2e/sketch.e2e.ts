import type { BrowserContext, Locator, Page } from 'playwright-core';
import { evaluateCircuit, formatCutLength, type CircuitDocument } from '@linesmith/routing';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { api, apiSignIn, catalogue, copyOfDemoCircuit, runTag, shopRules, type ApiSession, type CircuitRef } from './api-setup';
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

/** Opens the circuit from its build page, as the fabricator does, and brings the canvas on screen. */
async function openCircuit(page: Page, circuit: CircuitRef): Promise<Locator> {
  await page.goto(`${baseUrl}/builds/${circuit.buildId}`);
  await page.getByRole('link', { name: circuit.name }).click();
  const canvas = page.getByRole('application', { name: 'Sketch canvas' });
  await canvas.waitFor();
  // The canvas sits under the circuit's header: bring all of it on screen before clicking on it.
  await canvas.evaluate((el) => el.scrollIntoView({ block: 'center' }));
  return canvas;
}

// A fresh copy of the demo's transmission-cooler starter sketch (seed): transmission at (320, 420)
// with its return port at (+48, +24) — it feeds the gear train's lubrication and needs a long-nose
// fitting — and the cooler at (660, 160) with its outlet at (−60, +20). No lines, no scale yet.
const returnPort = { x: 368, y: 444 };
const corners = [
  { x: 480, y: 444 },
  { x: 480, y: 180 },
];
const coolerOutlet = { x: 600, y: 180 };

describe('fabricator: sketching a transmission-cooler circuit', () => {
  let context: BrowserContext;
  let fabricator: ApiSession;
  let circuit: CircuitRef;
  beforeAll(async () => {
    fabricator = await apiSignIn(demoUsers.fabricator);
    circuit = await copyOfDemoCircuit(fabricator, 'Transmission cooler', `Transmission cooler ${runTag()}`);
    context = await openBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('calibrates, places a unit, draws a line with two bends, picks parts, fixes the port flag, checks the cut length, saves a version and submits', async () => {
    const page = await context.newPage();
    await signIn(page, demoUsers.fabricator);
    await page.getByRole('navigation', { name: 'Sections' }).waitFor();
    let canvas = await openCircuit(page, circuit);
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
    const inspector = page.getByRole('region', { name: 'Inspector' });
    await inspector.getByText('Ports (2)').waitFor();

    // Draw: return port → two corners → cooler outlet.
    await page.keyboard.press('l');
    for (const p of [returnPort, ...corners, coolerOutlet]) await clickSketch(page, canvas, p.x, p.y);
    await inspector.getByRole('region', { name: 'Corners' }).waitFor();
    expect(await inspector.getByRole('region', { name: 'Corners' }).getByRole('listitem').count()).toBe(2);

    // Nothing sits in the lubrication port yet: the check raises the port-requirement blocker.
    const portFlag = page.locator('[data-flag-code="port-requirement"]');
    await portFlag.first().waitFor();
    await screenshot(page, 'sketch-1-port-flag');

    // Hose rated for ATF at the circuit's pressure and heat; the flag's fix is the long-nose end stack from
    // the suggestions at the transmission, then the first suggestion at the cooler.
    await inspector.getByRole('combobox', { name: 'Hose', exact: true }).selectOption({ label: '-6 CPE-lined braided rubber hose' });
    await portFlag.first().click();
    await inspector.getByRole('list', { name: /Suggestions for Four-speed automatic/ }).getByRole('button', { name: /long-nose/ }).first().click();
    await inspector.getByRole('list', { name: /Suggestions for Transmission cooler/ }).getByRole('button').first().click();
    await expect.poll(() => portFlag.count(), { timeout: 10_000 }).toBe(0);

    const cutRow = () => page.getByRole('region', { name: 'Inspector' }).getByRole('row', { name: /Cut length \(rounded up\)/ });
    await expect.poll(async () => (await cutRow().textContent()) ?? '').toMatch(/\d+(-\d+\/\d+)?"/);
    const cutText = (await cutRow().textContent())!.replace('Cut length (rounded up)', '').trim();
    await page.getByRole('status', { name: 'Save state' }).getByText('✓ Saved', { exact: true }).waitFor({ timeout: 15_000 });
    await screenshot(page, 'sketch-2-line-and-parts');

    // The saved draft, evaluated here with the routing library, gives the cut length on screen.
    const [{ document }, parts, rules] = await Promise.all([
      api<{ document: CircuitDocument }>(fabricator, 'GET', `/circuits/${circuit.id}/draft`),
      catalogue(fabricator),
      shopRules(fabricator),
    ]);
    expect(document.lines).toHaveLength(1);
    const [report] = evaluateCircuit(document, parts, rules).lines;
    expect(formatCutLength(report.cutLengthIn!, 'in')).toBe(cutText);
    // Drawn length, by hand: clicked points land within a pixel of their aim; the polyline port → corners →
    // port (Euclidean distances) over the saved scale is about 496 px at 20 px per inch = 24.8 in.
    const line = document.lines[0];
    line.points.forEach((p, i) => expect(Math.hypot(p.x - corners[i].x, p.y - corners[i].y)).toBeLessThan(1));
    const { a, b, knownIn } = document.calibration!;
    const pxPerIn = Math.hypot(b.x - a.x, b.y - a.y) / knownIn;
    expect(pxPerIn).toBeCloseTo(20, 1);
    const path = [returnPort, ...line.points, coolerOutlet];
    const drawnPx = path.slice(1).reduce((sum, p, i) => sum + Math.hypot(p.x - path[i].x, p.y - path[i].y), 0);
    expect(report.drawnLengthIn).toBeCloseTo(drawnPx / pxPerIn, 6);
    expect(report.drawnLengthIn).toBeCloseTo(24.8, 1);
    // Centreline, by hand: a bend of radius r turning through θ replaces two tangent lengths r·tan(θ/2) by an
    // arc r·θ (circle geometry), so each corner shortens the path by 2r·tan(θ/2) − r·θ.
    const shortening = line.points.reduce((sum, corner, i) => {
      const [before, after] = [path[i], path[i + 2]];
      const u = { x: corner.x - before.x, y: corner.y - before.y };
      const v = { x: after.x - corner.x, y: after.y - corner.y };
      const theta = Math.acos((u.x * v.x + u.y * v.y) / (Math.hypot(u.x, u.y) * Math.hypot(v.x, v.y)));
      return sum + 2 * corner.bendRadiusIn * Math.tan(theta / 2) - corner.bendRadiusIn * theta;
    }, 0);
    expect(line.points.every((p) => p.bendRadiusIn > 0)).toBe(true);
    expect(report.centrelineIn).toBeCloseTo(report.drawnLengthIn - shortening, 6);
    // Cut long, never short: rounded up to the next 1/8 in (common practice; the shop's cut rounding).
    expect(report.cutLengthIn! * 8).toBeCloseTo(Math.round(report.cutLengthIn! * 8), 9);
    expect(report.cutLengthIn!).toBeGreaterThanOrEqual(report.exactCutIn!);
    expect(report.cutLengthIn! - report.exactCutIn!).toBeLessThan(0.125);

    // Units: in millimetres the same cut reads 25.4 mm to the inch (exact by definition since 1959),
    // rounded UP to the whole millimetre (common practice: cut long, never short).
    // (A click on a radio item closes the menu; Escape would reach the sketch and clear the selection.)
    await page.getByRole('button', { name: /^Units:/ }).click();
    await page.getByRole('menuitemradio', { name: 'Millimetres' }).click();
    await expect.poll(async () => (await cutRow().textContent()) ?? '').toContain(`${Math.ceil(report.cutLengthIn! * 25.4 - 1e-9)} mm`);
    await screenshot(page, 'sketch-3-millimetres');
    await page.getByRole('button', { name: /^Units:/ }).click();
    await page.getByRole('menuitemradio', { name: 'Inches (fractions)' }).click();
    await expect.poll(async () => (await cutRow().textContent()) ?? '').toContain(cutText);

    // Reload: the line, its parts and its cut length come back from the saved draft.
    await page.reload();
    canvas = page.getByRole('application', { name: 'Sketch canvas' });
    await canvas.waitFor();
    await page.getByRole('option', { name: /^Line 1:/ }).click();
    await expect.poll(async () => (await cutRow().textContent()) ?? '').toContain(cutText);
    expect(await portFlag.count()).toBe(0);

    // Save a version, then submit the circuit for review.
    await page.getByRole('button', { name: 'Save version' }).click();
    const version = page.getByRole('dialog', { name: 'Save version' });
    await version.getByLabel('What changed').fill('Cooler return line drawn, long-nose fitting in the lubrication port.');
    await version.getByRole('button', { name: 'Save version' }).click();
    await page.getByText('Saved as version 1.').waitFor();
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const submit = page.getByRole('dialog');
    await submit.getByRole('textbox').fill('Ready for a look: one line, clamps still to place.');
    await submit.getByRole('button', { name: 'Submit', exact: true }).click();
    await page.getByText('In review').first().waitFor();
    await screenshot(page, 'sketch-4-submitted');
    const after = await api<{ status: string }>(fabricator, 'GET', `/circuits/${circuit.id}`);
    expect(after.status).toBe('in-review');
    const revisions = await api<Array<{ number: number }>>(fabricator, 'GET', `/circuits/${circuit.id}/revisions`);
    expect(revisions.map((r) => r.number).sort()).toEqual([1, 2]);
    await page.close();
  });
});
