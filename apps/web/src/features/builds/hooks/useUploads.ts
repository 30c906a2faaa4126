import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { uploadsQueryOptions } from '../api/uploads-query-options';

export function useUploads(buildId: string) {
  return useQuery(uploadsQueryOptions(useApiClient(), buildId));
}
