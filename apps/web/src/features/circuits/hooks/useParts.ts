import { partSchema, type Part } from '@linesmith/catalog';
import { useQueries } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';

/** Catalogue parts by id (`GET /api/parts/:id`), for details the check does not carry (hose dash). */
export function useParts(ids: readonly string[]): ReadonlyMap<string, Part> {
  const client = useApiClient();
  const unique = [...new Set(ids)];
  return useQueries({
    queries: unique.map((id) => ({
      queryKey: ['parts', 'detail', id] as const,
      queryFn: ({ signal }: { signal: AbortSignal }) =>
        client.request(`/api/parts/${encodeURIComponent(id)}`, { schema: partSchema, signal }),
      staleTime: 5 * 60_000,
    })),
    combine: (results) => {
      const byId = new Map<string, Part>();
      for (const result of results) if (result.data) byId.set(result.data.id, result.data);
      return byId;
    },
  });
}
