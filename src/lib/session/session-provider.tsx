import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { authResponse, type AuthResponse } from '@shared/contracts/auth';
import { api, connectTokenSource } from '../api/client';
import type { SessionUser, StoredSession } from './stored-session';
import { tokenStore } from './token-store';

interface SessionState {
  /** False until the stored session has been read, so guards don't redirect too early. */
  ready: boolean;
  user: SessionUser | null;
  signIn(answer: AuthResponse): Promise<void>;
  signOut(): Promise<void>;
  updateUser(user: SessionUser): void;
}

const SessionContext = createContext<SessionState | null>(null);

function toStored(answer: AuthResponse): StoredSession {
  const { id, email, displayName, role } = answer.user;
  return { token: answer.token, refreshToken: answer.refreshToken, user: { id, email, displayName, role } };
}

export function SessionProvider({ children }: { children: ReactNode }) {
  const [ready, setReady] = useState(false);
  const [session, setSession] = useState<StoredSession | null>(null);
  const current = useRef<StoredSession | null>(null);
  const refreshing = useRef<Promise<string | null> | null>(null);

  const store = useCallback(async (next: StoredSession | null) => {
    current.current = next;
    setSession(next);
    if (next) await tokenStore.save(next);
    else await tokenStore.clear();
  }, []);

  useEffect(() => {
    connectTokenSource({
      getAccessToken: () => current.current?.token ?? null,
      refresh: () => {
        const refreshToken = current.current?.refreshToken;
        if (!refreshToken) return Promise.resolve(null);
        // Many requests may hit a 401 together; they share one refresh.
        refreshing.current ??= api('/auth/refresh', { body: { refreshToken }, anonymous: true, schema: authResponse })
          .then(async (answer) => {
            await store(toStored(answer));
            return answer.token;
          })
          .catch(async (error: { status?: number }) => {
            if (error?.status === 401 || error?.status === 403) await store(null);
            return null;
          })
          .finally(() => {
            refreshing.current = null;
          });
        return refreshing.current;
      },
      onSignedOut: () => void store(null),
    });
    void tokenStore.load().then((saved) => {
      current.current = saved;
      setSession(saved);
      setReady(true);
    });
  }, [store]);

  const value = useMemo<SessionState>(
    () => ({
      ready,
      user: session?.user ?? null,
      signIn: (answer) => store(toStored(answer)),
      signOut: async () => {
        // Ends the sign-in on the server too, so the refresh token is dead even if a copy exists.
        if (current.current?.token) await api('/auth/logout', { method: 'POST' }).catch(() => undefined);
        await store(null);
      },
      updateUser: (user) => {
        if (current.current) void store({ ...current.current, user });
      },
    }),
    [ready, session, store],
  );
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionState {
  const value = useContext(SessionContext);
  if (!value) throw new Error('useSession must be used inside <SessionProvider>');
  return value;
}
