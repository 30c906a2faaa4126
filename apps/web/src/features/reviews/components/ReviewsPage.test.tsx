import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';

const row = {
  reviewId: 'rv-1',
  circuitId: 'c-1',
  circuitName: 'Transmission cooler',
  build: { id: 'b-1', label: '1976 Harlan Half-ton — Corbin Vale' },
  fabricator: { id: 'u-fab', displayName: 'Rafe Okonkwo' },
  revisionNumber: 2,
  status: 'in-review',
  submittedAt: '2026-01-07T09:00:00.000Z',
  blockers: 1,
  cautions: 2,
};

describe('review queue', () => {
  it('lists submitted circuits with their flag counts and opens a review from the row', async () => {
    const fetchMock = createFetchMock().on('GET', '/api/reviews', () => jsonResponse(200, [row]));
    const { router } = renderApp({ path: '/reviews', user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    const table = await screen.findByRole('table', { name: 'Review queue' });
    const cells = within(within(table).getAllByRole('row')[1]).getAllByRole('cell');
    expect(cells[0]).toHaveTextContent('1976 Harlan Half-ton — Corbin Vale');
    expect(cells[2]).toHaveTextContent('Rafe Okonkwo');
    expect(cells[5]).toHaveTextContent('1 blocker');
    expect(cells[5]).toHaveTextContent('2 cautions');
    expect(fetchMock.callsTo('GET', '/api/reviews')[0].url.search).toBe('?status=in-review&sort=submittedAt');

    await user.click(within(table).getByRole('link', { name: 'Transmission cooler' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/reviews/c-1'));
  });

  it('says so when nothing waits for review', async () => {
    const fetchMock = createFetchMock().on('GET', '/api/reviews', () => jsonResponse(200, []));
    renderApp({ path: '/reviews', user: demoUsers.reviewer, fetchMock });

    expect(await screen.findByText(/Nothing is waiting for review/)).toBeInTheDocument();
  });

  it('is not open to a fabricator', async () => {
    renderApp({ path: '/reviews', user: demoUsers.fabricator, fetchMock: createFetchMock() });

    expect(await screen.findByText("You don't have access to this section")).toBeInTheDocument();
    expect(screen.queryByRole('table', { name: 'Review queue' })).not.toBeInTheDocument();
  });
});
