import { useSyncExternalStore } from 'react';
import type { SessionUser, SignInResponse } from '@limitbook/contracts';

/**
 * The signed-in session lives in memory only: the access token never touches storage, and a
 * reload restores the session through the refresh cookie.
 */
export type SessionState =
  | { status: 'restoring' }
  | { status: 'signed-out'; reason?: 'expired' | 'signed-out' }
  | { status: 'signed-in'; user: SessionUser; accessToken: string; expiresAt: number };

export type SessionStore = ReturnType<typeof createSessionStore>;

export function createSessionStore(initial: SessionState = { status: 'restoring' }) {
  let state: SessionState = initial;
  const listeners = new Set<() => void>();
  const emit = (next: SessionState) => {
    state = next;
    for (const listener of listeners) listener();
  };

  return {
    get: (): SessionState => state,
    subscribe: (listener: () => void) => {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    accessToken: (): string | null => (state.status === 'signed-in' ? state.accessToken : null),
    signIn: (response: SignInResponse) =>
      emit({
        status: 'signed-in',
        user: response.user,
        accessToken: response.accessToken,
        expiresAt: Date.now() + response.expiresIn * 1000,
      }),
    signOut: (reason: 'expired' | 'signed-out' = 'signed-out') => {
      // A session that was never restored did not "expire"; keep the message for real losses.
      const wasSignedIn = state.status === 'signed-in';
      emit({ status: 'signed-out', reason: wasSignedIn ? reason : undefined });
    },
  };
}

export const session = createSessionStore();

export function useSession(): SessionState {
  return useSyncExternalStore(session.subscribe, session.get, session.get);
}

/** The signed-in user; only for components rendered behind the authentication guard. */
export function useSessionUser(): SessionUser {
  const state = useSession();
  if (state.status !== 'signed-in') throw new Error('useSessionUser needs a signed-in session');
  return state.user;
}
