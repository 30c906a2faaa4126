import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import type { ShopProfile } from '../api/shop-profile-schema';

// Requests and answers: the shop profile contract (`GET`/`PATCH /api/shop`, 409 with `current`).
const admin = demoUsers.admin;

function profile(extra: Partial<ShopProfile> = {}): ShopProfile {
  return {
    id: admin.shop.id,
    name: admin.shop.name,
    slug: 'tidewater',
    timezone: 'America/New_York',
    taxRatePercent: 7.25,
    version: 3,
    updatedAt: '2026-02-02T08:30:00.000Z',
    ...extra,
  };
}

function shopApi(initial = profile()) {
  return createFetchMock().on('GET', '/api/shop', () => jsonResponse(200, initial));
}

async function openShopProfile(fetchMock = shopApi()) {
  const result = renderApp({ path: '/admin/shop-profile', user: admin, fetchMock });
  await screen.findByRole('form', { name: 'Shop profile' });
  return result;
}

describe('Admin › Shop profile', () => {
  it('is an Admin page and shows the stored profile', async () => {
    await openShopProfile();
    expect(within(screen.getByRole('navigation', { name: 'Admin pages' })).getByRole('link', { name: 'Shop profile' })).toHaveAttribute(
      'aria-current',
      'page',
    );
    expect(screen.getByRole('textbox', { name: /Shop name/ })).toHaveValue(admin.shop.name);
    expect(screen.getByRole('combobox', { name: /Time zone/ })).toHaveValue('America/New_York');
    expect(screen.getByRole('textbox', { name: /Sales tax rate/ })).toHaveValue('7.25');
    expect(screen.getByText(/Applied to the order sheets drafted from now on/)).toBeInTheDocument();
    expect(screen.getByText(/version 3/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save' })).toBeDisabled();
  });

  it('checks the name and the tax rate before calling the API', async () => {
    const fetchMock = shopApi();
    await openShopProfile(fetchMock);
    const user = userEvent.setup();

    await user.clear(screen.getByRole('textbox', { name: /Shop name/ }));
    const rate = screen.getByRole('textbox', { name: /Sales tax rate/ });
    await user.clear(rate);
    await user.type(rate, '31');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(screen.getByText('Enter the shop name.')).toBeInTheDocument();
    expect(screen.getByText('Enter a rate from 0 to 30 %.')).toBeInTheDocument();
    expect(screen.getByRole('textbox', { name: /Shop name/ })).toHaveAttribute('aria-invalid', 'true');

    await user.clear(rate);
    await user.type(rate, '8.125');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(screen.getByText('Enter the rate as a number with at most two decimals, for example 8.25.')).toBeInTheDocument();
    expect(fetchMock.callsTo('PATCH', '/api/shop')).toHaveLength(0);
  });

  it('saves the changed fields with the version they were edited from and renames the shop in the top bar', async () => {
    const renamed = profile({ name: 'Tidewater Fabrication', timezone: 'America/Denver', taxRatePercent: 8.25, version: 4 });
    const fetchMock = shopApi()
      .on('PATCH', '/api/shop', () => jsonResponse(200, renamed))
      .on('GET', '/api/me', () => jsonResponse(200, { ...admin, shop: { ...admin.shop, name: renamed.name } }));
    await openShopProfile(fetchMock);
    const user = userEvent.setup();
    const banner = screen.getByRole('banner');
    expect(within(banner).getByText(admin.shop.name)).toBeInTheDocument();

    const name = screen.getByRole('textbox', { name: /Shop name/ });
    await user.clear(name);
    await user.type(name, 'Tidewater Fabrication');
    await user.selectOptions(screen.getByRole('combobox', { name: /Time zone/ }), 'America/Denver');
    const rate = screen.getByRole('textbox', { name: /Sales tax rate/ });
    await user.clear(rate);
    await user.type(rate, '8.25');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText('Shop profile saved.')).toBeInTheDocument();
    expect(fetchMock.callsTo('PATCH', '/api/shop')[0].body).toEqual({
      version: 3,
      name: 'Tidewater Fabrication',
      timezone: 'America/Denver',
      taxRatePercent: 8.25,
    });
    expect(screen.getByText(/version 4/)).toBeInTheDocument();
    await waitFor(() => expect(within(banner).getByText('Tidewater Fabrication')).toBeInTheDocument());
  });

  it('on a stale version (409) shows the server’s values and re-applies only the admin’s change on top', async () => {
    const current = profile({ timezone: 'America/Chicago', version: 4, updatedAt: '2026-02-03T07:00:00.000Z' });
    const fetchMock = shopApi().on('PATCH', '/api/shop', ({ body }) => {
      const { version, ...fields } = body as { version: number };
      return version === current.version
        ? jsonResponse(200, { ...current, ...fields, version: 5 })
        : errorResponse(409, 'conflict', 'The shop profile was changed by someone else.', { current });
    });
    await openShopProfile(fetchMock);
    const user = userEvent.setup();

    const rate = screen.getByRole('textbox', { name: /Sales tax rate/ });
    await user.clear(rate);
    await user.type(rate, '6');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const notice = await screen.findByRole('alert');
    expect(notice).toHaveTextContent('Someone else saved the shop profile first');
    const values = within(notice).getByRole('list', { name: 'Current values on the server' });
    expect(values).toHaveTextContent('Time zone: America/Chicago');
    expect(values).toHaveTextContent('Sales tax rate: 7.25 % — you changed this field');

    await user.click(screen.getByRole('button', { name: 'Re-apply my changes' }));

    expect(await screen.findByText('Shop profile saved.')).toBeInTheDocument();
    expect(fetchMock.callsTo('PATCH', '/api/shop').map((call) => call.body)).toEqual([
      { version: 3, taxRatePercent: 6 },
      { version: 4, taxRatePercent: 6 },
    ]);
    // The other admin's time zone survives; the form now shows the saved record.
    expect(screen.getByRole('combobox', { name: /Time zone/ })).toHaveValue('America/Chicago');
    expect(screen.getByText(/version 5/)).toBeInTheDocument();
  });

  it('offers to try again when the profile cannot be loaded', async () => {
    let calls = 0;
    const fetchMock = createFetchMock().on('GET', '/api/shop', () =>
      calls++ === 0 ? errorResponse(500, 'internal_error', 'The server had a problem.') : jsonResponse(200, profile()),
    );
    renderApp({ path: '/admin/shop-profile', user: admin, fetchMock });

    expect(await screen.findByText(/The shop profile could not be loaded: The server had a problem./)).toBeInTheDocument();
    await userEvent.setup().click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('form', { name: 'Shop profile' })).toBeInTheDocument();
  });
});
