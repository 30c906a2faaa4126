import { compareDocuments, type CircuitDocument } from '@linesmith/routing';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { demoUsers } from '../../../test/demo-users';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import { renderApp } from '../../../test/render-app';
import { apiCircuit } from '../../circuits/test-support/circuit-fixtures';
import { evaluationWith, reviewDocument } from '../test-support/review-fixtures';

/** Revision 2 moves the line's corner: the line is re-routed and its cut length grows. */
const after: CircuitDocument = {
  ...reviewDocument,
  lines: reviewDocument.lines.map((l) => ({ ...l, points: [{ x: 100, y: 60, bendRadiusIn: 2 }] })),
};

describe('revision comparison', () => {
  it('lists a re-routed line with its old and new cut length in fractional inches', async () => {
    const before = { document: reviewDocument, evaluation: evaluationWith([], 20.5) };
    const next = { document: after, evaluation: evaluationWith([], 22.34) };
    const comparison = compareDocuments(before.document, next.document, before.evaluation, next.evaluation);
    const fetchMock = createFetchMock()
      .on('GET', '/api/circuits/c-1', () => jsonResponse(200, apiCircuit('c-1')))
      .on('GET', '/api/circuits/c-1/revisions', () =>
        jsonResponse(200, [1, 2].map((n) => ({ id: `r-${n}`, number: n, message: '', author: { id: 'u-fab', displayName: 'Rafe Okonkwo' }, createdAt: '2026-01-06T10:00:00.000Z' }))),
      )
      .on('GET', '/api/circuits/c-1/compare', () => jsonResponse(200, { comparison, before, after: next }));
    renderApp({ path: '/circuits/c-1/compare?from=1&to=2', user: demoUsers.reviewer, fetchMock });

    const lines = await screen.findByRole('region', { name: 'Lines' });
    // 20.5 in = 20-1/2 in (0.5 = 8/16); 22.34 in × 16 = 357.44 sixteenths → up to 358/16 = 22-3/8 in, not the
    // nearest 22-5/16 (common practice: cut long, never short).
    expect(within(lines).getByText(/Re-routed: Line 1 \(Transmission · cooler out → Cooler · inlet\) — cut length 20-1\/2" → 22-3\/8"/)).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /Revision 1: 2 units, 1 lines.*1 items highlighted/ })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /Revision 2: 2 units, 1 lines.*1 items highlighted/ })).toBeInTheDocument();
    expect(fetchMock.callsTo('GET', '/api/circuits/c-1/compare')[0].url.search).toBe('?from=1&to=2');
  });
});
