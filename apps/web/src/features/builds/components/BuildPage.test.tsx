import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, errorResponse, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiCircuit, checkResult, lineReport } from '../../circuits/test-support/circuit-fixtures';
import { unitPreferencesStorageKey } from '../../preferences/utils/unit-preferences-store';
import { apiBuild, noCircuits } from '../test-support/build-fixtures';

const build = apiBuild('b-1', { circuitCounts: { total: 1, byStatus: { ...noCircuits.byStatus, draft: 1 } } });

function buildApi() {
  return createFetchMock()
    .on('GET', '/api/builds/b-1', () => jsonResponse(200, build))
    .on('GET', '/api/builds/b-1/circuits', () => jsonResponse(200, [apiCircuit('c-1')]))
    .on('GET', '/api/circuits/c-1/check', () => jsonResponse(200, checkResult([lineReport('line-1', 23.6875)])))
    .on('GET', '/api/builds/b-1/uploads', () => jsonResponse(200, []));
}

async function openNewCircuit() {
  const user = userEvent.setup();
  await user.click(await screen.findByRole('button', { name: 'New circuit' }));
  const dialog = await screen.findByRole('dialog', { name: 'New circuit' });
  return { user, dialog };
}

async function chooseKind(user: ReturnType<typeof userEvent.setup>, dialog: HTMLElement, label: string) {
  await user.click(within(dialog).getByRole('combobox', { name: /^Kind/ }));
  await user.click(await screen.findByRole('option', { name: label }));
}

afterEach(() => vi.restoreAllMocks());

describe('build page', () => {
  it('lists the circuits with status, ratings, flag counts and the cut-list total', async () => {
    renderApp({ path: '/builds/b-1', user: demoUsers.fabricator, fetchMock: buildApi() });
    const table = await screen.findByRole('table', { name: 'Circuits' });
    const row = within(table).getAllByRole('row')[1];
    expect(row).toHaveTextContent('Draft');
    expect(row).toHaveTextContent('150 psi · 250 °F');
    expect(await within(row).findByText('1 caution')).toBeInTheDocument();
    // 23.6875 in = 23-11/16 in (the fixture's one line).
    expect(row).toHaveTextContent('1 line · 23-11/16" hose');
    // The fixture's bill of materials totals 4845 cents.
    expect(row).toHaveTextContent('48.45');
  });

  // Conversions worked by hand from NIST SP 811 Appendix B (1 psi = 6.894757 kPa; °C = (°F − 32)/1.8):
  // 150 psi = 10.34 bar, 250 °F = 121.1 °C, 100 psi = 6.89 bar, 200 °F = 93.3 °C.
  it('fills fluid, pressure and temperature from the kind preset, in the user’s units', async () => {
    window.localStorage.setItem(unitPreferencesStorageKey, JSON.stringify({ length: 'in', pressure: 'bar', temperature: 'C' }));
    const created = apiCircuit('c-2', { name: 'Fuel feed and return', kind: 'fuel', fluid: 'gasoline', maxPressurePsi: 100, maxTempF: 200 });
    const fetchMock = buildApi()
      .on('POST', '/api/builds/b-1/circuits', () => jsonResponse(201, created))
      .on('GET', '/api/circuits/c-2', () => jsonResponse(200, created))
      .on('GET', '/api/circuits/c-2/draft', () => errorResponse(404, 'not_found', 'No draft.'));
    renderApp({ path: '/builds/b-1', user: demoUsers.fabricator, fetchMock });
    const { user, dialog } = await openNewCircuit();

    expect(within(dialog).getByRole('combobox', { name: /^Fluid/ })).toHaveTextContent('ATF');
    expect(within(dialog).getByLabelText(/^Max pressure \(bar\)/)).toHaveValue('10.3');
    expect(within(dialog).getByLabelText(/^Max temperature \(°C\)/)).toHaveValue('121');
    expect(within(dialog).getAllByText(/common practice/).length).toBeGreaterThan(0);

    await chooseKind(user, dialog, 'Fuel feed and return');
    expect(within(dialog).getByLabelText(/^Name/)).toHaveValue('Fuel feed and return');
    expect(within(dialog).getByRole('combobox', { name: /^Fluid/ })).toHaveTextContent('Gasoline');
    expect(within(dialog).getByLabelText(/^Max pressure \(bar\)/)).toHaveValue('6.9');
    expect(within(dialog).getByLabelText(/^Max temperature \(°C\)/)).toHaveValue('93');

    await user.click(within(dialog).getByRole('button', { name: 'Create circuit' }));
    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/builds/b-1/circuits')).toHaveLength(1));
    // The untouched preset goes back exactly, not as 6.9 bar converted to 100.08 psi.
    expect(fetchMock.callsTo('POST', '/api/builds/b-1/circuits')[0].body).toEqual({
      name: 'Fuel feed and return',
      kind: 'fuel',
      fluid: 'gasoline',
      maxPressurePsi: 100,
      maxTempF: 200,
    });
  });

  it('keeps an edited preset value and converts it to psi', async () => {
    window.localStorage.setItem(unitPreferencesStorageKey, JSON.stringify({ length: 'in', pressure: 'bar', temperature: 'F' }));
    const fetchMock = buildApi().on('POST', '/api/builds/b-1/circuits', () => jsonResponse(201, apiCircuit('c-3')));
    fetchMock.on('GET', '/api/circuits/c-3', () => jsonResponse(200, apiCircuit('c-3')));
    fetchMock.on('GET', '/api/circuits/c-3/draft', () => errorResponse(404, 'not_found', 'No draft.'));
    renderApp({ path: '/builds/b-1', user: demoUsers.fabricator, fetchMock });
    const { user, dialog } = await openNewCircuit();

    const pressure = within(dialog).getByLabelText(/^Max pressure \(bar\)/);
    await user.clear(pressure);
    await user.type(pressure, '100');
    await user.click(within(dialog).getByRole('button', { name: 'Create circuit' }));

    await waitFor(() => expect(fetchMock.callsTo('POST', '/api/builds/b-1/circuits')).toHaveLength(1));
    // 100 bar = 10 MPa = 1450.377 psi (NIST SP 811: 1 psi = 6.894757 kPa).
    const body = fetchMock.callsTo('POST', '/api/builds/b-1/circuits')[0].body as { maxPressurePsi: number; maxTempF: number };
    expect(body.maxPressurePsi).toBeCloseTo(1450.377, 3);
    expect(body.maxTempF).toBe(250);
  });

  it('refuses a text file and a 16 MB photo before uploading, saying why', async () => {
    const open = vi.spyOn(XMLHttpRequest.prototype, 'open');
    renderApp({ path: '/builds/b-1', user: demoUsers.fabricator, fetchMock: buildApi() });
    const input = await screen.findByLabelText('Choose photos');

    const notes = new File(['torque the cooler fittings'], 'notes.txt', { type: 'text/plain' });
    const huge = new File(['x'], 'engine-bay.jpg', { type: 'image/jpeg' });
    Object.defineProperty(huge, 'size', { value: 16 * 1024 * 1024 });
    await userEvent.setup({ applyAccept: false }).upload(input, [notes, huge]);

    const uploads = await screen.findByRole('list', { name: 'Uploads' });
    expect(uploads).toHaveTextContent('notes.txt is not a photo Linesmith can use: choose a JPEG, PNG, WebP image.');
    expect(uploads).toHaveTextContent('engine-bay.jpg is 16.0 MB; photos can be at most 15.0 MB.');
    expect(open).not.toHaveBeenCalled();
  });

  it('on a stale version shows the current build and re-applies the change on top of it', async () => {
    const current = apiBuild('b-1', { ...build, customer: { ...build.customer, phone: '555-0199' }, version: 2, updatedAt: '2026-01-07T09:00:00.000Z' });
    const fetchMock = buildApi().on('PATCH', '/api/builds/b-1', ({ body }) =>
      (body as { version: number }).version === 2
        ? jsonResponse(200, { ...current, notes: 'Customer wants fire sleeve on every line.', version: 3 })
        : errorResponse(409, 'conflict', 'This build was changed by someone else.', { current }),
    );
    renderApp({ path: '/builds/b-1', user: demoUsers.fabricator, fetchMock });
    const user = userEvent.setup();

    await user.click(await screen.findByRole('button', { name: 'Edit build' }));
    const dialog = await screen.findByRole('dialog', { name: 'Edit build' });
    await user.type(within(dialog).getByLabelText(/^Notes/), 'Customer wants fire sleeve on every line.');
    await user.click(within(dialog).getByRole('button', { name: 'Save' }));

    const notice = await within(dialog).findByRole('alert');
    expect(notice).toHaveTextContent('Someone else changed this build first');
    expect(notice).toHaveTextContent('555-0199');
    await user.click(within(dialog).getByRole('button', { name: 'Retry with my changes' }));

    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(fetchMock.callsTo('PATCH', '/api/builds/b-1').map((r) => r.body)).toEqual([
      { version: 1, notes: 'Customer wants fire sleeve on every line.' },
      { version: 2, notes: 'Customer wants fire sleeve on every line.' },
    ]);
  });
});
