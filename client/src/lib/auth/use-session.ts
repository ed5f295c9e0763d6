import { useCallback, useSyncExternalStore } from 'react';
import type { SessionProfile } from '@lockstep/shared';
import { queryClient } from '../query-client';
import { revokeToken } from './revoke-token';
import { endSession, getSession, startSession, subscribeSession, type Session, type SessionEndReason } from './session-store';

export interface SessionState {
  session: Session | null;
  user: SessionProfile | null;
  signIn: (session: Session) => void;
  signOut: () => void;
}

/** Ends the session, on the server too, and forgets everything cached for this person. */
export function signOutFor(reason: SessionEndReason): void {
  const token = getSession()?.accessToken;
  if (token) revokeToken(token);
  endSession(reason);
  queryClient.clear();
}

/**
 * The signed-in person, read from one store outside React so that the API client (which has
 * no React context) can end the session on a 401 and every screen follows.
 */
export function useSession(): SessionState {
  const session = useSyncExternalStore(subscribeSession, getSession, () => null);

  const signIn = useCallback((next: Session) => {
    // Nothing cached for the previous person may show to the next one.
    queryClient.clear();
    startSession(next);
  }, []);

  const signOut = useCallback(() => signOutFor('signed-out'), []);

  return { session, user: session?.user ?? null, signIn, signOut };
}

/** For screens inside the signed-in layout, where a user is guaranteed by the route guard. */
export function useCurrentUser(): SessionProfile {
  const { user } = useSession();
  if (!user) throw new Error('useCurrentUser needs a signed-in user');
  return user;
}
