import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { formatMoney } from '../../circuits/utils/format-money';
import { apiSuppliers } from '../../catalogue/test-support/catalogue-api';

/**
 * An order sheet as the API drafts it (DOMAIN.md §6): 23 ft of hose already rounded up to whole
 * feet, one pack of clamps, tax at the rate frozen on the sheet. The page must show these cents
 * and quantities as sent; it has no order maths of its own.
 */
const order = {
  id: 'o-1',
  supplierId: 'demo-supplier-harbor',
  status: 'sent',
  circuitIds: ['c-1'],
  taxRatePercent: 7.25,
  subtotalCents: 14082,
  taxCents: 1021,
  totalCents: 15103,
  sentAt: '2026-03-02T15:00:00.000Z',
  version: 2,
  createdAt: '2026-03-02T14:00:00.000Z',
  lines: [
    {
      id: 'l-1',
      partId: 'p-hose',
      description: 'Braided hose -6',
      supplierPartNumber: 'HL-6BR',
      saleUnit: 'foot',
      quantity: 23,
      unitPriceCents: 486,
      lineTotalCents: 11178,
      receivedQuantity: 10,
    },
    {
      id: 'l-2',
      partId: 'p-clamp',
      description: 'Cushion clamp 9/16 in',
      supplierPartNumber: 'HL-CC9',
      saleUnit: 'pack of 10',
      quantity: 1,
      unitPriceCents: 2904,
      lineTotalCents: 2904,
      receivedQuantity: 0,
    },
  ],
};

function ordersApi() {
  return createFetchMock()
    .on('GET', '/api/suppliers', () => jsonResponse(200, apiSuppliers))
    .on('GET', '/api/orders/o-1', () => jsonResponse(200, order));
}

describe('Order page', () => {
  it('shows the lines, rounded quantities and totals exactly as the API sent them', async () => {
    renderApp({ path: '/orders/o-1', user: demoUsers['parts-clerk'], fetchMock: ordersApi() });
    const table = await screen.findByRole('table', { name: 'Order lines' });
    const rows = within(table)
      .getAllByRole('row')
      .slice(1)
      .map((row) => within(row).getAllByRole('cell').map((cell) => cell.textContent));
    expect(rows).toEqual([
      ['HL-6BR', 'Braided hose -6', '23', 'foot', formatMoney(486), formatMoney(11178), '10'],
      ['HL-CC9', 'Cushion clamp 9/16 in', '1', 'pack of 10', formatMoney(2904), formatMoney(2904), '0'],
    ]);
    const totals = screen.getByLabelText('Order totals');
    expect(totals.textContent).toBe(
      `Subtotal${formatMoney(14082)}Tax (7.25 %)${formatMoney(1021)}Total${formatMoney(15103)}`,
    );
    expect(screen.getByRole('heading', { name: 'Order sheet · Harbor Line Supply' })).toBeInTheDocument();
  });

  it('books a partial receipt of the lines still to come', async () => {
    const fetchMock = ordersApi().on('POST', '/api/orders/o-1/receive', () =>
      jsonResponse(200, { ...order, status: 'partially-received' }),
    );
    renderApp({ path: '/orders/o-1', user: demoUsers['parts-clerk'], fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Receive' }));
    const dialog = await screen.findByRole('dialog');
    const hose = within(dialog).getByRole('textbox', { name: 'Arrived: Braided hose -6' });
    expect(hose).toHaveValue('13');
    await user.clear(hose);
    await user.type(hose, '20');
    await user.click(within(dialog).getByRole('button', { name: 'Book into stock' }));
    expect(await within(dialog).findByText('Only 13 still to come.')).toBeInTheDocument();
    await user.clear(hose);
    await user.type(hose, '8');
    await user.clear(within(dialog).getByRole('textbox', { name: 'Arrived: Cushion clamp 9/16 in' }));
    await user.click(within(dialog).getByRole('button', { name: 'Book into stock' }));
    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/orders/o-1/receive')).toHaveLength(1));
    expect(fetchMock.callsTo('POST', '/api/orders/o-1/receive')[0].body).toEqual({
      lines: [{ orderLineId: 'l-1', quantity: 8 }],
    });
    expect(fetchMock.callsTo('POST', '/api/orders/o-1/receive')[0].headers.get('Idempotency-Key')).toMatch(/^[0-9a-f]{32}$/);
  });

  it('asks before e-mailing a draft, showing the supplier address', async () => {
    const fetchMock = ordersApi()
      .on('GET', '/api/orders/o-1', () => jsonResponse(200, { ...order, status: 'draft', sentAt: null }))
      .on('POST', '/api/orders/o-1/send', () => jsonResponse(200, order));
    renderApp({ path: '/orders/o-1', user: demoUsers['parts-clerk'], fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'E-mail to supplier' }));
    const dialog = await screen.findByRole('alertdialog');
    expect(within(dialog).getByText('orders@harborline.example')).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/orders/o-1/send')).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Send order' }));
    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/orders/o-1/send')).toHaveLength(1));
  });
});
