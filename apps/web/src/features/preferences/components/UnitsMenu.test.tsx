import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { unitPreferencesStorageKey } from '../utils/unit-preferences-store';

describe('units menu', () => {
  it('starts in inches, psi and °F, and keeps a change in this browser', async () => {
    const fetchMock = createFetchMock().on('GET', '/api/builds', () => jsonResponse(200, { items: [], total: 0, page: 1, pageSize: 25 }));
    renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Units: in · psi · °F' }));
    await user.click(await screen.findByRole('menuitemradio', { name: 'bar' }));

    await waitFor(() => expect(screen.getByRole('button', { name: 'Units: in · bar · °F' })).toBeInTheDocument());
    expect(JSON.parse(window.localStorage.getItem(unitPreferencesStorageKey)!)).toEqual({ length: 'in', pressure: 'bar', temperature: 'F' });
  });

  it('falls back to the defaults when the stored value is not understood', async () => {
    window.localStorage.setItem(unitPreferencesStorageKey, '{"length":"furlong"');
    const fetchMock = createFetchMock().on('GET', '/api/builds', () => jsonResponse(200, { items: [], total: 0, page: 1, pageSize: 25 }));
    renderApp({ path: '/builds', user: demoUsers.fabricator, fetchMock });
    expect(await screen.findByRole('button', { name: 'Units: in · psi · °F' })).toBeInTheDocument();
  });
});
