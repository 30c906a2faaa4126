import { partSchema } from '@linesmith/catalog';
import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { sketchKeys } from './sketch-keys';

/** The API's largest page of parts. */
const PAGE_SIZE = 200;

const partPageSchema = z.object({
  items: z.array(partSchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().positive(),
  pageSize: z.number().int().positive(),
});

/**
 * The shop's whole catalogue, for checking the sketch in the browser and for the pickers and the
 * adapter solver. Read page by page (`GET /api/parts`); a shop catalogue is a few thousand rows.
 */
export function catalogueQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: sketchKeys.catalogue(),
    queryFn: async ({ signal }) => {
      const parts: z.infer<typeof partSchema>[] = [];
      for (let page = 1; ; page += 1) {
        const params = new URLSearchParams({ page: String(page), pageSize: String(PAGE_SIZE) });
        const body = await client.request(`/api/parts?${params.toString()}`, { schema: partPageSchema, signal });
        parts.push(...body.items);
        if (body.items.length === 0 || parts.length >= body.total) return parts;
      }
    },
    staleTime: 5 * 60_000,
  });
}
