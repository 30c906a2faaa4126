import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers, sessionBody } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';

const token = 'invite-token-0123456789abcdef';

describe('Accept an invitation', () => {
  it('asks for at least 10 characters and the same password twice, then signs in', async () => {
    const fetchMock = createFetchMock()
      .on('POST', '/api/auth/accept-invite', () => jsonResponse(200, sessionBody(demoUsers.fabricator)))
      .on('GET', '/api/builds', () => jsonResponse(200, { items: [], total: 0, page: 1, pageSize: 50 }));
    const { router } = renderApp({ path: `/accept-invite?token=${token}`, user: null, fetchMock });
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'Choose a password' });
    const password = within(form).getByLabelText(/New password/);
    const confirm = within(form).getByLabelText(/Repeat the password/);
    const submit = within(form).getByRole('button', { name: 'Set password and sign in' });

    await user.type(password, 'short-one');
    await user.click(submit);
    expect(await within(form).findByText('Choose a password of at least 10 characters.')).toBeInTheDocument();

    await user.type(password, '-now-long');
    await user.type(confirm, 'short-one-now-lnog');
    await user.click(submit);
    expect(await within(form).findByText('The two passwords differ.')).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/auth/accept-invite')).toHaveLength(0);

    await user.clear(confirm);
    await user.type(confirm, 'short-one-now-long');
    await user.click(submit);
    await waitFor(() => expect(router.state.location.pathname).toBe('/builds'));
    expect(fetchMock.callsTo('POST', '/api/auth/accept-invite')[0].body).toEqual({ token, password: 'short-one-now-long' });
  });

  it('shows the server\'s refusal of a common password at the password field', async () => {
    const fetchMock = createFetchMock().on('POST', '/api/auth/accept-invite', () =>
      errorResponse(400, 'validation_failed', 'Some fields are not valid.', {
        issues: [{ path: 'password', message: 'This password is too common or too easy to guess. Try a few unrelated words.' }],
      }),
    );
    renderApp({ path: `/accept-invite?token=${token}`, user: null, fetchMock });
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'Choose a password' });
    await user.type(within(form).getByLabelText(/New password/), 'password123');
    await user.type(within(form).getByLabelText(/Repeat the password/), 'password123');
    await user.click(within(form).getByRole('button', { name: 'Set password and sign in' }));
    expect(await within(form).findByText(/too common or too easy to guess/)).toBeInTheDocument();
  });

  it('says an expired link is no longer valid', async () => {
    const fetchMock = createFetchMock().on('POST', '/api/auth/accept-invite', () =>
      errorResponse(400, 'invalid_token', 'The link has expired.'),
    );
    renderApp({ path: `/accept-invite?token=${token}`, user: null, fetchMock });
    const user = userEvent.setup();
    const form = await screen.findByRole('form', { name: 'Choose a password' });
    await user.type(within(form).getByLabelText(/New password/), 'long-enough-pass');
    await user.type(within(form).getByLabelText(/Repeat the password/), 'long-enough-pass');
    await user.click(within(form).getByRole('button', { name: 'Set password and sign in' }));
    expect(await screen.findByText(/This link is no longer valid/)).toBeInTheDocument();
  });

  it('answers the same for any address on "Forgot password?"', async () => {
    const fetchMock = createFetchMock().on('POST', '/api/auth/request-reset', () => jsonResponse(202));
    renderApp({ path: '/sign-in', user: null, fetchMock });
    const user = userEvent.setup();
    await user.click(await screen.findByRole('link', { name: 'Forgot password?' }));
    const form = await screen.findByRole('form', { name: 'Ask for a reset link' });
    await user.type(within(form).getByLabelText(/E-mail/), 'nobody@tidewater.example');
    await user.click(within(form).getByRole('button', { name: 'Send the link' }));
    expect(await screen.findByText(/If the address is known, a link is on its way/)).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/auth/request-reset')[0].body).toEqual({ email: 'nobody@tidewater.example' });
  });
});
