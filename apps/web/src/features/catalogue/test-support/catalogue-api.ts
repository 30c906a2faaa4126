import { demoParts, demoSuppliers } from '@linesmith/catalog';
import { createFetchMock, jsonResponse } from '../../../test/fetch-mock';
import type { PartRecord } from '../api/part-record-schema';
import type { Supplier } from '../api/supplier-schema';

/** The demo catalogue's suppliers as the API sends them. */
export const apiSuppliers: Supplier[] = demoSuppliers.map((s) => ({
  id: s.id,
  name: s.name,
  email: s.email,
  accountNumber: s.accountNumber,
  phone: '',
  notes: '',
  active: true,
  version: 1,
  createdAt: '2026-01-05T09:00:00.000Z',
  updatedAt: '2026-01-05T09:00:00.000Z',
}));

/** The demo catalogue's parts as the API sends them (with a row version). */
export const apiParts: PartRecord[] = demoParts.map((part) => ({ ...part, version: 1 }));

/** A catalogue API over the demo data: parts filtered by kind only, suppliers as they are. */
export function catalogueApi(parts: PartRecord[] = apiParts) {
  return createFetchMock()
    .on('GET', '/api/suppliers', () => jsonResponse(200, apiSuppliers))
    .on('GET', '/api/parts', ({ url }) => {
      const kind = url.searchParams.get('kind');
      const items = parts.filter((p) => !kind || p.kind === kind).slice(0, 50);
      return jsonResponse(200, { items, total: items.length, page: 1, pageSize: 50 });
    });
}
