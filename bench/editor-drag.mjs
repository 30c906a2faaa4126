// Editor drag frame time at 500 items: a circuit whose draft holds 100 units, 150 lines with
// corners, 200 supports and 50 sleeves (put in through the draft API), opened in Chromium; one unit
// is dragged with the mouse through 120 moves, one move per frame. The frame time of a move is the
// main-thread JavaScript it causes: the pointer-event handling (Konva's drag, the sketch store,
// React's render of what changed) plus Konva's layer draws in the frame that follows.
// Goal: median ≤ 8 ms (half of a 60 Hz frame, leaving the rest to style, paint and the browser).
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import { ApiSession, demoPassword, demoUsers, serverUrl } from './lib/api-client.mjs';
import { itemCount, largeDraft } from './lib/drafts.mjs';
import { median, percentile, row } from './lib/stats.mjs';

const MOVES = 120;
const STEP_PX = 2;
const GOAL_MS = 8;
const DRAGGED_UNIT = 'u44';

/** A circuit on a fresh bench build, with the 500-item draft saved. */
async function largeCircuit(fab) {
  const build = await fab.post('/builds', { vehicle: { make: 'Bench', model: 'Editor load test' }, notes: 'Created by npm run bench.' });
  const circuit = await fab.post(`/builds/${build.id}/circuits`, { kind: 'transmission-cooler', name: 'Editor load, 500 items' });
  const { document, draftVersion } = await fab.get(`/circuits/${circuit.id}/draft`);
  const draft = largeDraft(document.circuit, await fab.allParts());
  await fab.saveDraft(circuit.id, draftVersion, draft);
  return { circuitId: circuit.id, draft };
}

/** Installed in the page: per move, handler time (capture pointermove → after mousemove and its microtasks) + Konva draws. */
function installFrameProbe() {
  const probe = { frames: [], current: null };
  window.__frameProbe = probe;
  window.addEventListener('pointermove', () => {
    probe.current = { handler: 0, draw: 0, start: performance.now() };
    probe.frames.push(probe.current);
  }, true);
  window.addEventListener('mousemove', () => {
    const frame = probe.current;
    if (frame) queueMicrotask(() => { frame.handler = performance.now() - frame.start; });
  });
  const Layer = window.Konva.Layer;
  const draw = Layer.prototype.draw;
  Layer.prototype.draw = function timedDraw(...args) {
    const start = performance.now();
    const result = draw.apply(this, args);
    if (probe.current) probe.current.draw += performance.now() - start;
    return result;
  };
}

export async function benchEditorDrag() {
  const base = serverUrl();
  const fab = await ApiSession.signIn(base, demoUsers.fabricator);
  const { circuitId, draft } = await largeCircuit(fab);
  const unit = draft.units.find((u) => u.id === DRAGGED_UNIT);

  const profile = mkdtempSync(join(tmpdir(), 'linesmith-bench-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1366, height: 860 },
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  try {
    const page = await context.newPage();
    await page.goto(`${base}/sign-in`);
    await page.getByLabel(/e-?mail/i).fill(demoUsers.fabricator);
    await page.getByLabel(/password/i).fill(demoPassword);
    await page.getByRole('button', { name: /sign in/i }).click();
    await page.getByRole('navigation').first().waitFor();
    await page.goto(`${base}/circuits/${circuitId}`);
    const canvas = page.getByRole('application', { name: 'Sketch canvas' });
    await canvas.waitFor();
    await page.getByRole('option', { name: /^Line \d+:/ }).first().waitFor(); // the draft is loaded
    await canvas.evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await canvas.click({ position: { x: 5, y: 5 } }); // focus the sketch (an empty corner), then fit it to the view
    await page.keyboard.press('f');
    await page.waitForTimeout(500);

    const box = await canvas.boundingBox();
    const [zoom, panX, panY] = await Promise.all(['data-zoom', 'data-pan-x', 'data-pan-y'].map(async (a) => Number(await canvas.getAttribute(a))));
    const at = { x: box.x + panX + unit.x * zoom, y: box.y + panY + unit.y * zoom };
    if (at.x < box.x || at.y < box.y || at.x > box.x + box.width || at.y > box.y + box.height) {
      throw new Error(`unit ${DRAGGED_UNIT} is off the canvas at zoom ${zoom}`);
    }
    await page.evaluate(installFrameProbe);
    const nextFrame = () => page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
    await page.mouse.move(at.x, at.y);
    await page.mouse.down();
    for (let i = 1; i <= MOVES; i += 1) {
      await page.mouse.move(at.x + i * STEP_PX, at.y + (i % 2));
      await nextFrame();
    }
    await page.mouse.up();
    const probed = await page.evaluate(() => window.__frameProbe.frames.map((f) => ({ handler: f.handler, draw: f.draw })));
    const frames = probed.map((f) => f.handler + f.draw);
    const moved = await page.evaluate(() => window.__frameProbe.frames.filter((f) => f.draw > 0).length);
    // The first move starts the drag (Konva's distance threshold); measure the drag itself.
    const times = frames.slice(1);
    if (moved < MOVES / 2) throw new Error(`only ${moved} of ${MOVES} moves redrew the sketch: the drag did not happen`);
    return [
      row(`editor: drag frame time, ${itemCount(draft)} items (${times.length} moves, JS per frame) median`, median(times), 'ms', GOAL_MS),
      row('editor: drag frame time p95', percentile(times, 95), 'ms'),
      row('editor: of which Konva layer draws, median', median(probed.slice(1).map((f) => f.draw)), 'ms'),
    ];
  } finally {
    await context.close();
    rmSync(profile, { recursive: true, force: true });
  }
}
