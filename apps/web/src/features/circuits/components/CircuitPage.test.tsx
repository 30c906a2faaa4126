import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiBuild } from '../../builds/test-support/build-fixtures';
import { apiCircuit, checkResult, coolerDraft, lineReport } from '../test-support/circuit-fixtures';

const hosePart = {
  id: 'hose-6',
  kind: 'hose',
  supplierId: 's-1',
  supplierPartNumber: 'TW-H6',
  description: '-6 braided rubber hose',
  priceCents: 600,
  saleUnit: { type: 'foot' },
  stockOnHand: 0,
  retired: false,
  attributes: { dash: 6, hoseType: 'braided-rubber', idIn: 0.34, odIn: 0.59, liner: 'rubber', maxPressurePsi: 350, maxTempF: 300, minBendRadiusIn: 3, fluids: ['atf'] },
};

function circuitApi(cutLengthsIn: (number | null)[]) {
  const lines = cutLengthsIn.map((cut, i) => lineReport(i === 0 ? 'line-1' : `line-${i + 1}`, cut));
  return createFetchMock()
    .on('GET', '/api/circuits/c-1', () => jsonResponse(200, apiCircuit('c-1')))
    .on('GET', '/api/builds/b-1', () => jsonResponse(200, apiBuild('b-1')))
    .on('GET', '/api/circuits/c-1/draft', () => jsonResponse(200, { document: coolerDraft, draftVersion: 3 }))
    .on('GET', '/api/circuits/c-1/check', () => jsonResponse(200, checkResult(lines)))
    .on('GET', '/api/parts/hose-6', () => jsonResponse(200, hosePart));
}

async function cutListRows() {
  const table = await screen.findByRole('table', { name: 'Cut list' });
  return within(table).getAllByRole('row').slice(1);
}

describe('circuit page', () => {
  it('shows the header with the ratings and the safety note for an oil circuit', async () => {
    renderApp({ path: '/circuits/c-1', user: demoUsers.fabricator, fetchMock: circuitApi([20]) });

    expect(await screen.findByRole('heading', { name: 'Transmission cooler' })).toBeInTheDocument();
    expect(screen.getByText('Fluid: ATF')).toBeInTheDocument();
    expect(screen.getByText(/150 psi · 250 °F/)).toBeInTheDocument();
    expect(screen.getByLabelText('Safety')).toHaveTextContent('take precedence');
    expect(screen.getByRole('tab', { name: 'Sketch' })).toHaveAttribute('aria-selected', 'true');
  });

  it('lists the revisions and opens one read-only with its summary and its check', async () => {
    const revision = { id: 'r-1', circuitId: 'c-1', number: 1, message: 'First fit-up', authorId: 'u-fab', author: { id: 'u-fab', displayName: 'Rafe Okonkwo' }, draftVersion: 2, createdAt: '2026-01-06T10:00:00.000Z' };
    const fetchMock = circuitApi([23.6875])
      .on('GET', '/api/circuits/c-1/revisions', () => jsonResponse(200, [revision]))
      .on('GET', '/api/circuits/c-1/revisions/1', () => jsonResponse(200, { ...revision, document: coolerDraft }))
      .on('POST', '/api/rules/evaluate', () => jsonResponse(200, checkResult([lineReport('line-1', 23.6875)])));
    renderApp({ path: '/circuits/c-1?tab=revisions', user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    const table = await screen.findByRole('table', { name: 'Revisions' });
    expect(within(table).getByText('First fit-up')).toBeInTheDocument();
    await user.click(within(table).getByRole('button', { name: 'Open revision 1' }));

    const summary = await screen.findByLabelText('Sketch contents');
    expect(within(summary).getByText('Units').nextSibling).toHaveTextContent('2');
    expect(within(summary).getByText('Ports').nextSibling).toHaveTextContent('3');
    expect(within(summary).getByText('Lines').nextSibling).toHaveTextContent('1');
    const [row] = await cutListRows();
    expect(within(row).getAllByRole('cell')[4]).toHaveTextContent('602 mm');
    expect(fetchMock.callsTo('POST', '/api/rules/evaluate')[0].body).toMatchObject({ schema: 'linesmith.circuit/1', lines: [{ id: 'line-1' }] });
  });

  // Expected figures worked by hand: 23.6875 in = 23 + 11/16 in; 1 in = 25.4 mm exactly (NIST SP 811,
  // Appendix B), so 23.6875 in = 601.6625 mm → up to 602 mm and 17.3125 in = 17-5/16 in = 439.7375 mm → up to 440 mm.
  it('lists each line with its cut length in fractional inches and millimetres, hose dash and end stacks', async () => {
    renderApp({ path: '/circuits/c-1?tab=cut-list', user: demoUsers.fabricator, fetchMock: circuitApi([23.6875, 17.3125, null]) });

    const [first, second, third] = await cutListRows();
    const cells = (row: HTMLElement) => within(row).getAllByRole('cell').map((cell) => cell.textContent);
    await waitFor(() => expect(cells(first)[2]).toBe('-6'));
    expect(cells(first)[1]).toBe('-6 braided rubber hose');
    expect(cells(first)[3]).toMatch(/^23-11\/16"/);
    expect(cells(first)[4]).toBe('602 mm');
    // Slack on every line: the fixture's 1-1/2 in is the shop minimum across mounts (common practice), and the cut list says so.
    expect(cells(first)[5]).toBe('1-1/2"shop minimum, across mounts');
    expect(cells(first)[6]).toBe('-6 O-ring boss male to -6 37° flare male-6 straight hose end');
    expect(cells(first)[7]).toBe('-6 90° hose end');
    expect(cells(second)[3]).toMatch(/^17-5\/16"/);
    expect(cells(second)[4]).toBe('440 mm');
    expect(cells(third)[3]).toBe('Not measured');

    expect(screen.getByText('1 caution')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Parts' })).toHaveTextContent('TW-E690');
  });

  // Common practice: cut long, never short. 23 in × 25.4 mm/in (NIST SP 811) = 584.2 mm → 585 mm, not 584;
  // 20.53 in × 16 = 328.48 sixteenths → 329/16 = 20-9/16 in (not 20-1/2), 20.53 × 25.4 = 521.462 mm → 522 mm.
  it('never shows a cut length shorter than the cut: inches up to the next 1/16, millimetres up to the next whole one', async () => {
    renderApp({ path: '/circuits/c-1?tab=cut-list', user: demoUsers.fabricator, fetchMock: circuitApi([23, 20.53]) });

    const [first, second] = await cutListRows();
    const cells = (row: HTMLElement) => within(row).getAllByRole('cell').map((cell) => cell.textContent);
    expect(cells(first)[3]).toMatch(/^23"/);
    expect(cells(first)[4]).toBe('585 mm');
    expect(cells(second)[3]).toMatch(/^20-9\/16"/);
    expect(cells(second)[4]).toBe('522 mm');
    // The total of the cuts rounds up as well: 23 + 20.53 = 43.53 in × 16 = 696.48 → 697/16 = 43-9/16 in.
    expect(screen.getByText(/2 lines · 43-9\/16" of hose cut/)).toBeInTheDocument();
  });

  it('shows the other lengths in millimetres after the units toggle', async () => {
    renderApp({ path: '/circuits/c-1?tab=cut-list', user: demoUsers.fabricator, fetchMock: circuitApi([23.6875]) });
    const [row] = await cutListRows();
    // Support at 9 in (fixture) = 228.6 mm → 229 mm.
    expect(within(row).getByText(/1 at 9"/)).toBeInTheDocument();

    await userEvent.setup().click(screen.getByRole('radio', { name: 'Millimetres' }));

    expect(await within(row).findByText('1 at 229 mm')).toBeInTheDocument();
    expect(within(row).getAllByRole('cell')[3].textContent).toMatch(/^23-11\/16"/);
  });
});
