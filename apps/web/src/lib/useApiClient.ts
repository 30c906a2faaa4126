import { useContext } from 'react';
import type { ApiClient } from './api-client';
import { ApiClientContext } from './api-client-context';

export function useApiClient(): ApiClient {
  const client = useContext(ApiClientContext);
  if (!client) throw new Error('useApiClient must be used inside ApiClientContext');
  return client;
}
