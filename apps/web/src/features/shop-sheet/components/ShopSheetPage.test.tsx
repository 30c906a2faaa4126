import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiBuild } from '../../builds/test-support/build-fixtures';
import { apiCircuit, coolerDraft } from '../../circuits/test-support/circuit-fixtures';
import { evaluationWith } from '../../reviews/test-support/review-fixtures';

const revision = { id: 'r-2', number: 2, message: 'Submitted', author: { id: 'u-fab', displayName: 'Rafe Okonkwo' }, createdAt: '2026-01-06T10:00:00.000Z', document: coolerDraft };
const submitted = { action: 'submitted', actor: { id: 'u-fab', displayName: 'Rafe Okonkwo' }, revisionNumber: 2, details: null, at: '2026-01-07T09:00:00.000Z' };
const approved = { action: 'approved', actor: { id: 'u-lead', displayName: 'Hollis Brandt' }, revisionNumber: 2, details: null, at: '2026-01-07T11:00:00.000Z' };

function sheetApi(audit: unknown[]) {
  return createFetchMock()
    .on('GET', '/api/circuits/c-1', () => jsonResponse(200, apiCircuit('c-1', { status: 'approved' })))
    .on('GET', '/api/builds/b-1', () => jsonResponse(200, apiBuild('b-1')))
    .on('GET', '/api/circuits/c-1/revisions/2', () => jsonResponse(200, revision))
    .on('POST', '/api/rules/evaluate', () => jsonResponse(200, evaluationWith([], 23)))
    .on('GET', '/api/circuits/c-1/audit', () => jsonResponse(200, audit));
}

describe('shop sheet', () => {
  it('prints the assembly notes of the connection families on the circuit, and only those', async () => {
    renderApp({ path: '/circuits/c-1/revisions/2/sheet', user: demoUsers.fabricator, fetchMock: sheetApi([submitted, approved]) });

    // coolerDraft's ports are O-ring boss (transmission) and inverted 45° flare (cooler).
    const orb = await screen.findByRole('region', { name: 'Assembly notes: O-ring boss' });
    expect(orb).toHaveTextContent(/no sealant or tape on O-ring boss threads/);
    expect(orb).toHaveTextContent(/Lubricate the O-ring/);
    expect(screen.getByRole('region', { name: 'Assembly notes: Inverted 45° flare' })).toHaveTextContent(/no sealant or tape/);
    expect(screen.queryByRole('region', { name: 'Assembly notes: NPT pipe thread' })).not.toBeInTheDocument();
    expect(screen.getByRole('region', { name: 'Assembly notes: every hose' })).toHaveTextContent(/Do not twist the hose/);
    expect(screen.getByLabelText('Safety')).toHaveTextContent('take precedence');
  });

  it('shows the sign-off of an approved revision and the cut length in inches and mm', async () => {
    renderApp({ path: '/circuits/c-1/revisions/2/sheet', user: demoUsers.fabricator, fetchMock: sheetApi([submitted, approved]) });

    const signOff = await screen.findByRole('region', { name: 'Sign-off' });
    expect(signOff).toHaveTextContent('Hollis Brandt');
    expect(screen.queryByText(/NOT APPROVED/)).not.toBeInTheDocument();
    const row = within(screen.getByRole('table', { name: 'Cut list' })).getAllByRole('row')[1];
    // 23 in × 25.4 mm/in (exact, NIST SP 811 App. B) = 584.2 mm → up to 585 mm, not 584 (common practice: cut long, never short).
    expect(row).toHaveTextContent('23"');
    expect(row).toHaveTextContent('585 mm');
    expect(screen.getByRole('button', { name: 'Print' })).toBeInTheDocument();
  });

  it('warns NOT APPROVED — do not build for a revision without a sign-off', async () => {
    renderApp({ path: '/circuits/c-1/revisions/2/sheet', user: demoUsers.fabricator, fetchMock: sheetApi([submitted]) });

    expect(await screen.findByRole('alert')).toHaveTextContent('NOT APPROVED — do not build');
    expect(screen.queryByRole('region', { name: 'Sign-off' })).not.toBeInTheDocument();
  });
});
