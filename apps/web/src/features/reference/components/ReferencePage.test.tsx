import { families, familyLabel, identifyThread, listSizes, threadReadingSchema, threadTable, type Family } from '@linesmith/catalog';
import { inToMm, ruleRegistry } from '@linesmith/routing';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';

/**
 * The reference API (contract: `/api/reference/*`) answered from the same libraries the server
 * uses, so the tests check the page against the standards rather than against copied numbers.
 */
function referenceApi() {
  return createFetchMock()
    .on('GET', '/api/reference/families', () =>
      jsonResponse(200, families.map((family) => ({ family, label: familyLabel(family), sizes: listSizes(family) }))),
    )
    .on('GET', '/api/reference/threads', ({ url }) => {
      // The API lists tables, filtered to the family asked for.
      const family = url.searchParams.get('family') as Family;
      return jsonResponse(200, [{ family, label: familyLabel(family), rows: threadTable(family) }]);
    })
    .on('POST', '/api/reference/identify', ({ body }) =>
      jsonResponse(200, { candidates: identifyThread(threadReadingSchema.parse(body)) }),
    )
    .on('GET', '/api/reference/rules', () =>
      jsonResponse(
        200,
        ruleRegistry.map(({ code, severity, title, description }) => ({ code, severity, title, description })),
      ),
    );
}

function openReference(tab?: string, fetchMock = referenceApi()) {
  const path = tab ? `/reference?tab=${tab}` : '/reference';
  return { ...renderApp({ path, user: demoUsers.fabricator, fetchMock }), fetchMock };
}

/** Cell texts of a table's body rows, keyed by the first cell (the size). */
function rowsBySize(table: HTMLElement): Map<string, string[]> {
  const rows = within(table).getAllByRole('row').slice(1);
  return new Map(
    rows.map((row) => {
      const cells = within(row)
        .getAllByRole('cell')
        .map((cell) => cell.textContent ?? '');
      return [cells[0], cells];
    }),
  );
}

function columnIndex(table: HTMLElement, header: RegExp): number {
  const headers = within(table).getAllByRole('columnheader');
  const index = headers.findIndex((h) => header.test(h.textContent ?? ''));
  expect(index, `column ${header}`).toBeGreaterThanOrEqual(0);
  return index;
}

describe('Reference › Thread tables', () => {
  it('shows the 37° flare table first, with SAE J514 threads by dash size and its source', async () => {
    openReference();
    const table = await screen.findByRole('table', { name: '37° flare threads' });
    const rows = rowsBySize(table);
    // SAE J514 (DOMAIN.md §1 table): -6 is 3/8 in tube on 9/16-18 UNF; -12 is 3/4 in tube on 1-1/16-12 UN.
    expect(rows.get('-6')?.slice(0, 5)).toEqual(['-6', '9/16-18 UNF', '9/16', '18 TPI', '3/8']);
    expect(rows.get('-12')?.slice(0, 5)).toEqual(['-12', '1-1/16-12 UN', '1-1/16', '12 TPI', '3/4']);
    // ASME B1.1 basic pitch diameter of 9/16-18: 0.5264 in.
    expect(rows.get('-6')?.[columnIndex(table, /^Basic pitch diameter/)]).toBe('0.5264');
    expect(screen.getByText(/^Source: SAE J514/)).toBeInTheDocument();
  });

  it('in millimetres shows every diameter as inToMm of the inch value (25.4 mm per international inch)', async () => {
    openReference();
    const user = userEvent.setup();
    const table = await screen.findByRole('table', { name: '37° flare threads' });
    await user.click(screen.getByRole('radio', { name: 'Millimetres' }));

    expect(within(table).getByRole('columnheader', { name: 'Major diameter (mm)' })).toBeInTheDocument();
    const rows = rowsBySize(table);
    const major = columnIndex(table, /^Major diameter/);
    const tube = columnIndex(table, /^Tube OD/);
    for (const row of threadTable('flare37')) {
      expect(rows.get(row.size)?.[major]).toBe(inToMm(row.majorDiameterIn).toFixed(2));
      expect(rows.get(row.size)?.[tube]).toBe(inToMm(row.tubeOdIn ?? Number.NaN).toFixed(2));
    }
    // Worked by hand with the 1959 international inch (NIST SP 811, B.8): 9/16 in = 14.2875 mm, 1/4 in = 6.35 mm.
    expect(rows.get('-6')?.[major]).toBe('14.29');
    expect(rows.get('-4')?.[tube]).toBe('6.35');
    // Pitch stays in the thread's own terms.
    expect(rows.get('-6')?.[3]).toBe('18 TPI');
  });

  it('switches family: NPT shows pipe OD and the gauge values E0 and L2 (ASME B1.20.1 Table 2)', async () => {
    const { fetchMock } = openReference();
    const user = userEvent.setup();
    await screen.findByRole('table', { name: '37° flare threads' });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Family' }), 'npt');

    const table = await screen.findByRole('table', { name: 'NPT pipe thread threads' });
    const row = rowsBySize(table).get('1/4');
    // ASME B1.20.1 Table 2, 1/4-18: pipe OD 0.540, E0 0.47739, L2 0.4018.
    expect(row?.[columnIndex(table, /^Pipe OD/)]).toBe('0.54');
    expect(row?.[columnIndex(table, /^E0/)]).toBe('0.4774');
    expect(row?.[columnIndex(table, /^L2/)]).toBe('0.4018');
    expect(fetchMock.callsTo('GET', '/api/reference/threads').map((r) => r.url.searchParams.get('family'))).toEqual([
      'flare37',
      'npt',
    ]);
  });

  it('prints the per-size sources where a table mixes confirmed and remembered rows', async () => {
    openReference();
    const user = userEvent.setup();
    await screen.findByRole('table', { name: '37° flare threads' });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Family' }), 'invflare45');
    await screen.findByRole('table', { name: 'Inverted 45° flare threads' });
    const sources = screen.getByRole('list', { name: 'Sources by size' });
    // DOMAIN.md §1: only the 3/16 and 1/4 inverted-flare rows are confirmed by published charts.
    expect(within(sources).getByText(/^3\/16, 1\/4: .*confirmed/)).toBeInTheDocument();
    expect(within(sources).getByText(/from memory/)).toBeInTheDocument();
  });

  it('shows an error with a retry when the families cannot be loaded', async () => {
    const fetchMock = referenceApi().on('GET', '/api/reference/families', () =>
      errorResponse(503, 'unavailable', 'The server is starting.'),
    );
    openReference(undefined, fetchMock);
    expect(await screen.findByRole('alert')).toHaveTextContent('The thread families could not be loaded: The server is starting.');
    fetchMock.on('GET', '/api/reference/families', () => jsonResponse(200, [{ family: 'orb', label: 'O-ring boss' }]));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('table', { name: 'O-ring boss threads' })).toBeInTheDocument();
  });
});

describe('Reference › Thread identifier', () => {
  it('explains how to measure before the first search', async () => {
    openReference('identify');
    expect(await screen.findByText('How to measure a male thread')).toBeInTheDocument();
    expect(screen.getByText(/caliper/)).toBeInTheDocument();
    expect(screen.getByText(/thread gauge/)).toBeInTheDocument();
  });

  it('validates the reading before calling the API', async () => {
    const { fetchMock } = openReference('identify');
    const user = userEvent.setup();
    const identify = await screen.findByRole('button', { name: 'Identify' });

    await user.click(identify);
    expect(screen.getByRole('alert')).toHaveTextContent('Enter the measured diameter, the thread (TPI or pitch), or both.');

    await user.type(screen.getByRole('textbox', { name: /Measured outside diameter/ }), 'nine sixteenths');
    await user.type(screen.getByRole('textbox', { name: /Threads per inch/ }), '1.5');
    await user.click(identify);
    expect(screen.getByText('Enter the diameter in inches as a decimal or a fraction, for example 0.555 or 9/16.')).toBeInTheDocument();
    expect(screen.getByText(/1.5 threads per inch is coarser than any fitting thread. Is it a pitch in mm\?/)).toBeInTheDocument();

    const diameter = screen.getByRole('textbox', { name: /Measured outside diameter/ });
    await user.clear(diameter);
    await user.type(diameter, '14.1');
    await user.click(identify);
    expect(screen.getByText(/14.1 in is larger than any fitting thread. Was it measured in millimetres\?/)).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/reference/identify')).toHaveLength(0);
  });

  it('ranks 9/16-18 first for a -6 male read at 0.56 in and 18 TPI, with a bar, a percent and the hint', async () => {
    const { fetchMock } = openReference('identify');
    const user = userEvent.setup();
    await user.type(await screen.findByRole('textbox', { name: /Measured outside diameter/ }), '0.56');
    await user.type(screen.getByRole('textbox', { name: /Threads per inch/ }), '18');
    await user.click(screen.getByRole('button', { name: 'Identify' }));

    const table = await screen.findByRole('table', { name: 'Candidate threads' });
    expect(fetchMock.callsTo('POST', '/api/reference/identify')[0].body).toEqual({ odIn: 0.56, tpi: 18 });
    const rows = within(table).getAllByRole('row').slice(1);
    // SAE J514 / SAE J1926-1: -6 37° flare and -6 O-ring boss both use 9/16-18 UNF (0.5625 in major).
    const firstTwo = rows.slice(0, 2).map((row) => within(row).getAllByRole('cell')[2].textContent);
    expect(firstTwo.sort()).toEqual(['37° flare -6', 'O-ring boss -6']);
    const first = within(rows[0]).getAllByRole('cell');
    expect(first[1]).toHaveTextContent('9/16-18 UNF');
    expect(first[3]).toHaveTextContent('100 %');
    expect(within(rows[0]).getByRole('progressbar', { name: 'Match 100 %' })).toBeInTheDocument();
    expect(first[4]).toHaveTextContent(/tell them apart by the seat/);
    // 1/4-18 NPT (0.540 in, 18 TPI) is the classic look-alike and ranks below, with its taper named.
    const npt = rows.find((row) => within(row).getAllByRole('cell')[2].textContent === 'NPT pipe thread 1/4');
    expect(npt).toBeDefined();
    expect(within(npt as HTMLElement).getAllByRole('cell')[4]).toHaveTextContent(/taper/);
  });

  it('sends millimetres, a pitch and the taper answer as the switches say', async () => {
    const { fetchMock } = openReference('identify');
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: 'mm' }));
    await user.type(screen.getByRole('textbox', { name: /Measured outside diameter/ }), '13,9');
    await user.click(screen.getByRole('radio', { name: 'Pitch (mm)' }));
    await user.type(screen.getByRole('textbox', { name: /Pitch \(mm\)/ }), '1.5');
    await user.click(screen.getByRole('radio', { name: 'No' }));
    await user.click(screen.getByRole('button', { name: 'Identify' }));

    const table = await screen.findByRole('table', { name: 'Candidate threads' });
    expect(fetchMock.callsTo('POST', '/api/reference/identify')[0].body).toEqual({ odMm: 13.9, pitchMm: 1.5, tapered: false });
    // ISO 261: M14x1.5 has a 14 mm major diameter and 1.5 mm pitch.
    expect(within(within(table).getAllByRole('row')[1]).getAllByRole('cell')[1]).toHaveTextContent('M14x1.5');
  });

  it('says so when nothing matches, and shows the API error when the lookup fails', async () => {
    const fetchMock = referenceApi().on('POST', '/api/reference/identify', () => jsonResponse(200, { candidates: [] }));
    openReference('identify', fetchMock);
    const user = userEvent.setup();
    await user.type(await screen.findByRole('textbox', { name: /Threads per inch/ }), '40');
    await user.click(screen.getByRole('button', { name: 'Identify' }));
    expect(await screen.findByText(/No thread in the tables matches this reading/)).toBeInTheDocument();

    fetchMock.on('POST', '/api/reference/identify', () => errorResponse(500, 'internal', 'Something broke.'));
    await user.click(screen.getByRole('button', { name: 'Identify' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The thread could not be identified: Something broke.');
  });
});

describe('Reference › Joint checker', () => {
  async function pick(end: 'End A' | 'End B', family: string, size: string, gender: 'Male' | 'Female') {
    const user = userEvent.setup();
    const group = screen.getByRole('group', { name: end });
    await user.selectOptions(within(group).getByRole('combobox', { name: 'Family' }), family);
    await user.selectOptions(within(group).getByRole('combobox', { name: 'Size' }), size);
    await user.click(within(group).getByRole('radio', { name: gender }));
  }

  it('starts with a joining pair and needs no API call', async () => {
    const { fetchMock } = openReference('joints');
    const result = await screen.findByRole('status', { name: 'Joint check result' });
    expect(result).toHaveTextContent('Joins');
    expect(fetchMock.requests.filter((r) => r.url.pathname.startsWith('/api/reference'))).toHaveLength(0);
  });

  it('-6 37° flare male against 3/8 45° flare female: the threads differ (9/16-18 vs 5/8-18)', async () => {
    openReference('joints');
    await screen.findByRole('status', { name: 'Joint check result' });
    await pick('End A', 'flare37', '-6', 'Male');
    await pick('End B', 'flare45', '3/8', 'Female');

    const result = screen.getByRole('status', { name: 'Joint check result' });
    // DOMAIN.md §1 (SAE J514 vs SAE J512): 37° and 45° flare differ at -6, 9/16-18 vs 5/8-18.
    expect(result).toHaveTextContent('Blocker: the threads differ');
    expect(result).toHaveTextContent('9/16-18');
    expect(result).toHaveTextContent('5/8-18');
    expect(result).toHaveTextContent(/How to tell them apart:.*seat/);
    expect(result.querySelector('[data-severity="blocker"] svg')).not.toBeNull();
  });

  it('-4 37° flare male against 1/4 45° flare female: the threads engage but the seats differ', async () => {
    openReference('joints');
    await screen.findByRole('status', { name: 'Joint check result' });
    await pick('End A', 'flare37', '-4', 'Male');
    await pick('End B', 'flare45', '1/4', 'Female');

    const result = screen.getByRole('status', { name: 'Joint check result' });
    // SAE J514 and SAE J512 both put 7/16-20 UNF on 1/4 in tube: same thread, 37° vs 45° seat.
    expect(result).toHaveTextContent('Blocker: the seats differ');
    expect(result).toHaveTextContent('7/16-20');
    expect(result).toHaveTextContent('it will leak');
  });

  it('offers the sizes of the chosen family and flags two males', async () => {
    openReference('joints');
    await screen.findByRole('status', { name: 'Joint check result' });
    const group = screen.getByRole('group', { name: 'End B' });
    await userEvent.setup().selectOptions(within(group).getByRole('combobox', { name: 'Family' }), 'npt');
    const sizes = within(within(group).getByRole('combobox', { name: 'Size' }))
      .getAllByRole('option')
      .map((o) => o.textContent);
    // ASME B1.20.1 Table 2 sizes carried by the tables (DOMAIN.md §1).
    expect(sizes).toEqual(['1/16', '1/8', '1/4', '3/8', '1/2', '3/4', '1']);

    await pick('End A', 'npt', '1/4', 'Male');
    await pick('End B', 'npt', '1/4', 'Male');
    expect(screen.getByRole('status', { name: 'Joint check result' })).toHaveTextContent(
      'Blocker: both ends are the same gender',
    );
  });
});

describe('Reference › Joint checker, families of issue 14', () => {
  const user = () => userEvent.setup();
  const group = (end: 'End A' | 'End B') => screen.getByRole('group', { name: end });

  it('offers every family by its plain name, none by its code', async () => {
    openReference('joints');
    await screen.findByRole('status', { name: 'Joint check result' });
    const names = within(within(group('End A')).getByRole('combobox', { name: 'Family' }))
      .getAllByRole('option')
      .map((o) => o.textContent);
    expect(names).toEqual(
      expect.arrayContaining(['BSP parallel (ISO 228-1)', 'BSP taper (ISO 7-1)', 'O-ring face seal', 'NPTF dryseal pipe thread', 'Banjo bolt', 'Quick-connect (SAE J2044)']),
    );
    for (const name of names) expect(name).not.toMatch(/^(bspp|bspt|orfs|nptf|npsm|qc|banjo)$/);
  });

  it('1/4 BSPT male against 1/4 NPT female (ISO 7-1 19 TPI 55° vs ASME B1.20.1 18 TPI 60°): threads differ, with the flank-angle hint', async () => {
    openReference('joints');
    await screen.findByRole('status', { name: 'Joint check result' });
    await user().selectOptions(within(group('End A')).getByRole('combobox', { name: 'Family' }), 'bspt');
    await user().selectOptions(within(group('End A')).getByRole('combobox', { name: 'Size' }), '1/4');
    await user().click(within(group('End A')).getByRole('radio', { name: 'Male' }));
    await user().selectOptions(within(group('End B')).getByRole('combobox', { name: 'Family' }), 'npt');
    await user().selectOptions(within(group('End B')).getByRole('combobox', { name: 'Size' }), '1/4');
    await user().click(within(group('End B')).getByRole('radio', { name: 'Female' }));
    const result = screen.getByRole('status', { name: 'Joint check result' });
    expect(result).toHaveTextContent('Blocker: the threads differ');
    expect(result).toHaveTextContent(/How to tell them apart:.*55°/);
  });

  it('M14x1.5 ISO 6149 O-ring port against a sealing-edge male: the seats differ; a seat form picker appears for metric', async () => {
    openReference('joints');
    await screen.findByRole('status', { name: 'Joint check result' });
    for (const end of ['End A', 'End B'] as const) {
      await user().selectOptions(within(group(end)).getByRole('combobox', { name: 'Family' }), 'metric');
    }
    await user().selectOptions(within(group('End A')).getByRole('combobox', { name: 'Seat form' }), 'o-ring');
    await user().selectOptions(within(group('End A')).getByRole('combobox', { name: 'Size' }), 'M14x1.5');
    await user().click(within(group('End A')).getByRole('radio', { name: 'Female' }));
    await user().selectOptions(within(group('End B')).getByRole('combobox', { name: 'Seat form' }), 'sealing-edge');
    await user().selectOptions(within(group('End B')).getByRole('combobox', { name: 'Size' }), 'M14x1.5');
    await user().click(within(group('End B')).getByRole('radio', { name: 'Male' }));
    const result = screen.getByRole('status', { name: 'Joint check result' });
    expect(result).toHaveTextContent('Blocker: the seats differ');
    expect(result).toHaveTextContent('ISO 6149');
  });
});

describe('Reference › Rules', () => {
  it('lists every rule with its severity in words and what it checks', async () => {
    openReference('rules');
    const table = await screen.findByRole('table', { name: 'Rules' });
    const rows = new Map(
      within(table)
        .getAllByRole('row')
        .slice(1)
        .map((row) => {
          const cells = within(row).getAllByRole('cell');
          return [cells[0].textContent, cells[1].textContent];
        }),
    );
    // Severities of DOMAIN.md §5, written out here.
    expect(rows.get('joint-seat')).toBe('Blocker');
    expect(rows.get('heat-contact')).toBe('Blocker');
    expect(rows.get('support-gap')).toBe('Caution');
    expect(rows.get('lube-path-valve')).toBe('Caution');
    expect(rows.size).toBe(ruleRegistry.length);
  });

  it('shows the safety note at the foot of the page', async () => {
    openReference('rules');
    const note = await screen.findByLabelText('Safety');
    expect(note).toHaveTextContent(/take precedence over Linesmith's checks/);
  });

  it('moves between tabs and keeps the tab in the address', async () => {
    const { router } = openReference();
    await userEvent.setup().click(await screen.findByRole('tab', { name: 'Rules' }));
    expect(await screen.findByRole('table', { name: 'Rules' })).toBeInTheDocument();
    expect(router.state.location.search).toBe('?tab=rules');
  });
});
