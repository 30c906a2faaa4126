import { createContext } from 'react';
import type { ApiClient } from './api-client';

/** Provided once by the app; tests provide their own client with a mocked fetch. */
export const ApiClientContext = createContext<ApiClient | null>(null);
