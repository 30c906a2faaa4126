import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { SessionProvider } from '../features/auth/components/SessionProvider';
import type { ApiClient } from '../lib/api-client';
import { ApiClientContext } from '../lib/api-client-context';
import type { ColorScheme } from './color-scheme';
import { ThemedApp } from './ThemedApp';

export interface AppProvidersProps {
  apiClient: ApiClient;
  queryClient: QueryClient;
  initialScheme?: ColorScheme;
  children: ReactNode;
}

export function AppProviders({ apiClient, queryClient, initialScheme, children }: AppProvidersProps) {
  return (
    <ThemedApp initialScheme={initialScheme}>
      <ApiClientContext.Provider value={apiClient}>
        <QueryClientProvider client={queryClient}>
          <SessionProvider>{children}</SessionProvider>
        </QueryClientProvider>
      </ApiClientContext.Provider>
    </ThemedApp>
  );
}
