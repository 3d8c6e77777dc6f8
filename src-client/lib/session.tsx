import { createContext, ReactNode, useCallback, useContext, useEffect, useMemo, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { apiRequest, ApiError, SESSION_ENDED_EVENT, tokenStore } from './api-client';
import type { components } from './api-types';

export type Role = components['schemas']['Role'];

/** The signed-in user, as GET /auth/me answers. */
export type SessionUser = components['schemas']['MeDto'];

interface SessionState {
  user: SessionUser | null;
  /** True until a stored token has been checked against the server. */
  loading: boolean;
  /** Why the last session ended, shown once on the sign-in page. */
  endedReason: string | null;
  signIn: (token: string, user: SessionUser) => void;
  signOut: (reason?: string) => void;
}

const SessionContext = createContext<SessionState | null>(null);

export interface SessionProviderProps {
  children: ReactNode;
}

export function SessionProvider({ children }: SessionProviderProps) {
  const queryClient = useQueryClient();
  const [user, setUser] = useState<SessionUser | null>(null);
  const [loading, setLoading] = useState(() => tokenStore.get() !== null);
  const [endedReason, setEndedReason] = useState<string | null>(null);

  const signOut = useCallback(
    (reason?: string) => {
      // Ends the token on the server too (best effort: the local sign-out happens whatever it answers).
      if (tokenStore.get()) apiRequest('/auth/logout', { method: 'POST' }).catch(() => undefined);
      tokenStore.clear();
      setUser(null);
      setEndedReason(reason ?? null);
      queryClient.clear();
    },
    [queryClient],
  );

  const signIn = useCallback((token: string, next: SessionUser) => {
    tokenStore.set(token);
    setEndedReason(null);
    setUser(next);
  }, []);

  useEffect(() => {
    if (!tokenStore.get()) return;
    apiRequest<SessionUser>('/auth/me')
      .then(setUser)
      .catch((error: unknown) => {
        if (!(error instanceof ApiError) || error.status !== 401) tokenStore.clear();
      })
      .finally(() => setLoading(false));
  }, []);

  useEffect(() => {
    const onEnded = (event: Event) => {
      const detail = (event as CustomEvent<{ code: string; message: string }>).detail;
      signOut(detail.code === 'AUTH_TOKEN_EXPIRED' ? 'Your session expired. Sign in again.' : 'Your session is no longer valid. Sign in again.');
    };
    window.addEventListener(SESSION_ENDED_EVENT, onEnded);
    return () => window.removeEventListener(SESSION_ENDED_EVENT, onEnded);
  }, [signOut]);

  const value = useMemo(() => ({ user, loading, endedReason, signIn, signOut }), [user, loading, endedReason, signIn, signOut]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionState {
  const session = useContext(SessionContext);
  if (!session) throw new Error('useSession must be used inside <SessionProvider>');
  return session;
}

/** True when the signed-in user has one of the roles. */
export function useHasRole(...roles: Role[]): boolean {
  const { user } = useSession();
  return user !== null && roles.includes(user.role);
}
