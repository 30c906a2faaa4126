import { flagKey } from '@linesmith/routing';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiCircuit } from '../../circuits/test-support/circuit-fixtures';
import { jointSeatBlocker, openPortCaution, reviewBody, supportGapCaution } from '../test-support/review-fixtures';

const path = '/reviews/c-1';
const ack = (flag: typeof supportGapCaution, note: string) => ({
  flagKey: flagKey(flag),
  note,
  by: { id: 'u-lead', displayName: 'Hollis Brandt' },
  at: '2026-01-07T10:00:00.000Z',
});

/** The review API with acknowledgements kept in memory, as the server would. */
function reviewApi(flags = [supportGapCaution], acknowledgements: ReturnType<typeof ack>[] = []) {
  const acks = [...acknowledgements];
  return createFetchMock()
    .on('GET', '/api/circuits/c-1', () => jsonResponse(200, apiCircuit('c-1', { status: 'in-review' })))
    .on('GET', '/api/circuits/c-1/review', () => jsonResponse(200, reviewBody({ flags, acknowledgements: acks })))
    .on('GET', '/api/circuits/c-1/audit', () =>
      jsonResponse(200, [{ action: 'submitted', actor: { id: 'u-fab', displayName: 'Rafe Okonkwo' }, revisionNumber: 2, details: { message: 'Ready' }, at: '2026-01-07T09:00:00.000Z' }]),
    )
    .on('POST', '/api/circuits/c-1/review/acknowledgements', (request) => {
      const body = request.body as { flagKey: string; note: string };
      acks.push({ ...ack(supportGapCaution, body.note), flagKey: body.flagKey });
      return jsonResponse(201, acks.at(-1));
    });
}

const approveButton = () => screen.findByRole('button', { name: /^Approve revision 2/ });

describe('review page', () => {
  it('keeps approval disabled while a blocker is open, even with every caution acknowledged', async () => {
    renderApp({ path, user: demoUsers.reviewer, fetchMock: reviewApi([jointSeatBlocker, supportGapCaution], [ack(supportGapCaution, 'Clamp added on the truck')]) });

    expect(await approveButton()).toBeDisabled();
    const blockers = screen.getByRole('list', { name: 'Blockers' });
    expect(within(blockers).getByText('The threads engage but the seats differ.')).toBeInTheDocument();
    expect(screen.getByText(/must be fixed by the fabricator — approval is disabled/)).toBeInTheDocument();
    expect(screen.getByText(/1 blocker must be fixed by the fabricator/)).toBeInTheDocument();
    expect(screen.getByText(/Acknowledged by Hollis Brandt/)).toBeInTheDocument();
  });

  it('enables approval only after every caution is acknowledged with a note', async () => {
    const fetchMock = reviewApi([supportGapCaution]);
    renderApp({ path, user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    expect(await approveButton()).toBeDisabled();
    expect(screen.getByText(/1 caution needs an acknowledgement/)).toBeInTheDocument();
    const form = screen.getByRole('form', { name: /Acknowledge support-gap/ });
    await user.type(within(form).getByRole('textbox'), 'Span runs along the frame rail, clamp added at 9 in');
    await user.click(within(form).getByRole('button', { name: 'Acknowledge caution' }));

    await waitFor(async () => expect(await approveButton()).toBeEnabled());
    expect(fetchMock.callsTo('POST', '/api/circuits/c-1/review/acknowledgements')[0].body).toEqual({
      flagKey: 'support-gap@line:line-1',
      note: 'Span runs along the frame rail, clamp added at 9 in',
    });
    expect(await screen.findByText(/Span runs along the frame rail/)).toBeInTheDocument();
  });

  it('refuses an acknowledgement note shorter than 3 characters', async () => {
    const fetchMock = reviewApi([supportGapCaution, openPortCaution]);
    renderApp({ path, user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    const form = await screen.findByRole('form', { name: /Acknowledge open-port/ });
    await user.type(within(form).getByRole('textbox'), ' ok ');
    await user.click(within(form).getByRole('button', { name: 'Acknowledge caution' }));

    expect(await within(form).findByText(/Write at least 3 characters/)).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/circuits/c-1/review/acknowledgements')).toHaveLength(0);
    expect(await approveButton()).toBeDisabled();
  });

  it('requires comments to return the circuit, then sends them', async () => {
    const fetchMock = reviewApi([jointSeatBlocker]).on('POST', '/api/circuits/c-1/review/return', () =>
      jsonResponse(200, { status: 'returned' }),
    );
    renderApp({ path, user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    const form = await screen.findByRole('form', { name: 'Return' });
    await user.click(within(form).getByRole('button', { name: 'Return to the fabricator' }));
    expect(await within(form).findByText(/Write what the fabricator must change/)).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/circuits/c-1/review/return')).toHaveLength(0);

    await user.type(within(form).getByRole('textbox'), 'Cooler inlet needs an inverted-flare adapter');
    await user.click(within(form).getByRole('button', { name: 'Return to the fabricator' }));
    await waitFor(() =>
      expect(fetchMock.callsTo('POST', '/api/circuits/c-1/review/return')[0]?.body).toEqual({ comments: 'Cooler inlet needs an inverted-flare adapter' }),
    );
  });

  it("shows the server's refusal when it finds open items on approval", async () => {
    const fetchMock = reviewApi([supportGapCaution], [ack(supportGapCaution, 'Checked on the lift')]).on('POST', '/api/circuits/c-1/review/approve', () =>
      errorResponse(409, 'review_blocked', 'A caution was raised again after a re-check and is not acknowledged.'),
    );
    renderApp({ path, user: demoUsers.reviewer, fetchMock });
    const user = userEvent.setup();

    await user.click(await approveButton());
    expect(await screen.findByText(/A caution was raised again after a re-check/)).toBeInTheDocument();
  });

  it('shows who decided, and no decision controls, once the revision is approved', async () => {
    const fetchMock = reviewApi().on('GET', '/api/circuits/c-1/review', () =>
      jsonResponse(
        200,
        reviewBody({
          flags: [supportGapCaution],
          status: 'approved',
          acknowledgements: [ack(supportGapCaution, 'Checked')],
          decision: { kind: 'approved', by: { id: 'u-lead', displayName: 'Hollis Brandt' }, at: '2026-01-07T11:00:00.000Z', note: 'Good to build' },
        }),
      ),
    );
    renderApp({ path, user: demoUsers.reviewer, fetchMock });

    const banner = await screen.findByLabelText('Decision');
    expect(banner).toHaveTextContent('Revision 2 approved and locked');
    expect(banner).toHaveTextContent('Hollis Brandt');
    expect(banner).toHaveTextContent('Good to build');
    expect(screen.queryByRole('button', { name: /^Approve/ })).not.toBeInTheDocument();
    expect(within(await screen.findByRole('list', { name: 'History' })).getByText(/Submitted for review/)).toBeInTheDocument();
  });
});
