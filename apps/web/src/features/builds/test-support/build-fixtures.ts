import type { BuildBody } from '../api/build-schema';

export const noCircuits = {
  total: 0,
  byStatus: { draft: 0, 'in-review': 0, returned: 0, approved: 0, ordered: 0, installed: 0 },
};

/** A build as the API sends it (`BuildDto`); invented demo vehicle and customer. */
export function apiBuild(id: string, extra: Partial<BuildBody> = {}): BuildBody {
  return {
    id,
    vehicle: { year: '1976', make: 'Harlan', model: 'Half-ton pickup', engine: '6.2 L V8', transmission: '4-speed automatic' },
    customer: { name: 'Corliss Ambry', phone: '555-0142', email: 'corliss@customer.example' },
    notes: '',
    status: 'open',
    createdBy: { id: 'u-fab', displayName: 'Rafe Okonkwo' },
    version: 1,
    createdAt: '2026-01-05T09:00:00.000Z',
    updatedAt: '2026-01-06T09:00:00.000Z',
    circuitCounts: noCircuits,
    ...extra,
  };
}
