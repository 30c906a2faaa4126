import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiParts, catalogueApi } from '../test-support/catalogue-api';

vi.mock('../api/price-list-requests', () => ({
  previewPriceList: vi.fn(),
  commitPriceList: vi.fn(),
}));
const requests = await import('../api/price-list-requests');

describe('Catalogue › Parts', () => {
  it('lists the parts and sends the kind filter to the API', async () => {
    const fetchMock = catalogueApi();
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock });
    const user = userEvent.setup();
    await screen.findByRole('table', { name: 'Parts' });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Kind' }), 'clamp');
    await waitFor(() => expect(fetchMock.callsTo('GET', '/api/parts').at(-1)?.url.searchParams.get('kind')).toBe('clamp'));
    const table = await screen.findByRole('table', { name: 'Parts' });
    await waitFor(() => {
      const kinds = within(table).getAllByRole('row').slice(1).map((row) => within(row).getAllByRole('cell')[1].textContent);
      expect(new Set(kinds)).toEqual(new Set(['Clamp']));
    });
  });

  it('refuses a hose without its ratings, naming each missing field, and sends nothing', async () => {
    const fetchMock = catalogueApi();
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'New part' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByRole('textbox', { name: /Description/ }), 'Test hose -6 braided');
    await user.type(within(dialog).getByRole('textbox', { name: /^Dash size/ }), '6');
    await user.click(within(dialog).getByRole('button', { name: 'Create part' }));

    // DOMAIN.md §2: a hose carries its max working pressure, max temperature, bend radius and fluids.
    expect(await within(dialog).findByText('Enter the max working pressure.')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter the max temperature.')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter the min bend radius.')).toBeInTheDocument();
    expect(within(dialog).getByText('Choose the fluids it is rated for.')).toBeInTheDocument();
    expect(within(dialog).queryByText('Enter the dash size.')).not.toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/parts')).toHaveLength(0);
  });

  it('creates a complete hose with the fields the catalogue schema expects', async () => {
    const fetchMock = catalogueApi().on('POST', '/api/parts', ({ body }) =>
      jsonResponse(201, { ...(body as object), id: 'p-new', version: 1, retired: false }),
    );
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'New part' }));
    const dialog = await screen.findByRole('dialog');
    const type = (name: RegExp, text: string) => user.type(within(dialog).getByRole('textbox', { name }), text);
    await type(/Description/, 'Test hose -6 braided');
    await type(/Price per sale unit/, '4.75');
    await type(/^Dash size/, '6');
    await type(/Hose type/, 'braided-rubber');
    await type(/Inside diameter/, '0.34');
    await type(/Outside diameter/, '0.56');
    await user.selectOptions(within(dialog).getByRole('combobox', { name: /Liner/ }), 'rubber');
    await type(/Max working pressure/, '350');
    await type(/Max temperature/, '300');
    await type(/Min bend radius/, '3');
    await user.click(within(dialog).getByRole('checkbox', { name: 'ATF' }));
    await user.selectOptions(within(dialog).getByRole('combobox', { name: /Sale unit/ }), 'foot');
    await user.click(within(dialog).getByRole('button', { name: 'Create part' }));

    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/parts')).toHaveLength(1));
    expect(fetchMock.callsTo('POST', '/api/parts')[0].body).toMatchObject({
      kind: 'hose',
      priceCents: 475,
      saleUnit: { type: 'foot' },
      attributes: { dash: 6, hoseType: 'braided-rubber', liner: 'rubber', maxPressurePsi: 350, fluids: ['atf'] },
    });
  });

  it('requires a reason for a stock adjustment', async () => {
    const part = apiParts.find((p) => p.kind === 'clamp')!;
    const fetchMock = catalogueApi([part]).on('GET', `/api/parts/${part.id}/stock-adjustments`, () => jsonResponse(200, []));
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: `Stock of ${part.description}` }));
    const form = await screen.findByRole('form', { name: 'Adjust stock' });
    await user.type(within(form).getByRole('textbox', { name: /Change/ }), '5');
    await user.click(within(form).getByRole('button', { name: 'Adjust stock' }));
    expect(await within(form).findByText(/Say why the stock changes/)).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', `/api/parts/${part.id}/stock-adjustments`)).toHaveLength(0);

    fetchMock.on('POST', `/api/parts/${part.id}/stock-adjustments`, () =>
      jsonResponse(201, { stockOnHand: part.stockOnHand + 5, version: 2 }),
    );
    await user.type(within(form).getByRole('textbox', { name: /Reason/ }), 'Shelf count');
    await user.click(within(form).getByRole('button', { name: 'Adjust stock' }));
    await waitFor(() => expect(fetchMock.callsTo('POST', `/api/parts/${part.id}/stock-adjustments`)).toHaveLength(1));
    expect(fetchMock.callsTo('POST', `/api/parts/${part.id}/stock-adjustments`)[0].body).toEqual({ delta: 5, reason: 'Shelf count' });
  });

  it('hides editing from a fabricator, who reads the catalogue', async () => {
    renderApp({ path: '/catalogue', user: demoUsers.fabricator, fetchMock: catalogueApi() });
    await screen.findByRole('table', { name: 'Parts' });
    expect(screen.queryByRole('button', { name: 'New part' })).not.toBeInTheDocument();
    expect(screen.queryByRole('tab', { name: 'Import price list' })).not.toBeInTheDocument();
  });
});

const harborCsvReading = (delimiter: 'comma' | 'semicolon', detected: boolean) => ({
  format: 'csv' as const,
  encoding: 'windows-1252',
  encodingDetected: true,
  delimiter,
  delimiterDetected: detected,
  summary: `Read as Windows-1252, separated by ${delimiter === 'comma' ? 'commas' : 'semicolons'}${detected ? '' : ' (as chosen)'}.`,
  choices: {
    encodings: [
      { value: 'utf-8', label: 'UTF-8' },
      { value: 'windows-1252', label: 'Windows-1252 (Western European)' },
    ],
    delimiters: [
      { value: 'comma', label: 'Comma (,)' },
      { value: 'semicolon', label: 'Semicolon (;)' },
      { value: 'tab', label: 'Tab' },
    ],
  },
});

describe('Catalogue › Import price list', () => {
  it('shows the row-by-row report of the dry run and keeps Import disabled', async () => {
    vi.mocked(requests.previewPriceList)
      .mockResolvedValueOnce({
        readAs: harborCsvReading('comma', true),
        headers: ['Item', 'Desc', 'List price', 'UOM'],
        mapping: { partNumber: 'Item', description: 'Desc', price: 'List price' },
        rows: [],
        report: [],
        counts: { new: 0, updated: 0, unchanged: 0, errors: 0 },
      })
      .mockResolvedValueOnce({
        readAs: harborCsvReading('comma', true),
        headers: ['Item', 'Desc', 'List price', 'UOM'],
        mapping: { partNumber: 'Item', description: 'Desc', price: 'List price' },
        rows: [],
        report: [
          { row: 4, column: 'List price', message: 'Not a number: "call"' },
          { row: 9, column: 'Item', message: 'Unknown part number HL-0000' },
        ],
        counts: { new: 0, updated: 12, unchanged: 3, errors: 2 },
      });
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock: catalogueApi() });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('tab', { name: 'Import price list' }));
    await user.selectOptions(await screen.findByRole('combobox', { name: /Supplier/ }), 'demo-supplier-harbor');
    const file = new File(['Item,Desc,List price\n'], 'harbor-prices.csv', { type: 'text/csv' });
    await user.upload(screen.getByLabelText(/Price list file/), file);
    await user.click(screen.getByRole('button', { name: 'Read columns' }));

    expect(await screen.findByRole('combobox', { name: /Supplier part number/ })).toHaveValue('Item');
    await user.click(screen.getByRole('button', { name: 'Check the rows (dry run)' }));

    const report = await screen.findByRole('table', { name: 'Import report' });
    const rows = within(report)
      .getAllByRole('row')
      .slice(1)
      .map((row) => within(row).getAllByRole('cell').map((cell) => cell.textContent));
    expect(rows).toEqual([
      ['4', 'List price', 'Not a number: "call"'],
      ['9', 'Item', 'Unknown part number HL-0000'],
    ]);
    expect(screen.getByText('0 new · 12 updated · 3 unchanged · 2 rows with errors')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import' })).toBeDisabled();
    expect(vi.mocked(requests.previewPriceList).mock.calls[1][0]).toMatchObject({
      supplierId: 'demo-supplier-harbor',
      mapping: { partNumber: 'Item', description: 'Desc', price: 'List price' },
    });
  });

  it('says how a CSV was read and reads it again with the separator and encoding the user chooses', async () => {
    const mapped = { partNumber: 'Item', description: 'Desc', price: 'List price' };
    vi.mocked(requests.previewPriceList).mockReset();
    vi.mocked(requests.commitPriceList).mockReset();
    vi.mocked(requests.previewPriceList)
      .mockResolvedValueOnce({
        readAs: harborCsvReading('semicolon', true),
        headers: ['Item,Desc,List price'],
        mapping: {},
        rows: [],
        report: [],
        counts: { new: 0, updated: 0, unchanged: 0, errors: 0 },
      })
      .mockResolvedValueOnce({
        readAs: harborCsvReading('comma', false),
        headers: ['Item', 'Desc', 'List price'],
        mapping: mapped,
        rows: [],
        report: [],
        counts: { new: 0, updated: 0, unchanged: 0, errors: 0 },
      })
      .mockResolvedValueOnce({
        readAs: harborCsvReading('comma', false),
        headers: ['Item', 'Desc', 'List price'],
        mapping: mapped,
        rows: [],
        report: [],
        counts: { new: 0, updated: 2, unchanged: 0, errors: 0 },
      });
    vi.mocked(requests.commitPriceList).mockResolvedValueOnce({ new: 0, updated: 2, unchanged: 0, errors: 0 });
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock: catalogueApi() });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('tab', { name: 'Import price list' }));
    await user.selectOptions(await screen.findByRole('combobox', { name: /Supplier/ }), 'demo-supplier-harbor');
    await user.upload(screen.getByLabelText(/Price list file/), new File(['Item,Desc,List price\n'], 'harbor-prices.csv', { type: 'text/csv' }));
    await user.click(screen.getByRole('button', { name: 'Read columns' }));

    expect(await screen.findByText('Read as Windows-1252, separated by semicolons.')).toBeInTheDocument();
    expect(screen.getByRole('combobox', { name: /Separator/ })).toHaveValue('semicolon');
    expect(screen.getByRole('combobox', { name: /Text encoding/ })).toHaveValue('windows-1252');
    await user.selectOptions(screen.getByRole('combobox', { name: /Separator/ }), 'comma');

    expect(await screen.findByText('Read as Windows-1252, separated by commas (as chosen).')).toBeInTheDocument();
    expect(vi.mocked(requests.previewPriceList).mock.calls[1][0]).toMatchObject({ csv: { delimiter: 'comma' } });
    expect(vi.mocked(requests.previewPriceList).mock.calls[1][0].mapping).toBeUndefined();
    expect(await screen.findByRole('combobox', { name: /Supplier part number/ })).toHaveValue('Item');
    await user.click(screen.getByRole('button', { name: 'Check the rows (dry run)' }));
    await user.click(await screen.findByRole('button', { name: 'Import' }));
    await screen.findByText(/Imported: 0 new, 2 updated/);
    // The dry run and the import read the file the same way as the preview the user saw.
    expect(vi.mocked(requests.previewPriceList).mock.calls[2][0]).toMatchObject({ csv: { delimiter: 'comma' }, mapping: mapped });
    expect(vi.mocked(requests.commitPriceList).mock.calls[0][0]).toMatchObject({ csv: { delimiter: 'comma' }, mapping: mapped });
  });

  it('refuses a file that is not .xlsx or .csv before sending it', async () => {
    renderApp({ path: '/catalogue', user: demoUsers['parts-clerk'], fetchMock: catalogueApi() });
    const user = userEvent.setup({ applyAccept: false });
    await user.click(await screen.findByRole('tab', { name: 'Import price list' }));
    await user.upload(screen.getByLabelText(/Price list file/), new File(['%PDF'], 'prices.pdf', { type: 'application/pdf' }));
    expect(await screen.findByText(/choose an .xlsx workbook or a .csv file/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Read columns' })).toBeDisabled();
  });
});
