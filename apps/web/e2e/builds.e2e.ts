import { crc32, deflateSync } from 'node:zlib';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, demoUsers, openBrowser, screenshot, signIn } from './browser';

/** One PNG chunk: length, type, data, CRC-32 of type and data (PNG specification, §5.3). */
function chunk(type: string, data: Buffer): Buffer {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const typed = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typed));
  return Buffer.concat([length, typed, crc]);
}

/** A valid RGB PNG of the given size in one flat colour, so the server's sniffer reads its dimensions. */
function flatPng(width: number, height: number): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 2, 0, 0, 0], 8); // 8-bit depth, colour type 2 (RGB), deflate, no filter method, no interlace
  const row = Buffer.concat([Buffer.from([0]), Buffer.alloc(width * 3, 0x5a)]); // filter byte 0, then pixels
  const pixels = Buffer.concat(Array.from({ length: height }, () => row));
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', deflateSync(pixels)),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

// The fabricator's first steps (PRODUCT.md journey): a build, a photo of the engine bay, a circuit from a preset.
describe('fabricator: build, photo and circuit', () => {
  let context: BrowserContext;
  beforeAll(async () => {
    context = await openBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('creates a build, uploads a photo, creates a circuit from a preset and sees it listed', async () => {
    const page = await context.newPage();
    const customer = `Journey ${Date.now().toString(36)}`;
    await signIn(page, demoUsers.fabricator);
    await page.getByRole('heading', { name: 'Builds', level: 1 }).waitFor();

    await page.getByRole('button', { name: 'New build' }).click();
    const buildDialog = page.getByRole('dialog');
    await buildDialog.getByLabel('Year').fill('1971');
    await buildDialog.getByLabel('Make').fill('Kestrel');
    await buildDialog.getByLabel('Model').fill('Roadster');
    await buildDialog.getByLabel('Customer name').fill(customer);
    await buildDialog.getByRole('button', { name: 'Create build' }).click();
    await page.getByRole('heading', { name: new RegExp(`1971 Kestrel Roadster — ${customer}`) }).waitFor();
    // The API names who started the build.
    await page.getByText(/Rafe Okonkwo,/).waitFor();

    const png = flatPng(24, 16);
    const uploaded = page.waitForResponse((r) => r.url().includes('/uploads') && r.request().method() === 'POST');
    await page.getByLabel('Choose photos').setInputFiles({ name: 'engine-bay.png', mimeType: 'image/png', buffer: png });
    expect((await uploaded).status()).toBe(201);
    const thumbnail = page.getByRole('img', { name: 'engine-bay.png' });
    await thumbnail.waitFor();
    expect(await thumbnail.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBe(24);
    await page.getByText(/24 × 16 px/).waitFor();

    await page.getByRole('button', { name: 'New circuit' }).click();
    const circuitDialog = page.getByRole('dialog');
    await circuitDialog.getByRole('combobox', { name: 'Kind' }).click();
    await page.getByRole('option', { name: 'Fuel feed and return' }).click();
    // The preset fills the fluid and the limits; the fabricator only names the circuit.
    expect(await circuitDialog.getByLabel(/Max pressure/).inputValue()).not.toBe('');
    await circuitDialog.getByLabel('Name').fill('Fuel feed to rails');
    await circuitDialog.getByRole('button', { name: 'Create circuit' }).click();
    await circuitDialog.waitFor({ state: 'detached' });

    await page.goto(`${baseUrl}/builds`);
    await page.getByRole('table', { name: 'Builds' }).getByText(customer).click();
    const circuits = page.getByRole('table', { name: 'Circuits' });
    await circuits.getByRole('link', { name: 'Fuel feed to rails' }).waitFor();
    expect(await circuits.getByRole('row', { name: /Fuel feed to rails/ }).textContent()).toMatch(/Fuel feed and return/);
    await screenshot(page, 'builds-journey-build-page');
    await page.close();
  });
});
