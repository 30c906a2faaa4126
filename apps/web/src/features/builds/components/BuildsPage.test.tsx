import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import type { BuildBody } from '../api/build-schema';
import { apiBuild } from '../test-support/build-fixtures';

// Expected requests and answers: the builds API contract (`GET /api/builds?search=&status=&sort=
// &direction=&page=&pageSize=` → `{ items, total, page, pageSize }`).
const customers = ['Corliss Ambry', 'Tamsin Voller', 'Odell Pryce', 'Nadia Hurst', 'Ivo Brennick'];
const allBuilds: BuildBody[] = customers.map((name, i) =>
  apiBuild(`b-${i + 1}`, { customer: { name, phone: '', email: '' }, vehicle: { year: String(1970 + i), make: 'Harlan', model: `Model ${i + 1}`, engine: '', transmission: '' } }),
);

/** A builds API over an in-memory list, searching and paging like the contract says. */
function buildsApi(builds: BuildBody[] = allBuilds) {
  return createFetchMock().on('GET', '/api/builds', ({ url }) => {
    const search = url.searchParams.get('search')?.toLowerCase() ?? '';
    const page = Number(url.searchParams.get('page'));
    const pageSize = Number(url.searchParams.get('pageSize'));
    const matching = builds.filter(
      (b) => !search || b.customer.name.toLowerCase().includes(search) || b.vehicle.model.toLowerCase().includes(search),
    );
    const items = matching.slice((page - 1) * pageSize, page * pageSize);
    return jsonResponse(200, { items, total: matching.length, page, pageSize });
  });
}

async function customerColumn() {
  // The first render loads the lazy route; a busy machine needs more than the default second.
  const table = await screen.findByRole('table', { name: 'Builds' }, { timeout: 5000 });
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[1].textContent);
}

describe('Builds table', () => {
  it('lists the builds newest first and searches through the API after typing stops', async () => {
    const fetchMock = buildsApi();
    renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });

    expect(await customerColumn()).toEqual(customers);
    const first = fetchMock.callsTo('GET', '/api/builds')[0].url.searchParams;
    expect(Object.fromEntries(first)).toEqual({ sort: 'updatedAt', direction: 'desc', page: '1', pageSize: '25' });

    const user = userEvent.setup();
    await user.keyboard('/');
    expect(screen.getByRole('searchbox')).toHaveFocus();
    await user.keyboard('pryce');

    await waitFor(async () => expect(await customerColumn()).toEqual(['Odell Pryce']));
    const searches = fetchMock.callsTo('GET', '/api/builds').map((r) => r.url.searchParams.get('search'));
    // Debounced: no request per keystroke.
    expect(searches.filter((s) => s !== null)).toEqual(['pryce']);
  });

  it('pages through the builds with Previous and Next', async () => {
    const many = Array.from({ length: 30 }, (_, i) =>
      apiBuild(`b-${i}`, { customer: { name: `Customer ${String(i + 1).padStart(2, '0')}`, phone: '', email: '' } }),
    );
    const fetchMock = buildsApi(many);
    renderApp({ path: '/builds', user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    expect(await customerColumn()).toHaveLength(25);
    expect(screen.getByText(/30 builds · page 1 of 2/)).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Next' }));

    await waitFor(async () => expect(await customerColumn()).toEqual(['Customer 26', 'Customer 27', 'Customer 28', 'Customer 29', 'Customer 30']));
    expect(fetchMock.callsTo('GET', '/api/builds').at(-1)?.url.searchParams.get('page')).toBe('2');
    expect(screen.getByRole('button', { name: 'Next' })).toBeDisabled();
  });

  it('sorts by customer when the column header is clicked, then reverses', async () => {
    const fetchMock = buildsApi();
    renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });
    const user = userEvent.setup();
    await customerColumn();

    const lastSort = () => {
      const params = fetchMock.callsTo('GET', '/api/builds').at(-1)!.url.searchParams;
      return `${params.get('sort')} ${params.get('direction')}`;
    };
    await user.click(screen.getByRole('button', { name: 'Customer' }));
    await waitFor(() => expect(lastSort()).toBe('customer asc'));
    expect(screen.getByRole('columnheader', { name: 'Customer' })).toHaveAttribute('aria-sort', 'ascending');

    await user.click(screen.getByRole('button', { name: 'Customer' }));
    await waitFor(() => expect(lastSort()).toBe('customer desc'));
  });

  it('invites the first build when the shop has none', async () => {
    renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock: buildsApi([]) });
    expect(await screen.findByRole('heading', { name: 'No builds yet' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Start the first build' })).toBeInTheDocument();
  });

  it('shows the error with a retry that loads the table', async () => {
    let fail = true;
    const fetchMock = createFetchMock().on('GET', '/api/builds', () =>
      fail ? errorResponse(400, 'validation_failed', 'The filter is not valid.') : jsonResponse(200, { items: allBuilds, total: 5, page: 1, pageSize: 25 }),
    );
    renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });

    expect(await screen.findByRole('alert')).toHaveTextContent('The builds could not be loaded: The filter is not valid.');
    fail = false;
    await userEvent.setup().click(screen.getByRole('button', { name: 'Try again' }));
    expect(await customerColumn()).toEqual(customers);
  });

  it('opens a build with Enter on its row', async () => {
    const fetchMock = buildsApi().on('GET', '/api/builds/b-2', () => jsonResponse(200, allBuilds[1]));
    fetchMock.on('GET', '/api/builds/b-2/circuits', () => jsonResponse(200, []));
    fetchMock.on('GET', '/api/builds/b-2/uploads', () => jsonResponse(200, []));
    const { router } = renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });
    await customerColumn();

    const row = screen.getByRole('row', { name: /Tamsin Voller/ });
    row.focus();
    await userEvent.setup().keyboard('{Enter}');

    await waitFor(() => expect(router.state.location.pathname).toBe('/builds/b-2'));
    expect(await screen.findByRole('heading', { name: /1971 Harlan Model 2 — Tamsin Voller/ })).toBeInTheDocument();
  });

  it('checks the new-build form before sending it, then opens the created build', async () => {
    const created = apiBuild('b-new', { customer: { name: 'Wren Castell', phone: '', email: 'wren@customer.example' } });
    const fetchMock = buildsApi()
      .on('POST', '/api/builds', () => jsonResponse(201, created))
      .on('GET', '/api/builds/b-new/circuits', () => jsonResponse(200, []))
      .on('GET', '/api/builds/b-new/uploads', () => jsonResponse(200, []));
    const { router } = renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });
    const user = userEvent.setup();
    await customerColumn();

    await user.click(screen.getByRole('button', { name: 'New build' }));
    const dialog = await screen.findByRole('dialog', { name: 'New build' });
    await user.type(within(dialog).getByLabelText(/^Year/), '1850');
    await user.type(within(dialog).getByLabelText(/^Customer e-mail/), 'wren@');
    await user.click(within(dialog).getByRole('button', { name: 'Create build' }));

    expect(within(dialog).getByText('Enter the vehicle make.')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter the customer name.')).toBeInTheDocument();
    expect(within(dialog).getByText(/^Enter a year from 1900 to/)).toBeInTheDocument();
    expect(within(dialog).getByText('Enter a valid e-mail address, or leave it empty.')).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/builds')).toHaveLength(0);

    const year = within(dialog).getByLabelText(/^Year/);
    await user.clear(year);
    await user.type(year, '1976');
    await user.type(within(dialog).getByLabelText(/^Make/), 'Harlan');
    await user.type(within(dialog).getByLabelText(/^Model/), 'Half-ton pickup');
    await user.type(within(dialog).getByLabelText(/^Customer name/), 'Wren Castell');
    await user.type(within(dialog).getByLabelText(/^Customer e-mail/), 'customer.example');
    await user.click(within(dialog).getByRole('button', { name: 'Create build' }));

    await waitFor(() => expect(router.state.location.pathname).toBe('/builds/b-new'));
    expect(fetchMock.callsTo('POST', '/api/builds')[0].body).toEqual({
      vehicle: { year: '1976', make: 'Harlan', model: 'Half-ton pickup', engine: '', transmission: '' },
      customer: { name: 'Wren Castell', phone: '', email: 'wren@customer.example' },
      notes: '',
      status: 'open',
    });
  });
});
