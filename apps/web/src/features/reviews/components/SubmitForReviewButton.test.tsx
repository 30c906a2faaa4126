import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiBuild } from '../../builds/test-support/build-fixtures';
import { apiCircuit } from '../../circuits/test-support/circuit-fixtures';

function circuitApi(status: 'draft' | 'in-review') {
  let current = apiCircuit('c-1', { status });
  return createFetchMock()
    .on('GET', '/api/circuits/c-1', () => jsonResponse(200, current))
    .on('GET', '/api/builds/b-1', () => jsonResponse(200, apiBuild('b-1')))
    .on('GET', '/api/circuits/c-1/review', () => errorResponse(404, 'not_found', 'This circuit has no review.'))
    .on('GET', '/api/circuits/c-1/audit', () => jsonResponse(200, []))
    .on('POST', '/api/circuits/c-1/submit', () => {
      current = { ...current, status: 'in-review' };
      return jsonResponse(200, current);
    });
}

describe('submit for review', () => {
  it('lets the fabricator submit a draft with a message; the status turns to in review', async () => {
    const fetchMock = circuitApi('draft');
    renderApp({ path: '/circuits/c-1?tab=review', user: demoUsers.fabricator, fetchMock });
    const user = userEvent.setup();

    expect(await screen.findByText('This circuit has not been submitted for review yet.')).toBeInTheDocument();
    await user.click(await screen.findByRole('button', { name: 'Submit for review' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByRole('textbox'), 'Ready for a look');
    await user.click(within(dialog).getByRole('button', { name: 'Submit' }));

    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/circuits/c-1/submit')[0]?.body).toEqual({ message: 'Ready for a look' }));
    expect(await screen.findByText('In review')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Submit for review' })).not.toBeInTheDocument();
  });

  it('is not offered to a reviewer', async () => {
    renderApp({ path: '/circuits/c-1?tab=review', user: demoUsers.reviewer, fetchMock: circuitApi('draft') });

    expect(await screen.findByRole('tab', { name: 'Review' })).toHaveAttribute('aria-selected', 'true');
    expect(screen.queryByRole('button', { name: 'Submit for review' })).not.toBeInTheDocument();
  });
});
