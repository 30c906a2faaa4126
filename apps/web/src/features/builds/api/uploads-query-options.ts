import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { buildKeys } from './build-keys';
import { uploadListSchema } from './upload-schema';

export function uploadsQueryOptions(client: ApiClient, buildId: string) {
  return queryOptions({
    queryKey: buildKeys.uploads(buildId),
    queryFn: ({ signal }) =>
      client.request(`/api/builds/${encodeURIComponent(buildId)}/uploads`, { schema: uploadListSchema, signal }),
  });
}
