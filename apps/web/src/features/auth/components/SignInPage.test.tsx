import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers, sessionBody } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';

// Expected behaviour: API contract (`POST /api/auth/login`, error codes) and demo users.
async function fill(email: string, password: string) {
  const user = userEvent.setup();
  const emailInput = await screen.findByLabelText(/e-mail/i);
  if (email) await user.type(emailInput, email);
  if (password) await user.type(screen.getByLabelText(/password/i), password);
  return user;
}

describe('sign-in page', () => {
  it('sends signed-out users to sign-in with the page they asked for as `next`', async () => {
    const { router } = renderApp({ path: '/orders', user: null });

    await screen.findByRole('button', { name: 'Sign in' });
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('?next=%2Forders');
  });

  it('shows a message per field and calls no API when the form is invalid', async () => {
    const { fetchMock } = renderApp({ path: '/sign-in', user: null });
    const user = await fill('', '');

    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();

    await user.type(screen.getByLabelText(/e-mail/i), 'owner-at-tidewater');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter a valid e-mail address.')).toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/auth/login')).toHaveLength(0);
  });

  it('signs in with Enter, then goes to the `next` page', async () => {
    const fetchMock = createFetchMock().on('POST', '/api/auth/login', ({ body }) => {
      const { email, password } = body as { email: string; password: string };
      return email === 'parts@tidewater.example' && password === 'linesmith-demo'
        ? jsonResponse(200, sessionBody(demoUsers['parts-clerk']))
        : errorResponse(401, 'invalid_credentials', 'Wrong e-mail or password.');
    });
    const { router } = renderApp({ path: '/sign-in?next=%2Forders', user: null, fetchMock });
    const user = await fill('parts@tidewater.example', 'linesmith-demo');

    await user.keyboard('{Enter}');

    expect(await screen.findByRole('heading', { name: 'Orders' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/orders');
    expect(fetchMock.callsTo('POST', '/api/auth/login')[0].body).toEqual({
      email: 'parts@tidewater.example',
      password: 'linesmith-demo',
    });
    expect(screen.getByText('Tidewater Rod & Diesel')).toBeInTheDocument();
  });

  it("shows the API's message for wrong credentials and stays on sign-in", async () => {
    const fetchMock = createFetchMock().on('POST', '/api/auth/login', () =>
      errorResponse(401, 'invalid_credentials', 'Wrong e-mail or password.'),
    );
    const { router } = renderApp({ path: '/sign-in', user: null, fetchMock });
    const user = await fill('owner@tidewater.example', 'not-the-password');

    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toHaveTextContent('Wrong e-mail or password.');
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(screen.getByRole('button', { name: 'Sign in' })).toBeEnabled();
  });

  it('shows the rate-limit message and disables the button while signing in', async () => {
    let answer!: (response: Response) => void;
    const fetchMock = createFetchMock().on(
      'POST',
      '/api/auth/login',
      () => new Promise<Response>((resolve) => (answer = resolve)),
    );
    renderApp({ path: '/sign-in', user: null, fetchMock });
    const user = await fill('owner@tidewater.example', 'linesmith-demo');

    await user.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByRole('button', { name: 'Signing in…' })).toBeDisabled();

    answer(errorResponse(429, 'rate_limited', 'Too many sign-in attempts. Try again in a minute.'));
    expect(await screen.findByRole('alert')).toHaveTextContent('Too many sign-in attempts. Try again in a minute.');
    await waitFor(() => expect(screen.getByRole('button', { name: 'Sign in' })).toBeEnabled());
  });

  it('ignores a `next` that points outside the app', async () => {
    const fetchMock = createFetchMock().on('POST', '/api/auth/login', () =>
      jsonResponse(200, sessionBody(demoUsers.reviewer)),
    );
    const { router } = renderApp({ path: '/sign-in?next=%2F%2Fevil.example%2F', user: null, fetchMock });
    const user = await fill('lead@tidewater.example', 'linesmith-demo');

    await user.keyboard('{Enter}');

    await screen.findByRole('heading', { name: 'Builds' });
    expect(router.state.location.pathname).toBe('/builds');
  });

  it('returns to sign-in with the current page as `next` when the session cannot be refreshed', async () => {
    const fetchMock = createFetchMock().on('GET', '/api/users', () =>
      errorResponse(401, 'unauthorized', 'The access token has expired.'),
    );
    let refreshes = 0;
    fetchMock.on('POST', '/api/auth/refresh', () =>
      (refreshes += 1) === 1
        ? jsonResponse(200, sessionBody(demoUsers.admin))
        : errorResponse(401, 'unauthorized', 'The refresh token was revoked.'),
    );
    const { router } = renderApp({ path: '/admin/users?x=1', user: demoUsers.admin, fetchMock });

    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe(`?next=${encodeURIComponent('/admin/users?x=1')}`);
    expect(refreshes).toBe(2);
  });
});
