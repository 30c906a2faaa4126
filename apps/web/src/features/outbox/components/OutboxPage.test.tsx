import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';

describe('Admin › Outbox and invitations', () => {
  it('lists sent and failed e-mail with the failure reason', async () => {
    const fetchMock = createFetchMock().on('GET', '/api/outbox', () =>
      jsonResponse(200, [
        {
          id: 'm-2',
          to: 'orders@harborline.example',
          subject: 'Order from Tidewater Rod & Diesel',
          status: 'failed',
          error: 'Connection refused',
          messageId: null,
          attachmentNames: ['order.xlsx'],
          createdAt: '2026-03-02T15:00:00.000Z',
        },
        {
          id: 'm-1',
          to: 'new.hand@tidewater.example',
          subject: 'You are invited to Linesmith',
          status: 'sent',
          error: null,
          messageId: '<1@linesmith.example>',
          attachmentNames: [],
          createdAt: '2026-03-01T09:00:00.000Z',
        },
      ]),
    );
    renderApp({ path: '/admin/outbox', user: demoUsers.admin, fetchMock });
    const table = await screen.findByRole('table', { name: 'Outbox' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(within(rows[0]).getByText('order.xlsx')).toBeInTheDocument();
    expect(within(rows[0]).getByText('Failed')).toBeInTheDocument();
    expect(rows[0].textContent).toContain('Connection refused');
    expect(rows[1].textContent).toContain('Sent');
  });

  it('invites a user by e-mail from Admin › Users', async () => {
    const fetchMock = createFetchMock()
      .on('GET', '/api/users', () => jsonResponse(200, { items: [], total: 0, page: 1, pageSize: 50 }))
      .on('POST', '/api/users/invite', ({ body }) =>
        jsonResponse(201, {
          ...(body as object),
          id: 'u-new',
          active: true,
          version: 1,
          createdAt: '2026-03-01T09:00:00.000Z',
          updatedAt: '2026-03-01T09:00:00.000Z',
        }),
      );
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Invite user' }));
    const form = await screen.findByRole('form', { name: 'Invite user' });
    await user.type(within(form).getByLabelText(/E-mail/), 'new.hand@tidewater.example');
    await user.type(within(form).getByLabelText(/Display name/), 'Noor Ellery');
    await user.click(within(form).getByRole('checkbox', { name: /Parts clerk/ }));
    await user.click(within(form).getByRole('button', { name: 'Send invitation' }));
    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/users/invite')).toHaveLength(1));
    expect(fetchMock.callsTo('POST', '/api/users/invite')[0].body).toEqual({
      email: 'new.hand@tidewater.example',
      displayName: 'Noor Ellery',
      roles: ['parts-clerk'],
    });
    expect(await within(form).findByText(/An invitation is on its way to new.hand@tidewater.example/)).toBeInTheDocument();
  });
});
