import { defaultShopRules, shopRuleOrigins, type ShopRules } from '@linesmith/routing';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import type { ShopRulesRecord } from '../api/shop-rules-record-schema';

// Requests and answers: the shop rules contract (`GET`/`PUT /api/shop-rules`, 409 with `current`).
function record(rules: ShopRules = defaultShopRules, extra: Partial<ShopRulesRecord> = {}): ShopRulesRecord {
  return {
    rules,
    defaults: defaultShopRules,
    origins: { ...shopRuleOrigins },
    version: 3,
    updatedAt: '2026-02-02T08:30:00.000Z',
    ...extra,
  };
}

function shopRulesApi(initial = record()) {
  return createFetchMock().on('GET', '/api/shop-rules', () => jsonResponse(200, initial));
}

async function openShopRules(fetchMock = shopRulesApi()) {
  const result = renderApp({ path: '/admin/shop-rules', user: demoUsers.admin, fetchMock });
  await screen.findByRole('table', { name: 'Rules and defaults' });
  return result;
}

function ruleRow(label: string): HTMLElement {
  const row = screen.getByLabelText(label).closest('tr');
  if (!row) throw new Error(`no row for ${label}`);
  return row;
}

describe('Admin › Shop rules', () => {
  it('shows every rule with its unit, default and the origin of the default', async () => {
    await openShopRules();
    // Defaults of DOMAIN.md §4: supports every 18 in, slack 1-1/2 in and 4 %, 6 in from exhaust (common practice).
    expect(screen.getByLabelText('Support spacing: other sizes')).toHaveValue('18');
    expect(screen.getByLabelText('Minimum slack across mounts')).toHaveValue('1-1/2');
    expect(screen.getByLabelText('Heat clearance: exhaust')).toHaveValue('6');
    expect(screen.getByLabelText('Round cut lengths up to')).toHaveValue('1/8');
    expect(screen.getByLabelText('Smallest bore')).toHaveValue('80');
    const slack = within(ruleRow('Minimum slack across mounts')).getAllByRole('cell');
    expect(slack[2]).toHaveTextContent('1-1/2 in');
    expect(slack[3]).toHaveTextContent(/^Common practice/);
    expect(within(ruleRow('Slack as a share of length')).getAllByRole('cell')[3]).toHaveTextContent(
      /FAA AC 43.13-1B, chapter 9/,
    );
    expect(within(ruleRow('Smallest bore')).getAllByRole('cell')[2]).toHaveTextContent('80 %');
    expect(screen.getByText(/version 3/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save' })).toBeDisabled();
  });

  it('shows the clamp spacing table by dash size, the straight stretch past the socket and the minimum free hose, each with its origin', async () => {
    await openShopRules();
    // FAA AC 43.13-1B Table 9-3, aluminium-alloy column (from memory): 3/16 in tube 12 in, 3/8 in 16-1/2 in, 1 in 26-1/2 in.
    expect(screen.getByLabelText('Support spacing: -3')).toHaveValue('12');
    expect(screen.getByLabelText('Support spacing: -6')).toHaveValue('16-1/2');
    expect(screen.getByLabelText('Support spacing: -16')).toHaveValue('26-1/2');
    expect(within(ruleRow('Support spacing: -6')).getAllByRole('cell')[3]).toHaveTextContent(/^FAA AC 43\.13-1B, Table 9-3, 3\/8 in tube/);
    // Common practice: 2 hose ODs of straight hose past the socket; 2 in of free hose between the sockets.
    expect(screen.getByLabelText('Straight hose past the socket')).toHaveValue('2');
    expect(within(ruleRow('Straight hose past the socket')).getAllByRole('cell')[2]).toHaveTextContent('2 × hose OD');
    expect(within(ruleRow('Straight hose past the socket')).getAllByRole('cell')[3]).toHaveTextContent(/^Common practice/);
    expect(screen.getByLabelText('Minimum free hose')).toHaveValue('2');
    expect(within(ruleRow('Minimum free hose')).getAllByRole('cell')[3]).toHaveTextContent(/^Common practice/);
    expect(screen.getByLabelText('Minimum slack on one mount')).toHaveValue('1/2');
  });

  it('saves an edited row of the spacing table into the table', async () => {
    const fetchMock = shopRulesApi().on('PUT', '/api/shop-rules', ({ body }) =>
      jsonResponse(200, record((body as { rules: ShopRules }).rules, { version: 4 })),
    );
    await openShopRules(fetchMock);
    const user = userEvent.setup();
    const dash8 = screen.getByLabelText('Support spacing: -8');
    await user.clear(dash8);
    await user.type(dash8, '20 1/2');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText(/Shop rules saved/)).toBeInTheDocument();
    const saved = (fetchMock.callsTo('PUT', '/api/shop-rules')[0].body as { rules: ShopRules }).rules;
    expect(saved.supportSpacingByDashIn).toEqual({ ...defaultShopRules.supportSpacingByDashIn, '8': 20.5 });
  });

  it('reads fractions of an inch and saves the rules with the version they were edited from', async () => {
    const fetchMock = shopRulesApi().on('PUT', '/api/shop-rules', ({ body }) => {
      const { rules } = body as { rules: ShopRules };
      return jsonResponse(200, record(rules, { version: 4, updatedAt: '2026-02-03T09:00:00.000Z' }));
    });
    await openShopRules(fetchMock);
    const user = userEvent.setup();

    const slack = screen.getByLabelText('Minimum slack across mounts');
    await user.clear(slack);
    await user.type(slack, '2 1/4');
    const turbo = screen.getByLabelText('Heat clearance: turbo');
    await user.clear(turbo);
    await user.type(turbo, '9-1/2"');
    const bore = screen.getByLabelText('Smallest bore');
    await user.clear(bore);
    await user.type(bore, '75');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText(/Shop rules saved/)).toBeInTheDocument();
    // 2 1/4 in = 2.25 in; 9-1/2 in = 9.5 in; 75 % of the hose ID = 0.75.
    expect(fetchMock.callsTo('PUT', '/api/shop-rules')[0].body).toEqual({
      version: 3,
      rules: { ...defaultShopRules, slackMinIn: 2.25, heatClearanceIn: { exhaust: 6, turbo: 9.5, other: 4 }, restrictionRatio: 0.75 },
    });
    // The saved values come back written as a shop writes them.
    expect(screen.getByLabelText('Minimum slack across mounts')).toHaveValue('2-1/4');
    expect(screen.getByText(/version 4/)).toBeInTheDocument();
  });

  it('validates each field with the routing library limits before calling the API', async () => {
    const fetchMock = shopRulesApi();
    await openShopRules(fetchMock);
    const user = userEvent.setup();

    const spacing = screen.getByLabelText('Support spacing: other sizes');
    await user.clear(spacing);
    await user.type(spacing, '0');
    const sleeve = screen.getByLabelText('Fire sleeve overlap');
    await user.clear(sleeve);
    await user.type(sleeve, 'one inch');
    const bore = screen.getByLabelText('Smallest bore');
    await user.clear(bore);
    await user.type(bore, '120');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(within(ruleRow('Support spacing: other sizes')).getByText('Enter more than 0 in.')).toBeInTheDocument();
    expect(
      within(ruleRow('Fire sleeve overlap')).getByText('Enter a length in inches, for example 1 1/2, 1-1/2 or 1.5.'),
    ).toBeInTheDocument();
    expect(within(ruleRow('Smallest bore')).getByText('Enter at most 100 %.')).toBeInTheDocument();
    expect(screen.getByLabelText('Support spacing: other sizes')).toHaveAttribute('aria-invalid', 'true');
    expect(fetchMock.callsTo('PUT', '/api/shop-rules')).toHaveLength(0);
  });

  it('offers cut rounding only as the steps the routing library accepts, written as fractions', async () => {
    const fetchMock = shopRulesApi().on('PUT', '/api/shop-rules', ({ body }) =>
      jsonResponse(200, record((body as { rules: ShopRules }).rules, { version: 4 })),
    );
    await openShopRules(fetchMock);
    const user = userEvent.setup();
    const rounding = screen.getByRole('combobox', { name: 'Round cut lengths up to' });
    // Common practice: a tape reads to 1/16 in; 1/16 = 0.0625, 1/8 = 0.125, 1/4 = 0.25, 1/2 = 0.5 in.
    expect(within(rounding).getAllByRole('option').map((option) => option.textContent)).toEqual([
      '1/16 in',
      '1/8 in',
      '1/4 in',
      '1/2 in',
    ]);

    await user.selectOptions(rounding, '1/4 in');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    expect(await screen.findByText(/Shop rules saved/)).toBeInTheDocument();
    expect(fetchMock.callsTo('PUT', '/api/shop-rules')[0].body).toEqual({
      version: 3,
      rules: { ...defaultShopRules, cutRoundingIn: 0.25 },
    });
    expect(screen.getByLabelText('Round cut lengths up to')).toHaveValue('1/4');
  });

  it('resets a field to its default', async () => {
    await openShopRules(shopRulesApi(record({ ...defaultShopRules, supportSpacingIn: 24 })));
    const user = userEvent.setup();
    const reset = screen.getByRole('button', { name: 'Reset Support spacing: other sizes to default' });
    expect(screen.getByLabelText('Support spacing: other sizes')).toHaveValue('24');

    await user.click(reset);

    expect(screen.getByLabelText('Support spacing: other sizes')).toHaveValue('18');
    expect(reset).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Save' })).toBeEnabled();
  });

  it('on a stale version (409) shows the current values and re-applies only the admin’s change on top', async () => {
    const current = record(
      { ...defaultShopRules, heatClearanceIn: { exhaust: 6, turbo: 10, other: 4 } },
      { version: 4, updatedAt: '2026-02-03T07:00:00.000Z' },
    );
    const fetchMock = shopRulesApi().on('PUT', '/api/shop-rules', ({ body }) => {
      const { version, rules } = body as { version: number; rules: ShopRules };
      return version === current.version
        ? jsonResponse(200, record(rules, { version: 5 }))
        : errorResponse(409, 'conflict', 'The shop rules were changed by someone else.', { current });
    });
    await openShopRules(fetchMock);
    const user = userEvent.setup();

    const slack = screen.getByLabelText('Minimum slack across mounts');
    await user.clear(slack);
    await user.type(slack, '2');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const notice = await screen.findByRole('alert');
    expect(notice).toHaveTextContent('Someone else saved the shop rules first');
    const values = within(notice).getByRole('list', { name: 'Current values on the server' });
    expect(values).toHaveTextContent('Heat clearance: turbo: 10 in');
    expect(values).toHaveTextContent('Minimum slack across mounts: 1-1/2 in — you changed this field');
    expect(screen.getByLabelText('Minimum slack across mounts')).toHaveValue('2');

    await user.click(screen.getByRole('button', { name: 'Re-apply my changes' }));

    expect(await screen.findByText(/Shop rules saved/)).toBeInTheDocument();
    expect(fetchMock.callsTo('PUT', '/api/shop-rules').map((r) => r.body)).toEqual([
      { version: 3, rules: { ...defaultShopRules, slackMinIn: 2 } },
      { version: 4, rules: { ...current.rules, slackMinIn: 2 } },
    ]);
    expect(screen.queryByRole('alert')).not.toBeInTheDocument();
  });

  it('after a conflict can take the current values instead', async () => {
    const current = record({ ...defaultShopRules, supportSpacingIn: 16 }, { version: 4 });
    const fetchMock = shopRulesApi().on('PUT', '/api/shop-rules', () =>
      errorResponse(409, 'conflict', 'The shop rules were changed by someone else.', { current }),
    );
    await openShopRules(fetchMock);
    const user = userEvent.setup();
    const spacing = screen.getByLabelText('Support spacing: other sizes');
    await user.clear(spacing);
    await user.type(spacing, '20');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await screen.findByRole('alert');

    await user.click(screen.getByRole('button', { name: 'Use current values' }));

    expect(screen.getByLabelText('Support spacing: other sizes')).toHaveValue('16');
    expect(screen.getByText(/version 4/)).toBeInTheDocument();
    expect(fetchMock.callsTo('PUT', '/api/shop-rules')).toHaveLength(1);
  });

  it('shows a load error with a retry', async () => {
    const fetchMock = createFetchMock().on('GET', '/api/shop-rules', () =>
      errorResponse(503, 'unavailable', 'The database is not reachable.'),
    );
    renderApp({ path: '/admin/shop-rules', user: demoUsers.admin, fetchMock });
    expect(await screen.findByRole('alert')).toHaveTextContent('The shop rules could not be loaded: The database is not reachable.');
    fetchMock.on('GET', '/api/shop-rules', () => jsonResponse(200, record()));
    await userEvent.setup().click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByRole('table', { name: 'Rules and defaults' })).toBeInTheDocument();
  });

  it('is a page of the Admin section next to Users', async () => {
    const fetchMock = shopRulesApi().on('GET', '/api/users', () =>
      jsonResponse(200, { items: [], total: 0, page: 1, pageSize: 50 }),
    );
    const { router } = renderApp({ path: '/admin', user: demoUsers.admin, fetchMock });
    expect(await screen.findByRole('heading', { name: 'Users and roles' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/admin/users');
    const adminNav = screen.getByRole('navigation', { name: 'Admin pages' });
    expect(within(adminNav).getByRole('link', { name: 'Users' })).toHaveAttribute('aria-current', 'page');

    await userEvent.setup().click(within(adminNav).getByRole('link', { name: 'Shop rules' }));

    expect(await screen.findByRole('heading', { name: 'Shop rules' })).toBeInTheDocument();
    expect(router.state.location.pathname).toBe('/admin/shop-rules');
    expect(within(adminNav).getByRole('link', { name: 'Shop rules' })).toHaveAttribute('aria-current', 'page');
  });
});
