import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import type { User } from '../api/user-schema';

// Expected requests and answers: API contract, "Users (admin only)".
function apiUser(me: (typeof demoUsers)[keyof typeof demoUsers], extra: Partial<User> = {}): User {
  return {
    id: me.id,
    email: me.email,
    displayName: me.displayName,
    roles: [...me.roles],
    active: true,
    version: 1,
    createdAt: '2026-01-05T09:00:00.000Z',
    updatedAt: '2026-01-05T09:00:00.000Z',
    ...extra,
  };
}

const staff = [
  apiUser(demoUsers.admin),
  apiUser(demoUsers.fabricator),
  apiUser(demoUsers['parts-clerk']),
  apiUser(demoUsers.reviewer, { version: 3 }),
];
const retired = apiUser(
  { ...demoUsers.fabricator, id: 'u-old', email: 'old@tidewater.example', displayName: 'Wes Pellam' },
  { active: false },
);

/** A small users API over an in-memory list, filtering like the contract says. */
function usersApi(users: User[] = [...staff, retired]) {
  return createFetchMock().on('GET', '/api/users', ({ url }) => {
    const search = url.searchParams.get('search')?.toLowerCase() ?? '';
    const role = url.searchParams.get('role');
    const active = url.searchParams.get('active');
    const items = users.filter(
      (u) =>
        (!search || u.displayName.toLowerCase().includes(search) || u.email.includes(search)) &&
        (!role || u.roles.includes(role as User['roles'][number])) &&
        (active === null || String(u.active) === active),
    );
    return jsonResponse(200, { items, total: items.length, page: 1, pageSize: 50 });
  });
}

async function rowNames() {
  const table = await screen.findByRole('table', { name: 'Users' });
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[0].textContent);
}

describe('Admin › Users', () => {
  it('lists the active users, and filters by role and inactive users through the API', async () => {
    const fetchMock = usersApi();
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();

    expect(await rowNames()).toEqual(['Dana Whitcombe', 'Rafe Okonkwo', 'Maribel Soto', 'Hollis Brandt']);
    const firstQuery = fetchMock.callsTo('GET', '/api/users')[0].url.searchParams;
    expect(Object.fromEntries(firstQuery)).toEqual({ page: '1', pageSize: '50', active: 'true' });
    expect(screen.getByText('4 users · page 1 of 1')).toBeInTheDocument();

    await user.click(screen.getByRole('switch', { name: 'Show inactive users' }));
    await waitFor(async () => expect(await rowNames()).toContain('Wes Pellam'));
    expect(fetchMock.callsTo('GET', '/api/users').at(-1)?.url.searchParams.has('active')).toBe(false);

    await user.click(screen.getByRole('combobox', { name: 'Role' }));
    await user.click(screen.getByRole('option', { name: 'Fabricator' }));
    await waitFor(async () => expect(await rowNames()).toEqual(['Rafe Okonkwo', 'Wes Pellam']));
    expect(fetchMock.callsTo('GET', '/api/users').at(-1)?.url.searchParams.get('role')).toBe('fabricator');
  });

  it('searches by name after typing stops', async () => {
    const fetchMock = usersApi();
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await rowNames();

    await user.type(screen.getByRole('searchbox'), 'soto');

    await waitFor(async () => expect(await rowNames()).toEqual(['Maribel Soto']));
    const searches = fetchMock.callsTo('GET', '/api/users').map((r) => r.url.searchParams.get('search'));
    expect(searches.filter(Boolean)).toEqual(['soto']);
  });

  it('shows an empty state and an error state', async () => {
    const fetchMock = usersApi([]);
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    expect(await screen.findByText(/No users yet/)).toBeInTheDocument();

    fetchMock.on('GET', '/api/users', () => errorResponse(503, 'unavailable', 'The database is not reachable.'));
    await userEvent.setup().click(screen.getByRole('switch', { name: 'Show inactive users' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('The database is not reachable.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('validates the new-user form per field before calling the API, then creates and refreshes the list', async () => {
    const fetchMock = usersApi();
    const created = apiUser(
      { ...demoUsers.reviewer, id: 'u-new', email: 'shop.hand@tidewater.example', displayName: 'Ines Varga' },
      { roles: ['fabricator', 'reviewer'] },
    );
    fetchMock.on('POST', '/api/users', () => jsonResponse(201, created));
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await rowNames();

    await user.click(screen.getByRole('button', { name: 'New user' }));
    const dialog = await screen.findByRole('dialog', { name: 'New user' });
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));

    expect(within(dialog).getByText('Enter an e-mail address.')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter a display name.')).toBeInTheDocument();
    expect(within(dialog).getByText('Give the user at least one role.')).toBeInTheDocument();
    expect(within(dialog).getByText('The initial password needs at least 10 characters.')).toBeInTheDocument();

    await user.type(within(dialog).getByLabelText(/^E-mail/), 'shop.hand@tidewater.example');
    await user.type(within(dialog).getByLabelText(/^Display name/), 'Ines Varga');
    await user.click(within(dialog).getByRole('checkbox', { name: /^Fabricator/ }));
    await user.click(within(dialog).getByRole('checkbox', { name: /^Reviewer/ }));
    await user.type(within(dialog).getByLabelText(/^Initial password/), 'ninechars');
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));
    expect(within(dialog).getByText('The initial password needs at least 10 characters.')).toBeInTheDocument();
    expect(within(dialog).queryByText('Enter a display name.')).not.toBeInTheDocument();
    expect(fetchMock.callsTo('POST', '/api/users')).toHaveLength(0);

    const listCallsBefore = fetchMock.callsTo('GET', '/api/users').length;
    await user.type(within(dialog).getByLabelText(/^Initial password/), '!');
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));

    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'New user' })).not.toBeInTheDocument());
    expect(fetchMock.callsTo('POST', '/api/users')[0].body).toEqual({
      email: 'shop.hand@tidewater.example',
      displayName: 'Ines Varga',
      roles: ['fabricator', 'reviewer'],
      password: 'ninechars!',
    });
    await waitFor(() => expect(fetchMock.callsTo('GET', '/api/users').length).toBeGreaterThan(listCallsBefore));
  });

  it('shows the API message on the e-mail field when the address is taken (409)', async () => {
    const fetchMock = usersApi().on('POST', '/api/users', () =>
      errorResponse(409, 'conflict', 'A user with this e-mail already exists.'),
    );
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await rowNames();

    await user.click(screen.getByRole('button', { name: 'New user' }));
    const dialog = await screen.findByRole('dialog', { name: 'New user' });
    await user.type(within(dialog).getByLabelText(/^E-mail/), 'fab@tidewater.example');
    await user.type(within(dialog).getByLabelText(/^Display name/), 'Rafe again');
    await user.click(within(dialog).getByRole('checkbox', { name: /^Fabricator/ }));
    await user.type(within(dialog).getByLabelText(/^Initial password/), 'long-enough-1');
    await user.click(within(dialog).getByRole('button', { name: 'Create user' }));

    expect(await within(dialog).findByText('A user with this e-mail already exists.')).toBeInTheDocument();
  });

  it('on a stale version (409) shows the current row and retries with its version and only the changed field', async () => {
    const reviewer = staff[3];
    const current: User = { ...reviewer, roles: ['reviewer', 'fabricator'], version: 4, updatedAt: '2026-01-06T10:00:00.000Z' };
    const saved: User = { ...current, displayName: 'Hollis R. Brandt', version: 5 };
    const fetchMock = usersApi().on('PATCH', `/api/users/${reviewer.id}`, ({ body }) =>
      (body as { version: number }).version === current.version
        ? jsonResponse(200, saved)
        : errorResponse(409, 'conflict', 'This user was changed by someone else.', { current }),
    );
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await rowNames();

    await user.click(screen.getByRole('button', { name: 'Edit Hollis Brandt' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Hollis Brandt' });
    const name = within(dialog).getByLabelText(/^Display name/);
    await user.clear(name);
    await user.type(name, 'Hollis R. Brandt');
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));

    const notice = await within(dialog).findByRole('alert');
    expect(notice).toHaveTextContent('Someone else changed this user first');
    expect(notice).toHaveTextContent('Hollis Brandt · Reviewer, Fabricator · active');
    expect(within(dialog).getByLabelText(/^Display name/)).toHaveValue('Hollis R. Brandt');

    await user.click(within(dialog).getByRole('button', { name: 'Retry with my changes' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    const patches = fetchMock.callsTo('PATCH', `/api/users/${reviewer.id}`).map((r) => r.body);
    expect(patches).toEqual([
      { version: 3, displayName: 'Hollis R. Brandt' },
      { version: 4, displayName: 'Hollis R. Brandt' },
    ]);
  });

  it('deactivates a user after confirmation, and offers no deactivation of oneself', async () => {
    const fabricator = staff[1];
    const fetchMock = usersApi().on('PATCH', `/api/users/${fabricator.id}`, () =>
      jsonResponse(200, { ...fabricator, active: false, version: 2 }),
    );
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await rowNames();

    expect(screen.queryByRole('button', { name: 'Deactivate Dana Whitcombe' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Deactivate Rafe Okonkwo' }));
    const dialog = await screen.findByRole('alertdialog', { name: 'Deactivate Rafe Okonkwo?' });
    expect(fetchMock.callsTo('PATCH', `/api/users/${fabricator.id}`)).toHaveLength(0);
    await user.click(within(dialog).getByRole('button', { name: 'Deactivate' }));

    await waitFor(() => expect(screen.queryByRole('alertdialog')).not.toBeInTheDocument());
    expect(fetchMock.callsTo('PATCH', `/api/users/${fabricator.id}`)[0].body).toEqual({ version: 1, active: false });
  });

  it("shows the API's reason when an admin tries to drop their own admin role (400)", async () => {
    const owner = staff[0];
    const fetchMock = usersApi().on('PATCH', `/api/users/${owner.id}`, () =>
      jsonResponse(400, {
        statusCode: 400,
        code: 'validation_failed',
        message: 'Some fields are not valid.',
        issues: [{ path: 'roles', message: 'You cannot remove your own admin role.' }],
      }),
    );
    renderApp({ path: '/admin/users', user: demoUsers.admin, fetchMock });
    const user = userEvent.setup();
    await rowNames();

    await user.click(screen.getByRole('button', { name: 'Edit Dana Whitcombe' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit Dana Whitcombe' });
    await user.click(within(dialog).getByRole('checkbox', { name: /^Fabricator/ }));
    await user.click(within(dialog).getByRole('checkbox', { name: /^Admin/ }));
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));

    expect(await within(dialog).findByRole('alert')).toHaveTextContent(
      'Some fields are not valid. You cannot remove your own admin role.',
    );
    expect(within(dialog).getByRole('group', { name: 'Roles' })).toHaveAccessibleDescription(
      'You cannot remove your own admin role.',
    );
    expect(fetchMock.callsTo('PATCH', `/api/users/${owner.id}`)[0].body).toEqual({ version: 1, roles: ['fabricator'] });
  });
});
