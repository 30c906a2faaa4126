import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { readFileSync } from 'node:fs';
import { api, apiSignIn, approve, partIdsOfDraft, runTag, submittedCircuit, useUpStock } from './api-setup';
import { baseUrl, demoUsers, openBrowser, screenshot, signIn } from './browser';
import { attachmentsOf, isZip, waitForMail } from './mail';

interface OrderDto {
  id: string;
  status: string;
  supplier: { name: string; email: string } | null;
  lines: Array<{ id: string; partId: string | null; description: string; quantity: number; receivedQuantity: number }>;
}

// The parts clerk's day (PRODUCT.md, journey step 7): catalogue, then an order sheet from an approved circuit.
describe('parts clerk: catalogue and order sheet', () => {
  // A fresh profile per test: the first test's session must not carry over into the second's sign-in.
  let context: BrowserContext;
  beforeEach(async () => {
    context = await openBrowser();
  });
  afterEach(async () => {
    await context?.close();
  });

  it('opens the catalogue and filters the parts by kind', async () => {
    const page = await context.newPage();
    await signIn(page, demoUsers.partsClerk);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Catalogue', exact: true }).click();
    const table = page.getByRole('table', { name: 'Parts' });
    await table.waitFor();
    // Listen before choosing: the filtered list may arrive before a later listener is in place.
    const filtered = page.waitForResponse((r) => r.url().includes('/api/parts?') && r.url().includes('kind=hose'));
    await page.getByRole('combobox', { name: 'Kind' }).selectOption('hose');
    await filtered;
    const kinds = () => table.locator('tbody tr td:nth-child(2)').allTextContents();
    await expect.poll(async () => [...new Set(await kinds())]).toEqual(['Hose']);
    await screenshot(page, 'catalogue-hoses');
    await page.getByRole('tab', { name: 'Suppliers' }).click();
    await page.getByRole('table', { name: 'Suppliers' }).waitFor();
    await screenshot(page, 'catalogue-suppliers');
    await page.close();
  });

  it('orders the parts of an approved circuit: sheet, export, e-mail to the supplier, partial delivery into stock', async () => {
    // Set-up (not this journey): a fabricator's circuit, submitted and approved through the API.
    const fabricator = await apiSignIn(demoUsers.fabricator);
    const clerk = await apiSignIn(demoUsers.partsClerk);
    const circuit = await submittedCircuit(fabricator, `Cooler to order ${runTag()}`);
    await approve(await apiSignIn(demoUsers.reviewer), circuit.id);
    // With the shelf empty for the circuit's parts, none is covered by stock and every one goes on a sheet.
    await useUpStock(clerk, await partIdsOfDraft(fabricator, circuit.id));

    const page = await context.newPage();
    await signIn(page, demoUsers.partsClerk);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Orders', exact: true }).click();
    await page.getByRole('heading', { name: 'Orders' }).waitFor();
    await page.getByRole('button', { name: 'New order' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('group', { name: 'Approved circuits' }).getByRole('checkbox', { name: new RegExp(`${circuit.name}$`) }).check();
    await screenshot(page, 'orders-1-new-order');
    const [drafted] = await Promise.all([
      page.waitForResponse((r) => r.url().endsWith('/api/orders/draft') && r.request().method() === 'POST'),
      dialog.getByRole('button', { name: 'Draft order sheets' }).click(),
    ]);
    expect(drafted.status()).toBe(201);
    const { orders } = (await drafted.json()) as { orders: OrderDto[] };
    await dialog.waitFor({ state: 'detached' });
    // One sheet per supplier: follow the first that can be e-mailed.
    const order = orders.find((o) => o.supplier?.email && o.lines.length > 0);
    expect(order, 'a drafted sheet for a supplier with an e-mail address').toBeDefined();
    await page.goto(`${baseUrl}/orders/${order!.id}`);
    await page.getByRole('heading', { name: `Order sheet · ${order!.supplier!.name}` }).waitFor();
    await page.getByLabel('Order totals').waitFor();
    expect(await page.getByRole('table', { name: 'Order lines' }).locator('tbody tr').count()).toBe(order!.lines.length);
    await screenshot(page, 'orders-2-order-sheet');

    // Export: the download arrives and is a zip container (every .xlsx is one, ECMA-376 Part 2).
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Export .xlsx' }).click()]);
    expect(download.suggestedFilename()).toMatch(/\.xlsx$/);
    expect(isZip(readFileSync((await download.path())!))).toBe(true);

    // E-mail to the supplier: the message with the sheet attached lands in the fake mail folder.
    await page.getByRole('button', { name: 'E-mail to supplier' }).click();
    const send = page.getByRole('alertdialog');
    await send.getByText(order!.supplier!.email).waitFor();
    await send.getByRole('button', { name: 'Send order' }).click();
    await send.waitFor({ state: 'detached' });
    await page.getByText('Sent', { exact: true }).first().waitFor();
    const mail = await waitForMail(order!.supplier!.email, (m) => attachmentsOf(m).some((a) => isZip(a.content) && a.filename.endsWith('.xlsx')));
    expect(attachmentsOf(mail).find((a) => a.filename.endsWith('.xlsx'))!.contentType).toMatch(/spreadsheetml|octet-stream/);

    // A partial delivery: one unit (foot, piece or pack) of the longest line arrives, nothing else yet.
    const line = [...order!.lines].sort((a, b) => b.quantity - a.quantity)[0];
    expect(order!.lines.length > 1 || line.quantity > 1, 'something still to come after one unit').toBe(true);
    const stockBefore = (await api<{ stockOnHand: number }>(clerk, 'GET', `/parts/${line.partId}`)).stockOnHand;
    await page.getByRole('button', { name: 'Receive' }).click();
    const receive = page.getByRole('dialog', { name: 'Book a delivery into stock' });
    for (const other of order!.lines) await receive.getByLabel(`Arrived: ${other.description}`).fill(other.id === line.id ? '1' : '0');
    await receive.getByRole('button', { name: 'Book into stock' }).click();
    await receive.waitFor({ state: 'detached' });
    await page.getByText('Partly received', { exact: true }).first().waitFor();
    await screenshot(page, 'orders-3-partly-received');
    const after = await api<OrderDto>(clerk, 'GET', `/orders/${order!.id}`);
    expect(after.status).toBe('partially-received');
    expect(after.lines.find((l) => l.id === line.id)!.receivedQuantity).toBe(1);
    const stockAfter = (await api<{ stockOnHand: number }>(clerk, 'GET', `/parts/${line.partId}`)).stockOnHand;
    expect(stockAfter).toBe(stockBefore + 1);
    await page.close();
  });
});
