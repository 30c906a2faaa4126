import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { Me } from '../../../lib/contract/me-schema';
import { demoUsers } from '../../../test/demo-users';
import { renderApp } from '../../../test/render-app';

// Expected sections: API contract, "Navigation by role" — written out here, not read from the
// app's own table, so a wrong entry in `sectionRoles` fails this test.
const expectedSections: [keyof typeof demoUsers, string[]][] = [
  ['admin', ['Builds', 'Reviews', 'Orders', 'Catalogue', 'Reference', 'Admin']],
  ['fabricator', ['Builds', 'Catalogue', 'Reference']],
  ['parts-clerk', ['Builds', 'Orders', 'Catalogue', 'Reference']],
  ['reviewer', ['Builds', 'Reviews', 'Reference']],
];

async function navLinkNames() {
  const nav = await screen.findByRole('navigation', { name: 'Sections' });
  return within(nav)
    .getAllByRole('link')
    .map((link) => link.textContent);
}

describe('navigation by role', () => {
  it.each(expectedSections)('shows the %s exactly their sections', async (role, sections) => {
    renderApp({ path: '/reference', user: demoUsers[role] });
    expect(await navLinkNames()).toEqual(sections);
  });

  it('combines the sections of a user holding several roles', async () => {
    const user: Me = { ...demoUsers.fabricator, roles: ['fabricator', 'reviewer'] };
    renderApp({ path: '/builds', user });
    expect(await navLinkNames()).toEqual(['Builds', 'Reviews', 'Catalogue', 'Reference']);
  });

  it('marks the current section and moves between sections from the keyboard', async () => {
    const { router } = renderApp({ path: '/builds', user: demoUsers.reviewer });
    const nav = await screen.findByRole('navigation', { name: 'Sections' });
    expect(within(nav).getByRole('link', { name: 'Builds' })).toHaveAttribute('aria-current', 'page');

    within(nav).getByRole('link', { name: 'Reviews' }).focus();
    await userEvent.setup().keyboard('{Enter}');

    expect(await screen.findByRole('heading', { name: 'Reviews' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/reviews');
    expect(within(nav).getByRole('link', { name: 'Reviews' })).toHaveAttribute('aria-current', 'page');
  });

  it("shows a no-access page for a section the user's roles do not open", async () => {
    renderApp({ path: '/admin/users', user: demoUsers.fabricator });
    expect(await screen.findByRole('heading', { name: "You don't have access to this section" })).toBeInTheDocument();
    expect(screen.queryByRole('heading', { name: 'Users and roles' })).not.toBeInTheDocument();
  });

  it('shows a not-found page inside the shell for an unknown address', async () => {
    renderApp({ path: '/no-such-page', user: demoUsers.reviewer });
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
    expect(screen.getByRole('navigation', { name: 'Sections' })).toBeInTheDocument();
  });

  it('signs out from the user menu and returns to sign-in without a `next`', async () => {
    const { router, fetchMock } = renderApp({ path: '/builds', user: demoUsers.admin });
    fetchMock.on('POST', '/api/auth/logout', () => new Response(null, { status: 204 }));
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Account: Dana Whitcombe' }));
    expect(await screen.findByText('Roles: Admin')).toBeInTheDocument();
    await user.click(screen.getByRole('menuitem', { name: 'Sign out' }));

    expect(await screen.findByRole('button', { name: 'Sign in' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/sign-in');
    expect(router.state.location.search).toBe('');
    expect(fetchMock.callsTo('POST', '/api/auth/logout')).toHaveLength(1);
  });
});
