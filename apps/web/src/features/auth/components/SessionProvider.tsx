import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useRef, useSyncExternalStore, type ReactNode } from 'react';
import type { Role } from '../../../lib/contract/role-schema';
import { useApiClient } from '../../../lib/useApiClient';
import { SessionContext, type SessionContextValue } from '../hooks/session-context';

export interface SessionProviderProps {
  children: ReactNode;
}

const noRoles: readonly Role[] = [];

export function SessionProvider({ children }: SessionProviderProps) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const state = useSyncExternalStore(client.subscribe, client.getSession);

  useEffect(() => {
    void client.restoreSession();
  }, [client]);

  // Nothing cached for one user may be shown to the next one on the same screen.
  const previousStatus = useRef(state.status);
  useEffect(() => {
    if (previousStatus.current === 'signed-in' && state.status !== 'signed-in') queryClient.clear();
    previousStatus.current = state.status;
  }, [state.status, queryClient]);

  const value = useMemo<SessionContextValue>(() => {
    const me = state.status === 'signed-in' ? state.user : null;
    const roles = me?.roles ?? noRoles;
    return {
      state,
      me,
      roles,
      hasRole: (...anyOf) => anyOf.some((role) => roles.includes(role)),
      signIn: client.signIn,
      signOut: client.signOut,
    };
  }, [state, client]);

  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}
