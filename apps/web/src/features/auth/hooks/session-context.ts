import { createContext } from 'react';
import type { SessionState } from '../../../lib/api-client';
import type { Me } from '../../../lib/contract/me-schema';
import type { Role } from '../../../lib/contract/role-schema';

export interface SessionContextValue {
  state: SessionState;
  me: Me | null;
  roles: readonly Role[];
  hasRole(...anyOf: readonly Role[]): boolean;
  signIn(email: string, password: string): Promise<Me>;
  signOut(): Promise<void>;
}

export const SessionContext = createContext<SessionContextValue | null>(null);
