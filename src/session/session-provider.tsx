/**
 * Who is signed in, for the whole app. On start the provider asks the server to restore a session
 * from the refresh cookie, so a reload or a reopened tab keeps the person signed in (on the web
 * only when this browser has signed in before: see session-hint.web.ts). The API client reports
 * every later change (a renewal, the end of a session), so the state here never disagrees with
 * the token it holds.
 */
import { createContext, use, useEffect, useMemo, useState, type ReactNode } from 'react';
import { useSWRConfig } from 'swr';

import {
  api,
  ApiError,
  beginSession,
  endSession,
  refreshSession,
  subscribeToSession,
} from '@/api/client';
import type { SignInInput, SignUpInput } from '@shared/schemas/auth.schema';
import type { AccountUser, SessionAnswer } from '@shared/types/account';

import { mayHaveSession, rememberSession } from './session-hint';

type SessionState =
  | { status: 'loading'; user: null }
  | { status: 'signed-in'; user: AccountUser }
  | { status: 'signed-out'; user: null };

export type Session = SessionState & {
  /** Rejects with the server's ApiError (bad credentials, inactive account, rate limit). */
  signIn: (input: SignInInput) => Promise<AccountUser>;
  /** Creates a rider account and signs it in. */
  signUp: (input: SignUpInput) => Promise<AccountUser>;
  /**
   * Ends the session on the server, which clears the refresh cookie, and then here. Rejects,
   * keeping the session, when the server did not do it: the cookie left behind would sign the
   * person straight back in on the next visit, on a device the shop may share.
   */
  signOut: () => Promise<void>;
};

const RESTORING: SessionState = { status: 'loading', user: null };
const SIGNED_OUT: SessionState = { status: 'signed-out', user: null };

const SessionContext = createContext<Session | null>(null);

export function SessionProvider({ children }: { children: ReactNode }) {
  const [state, setState] = useState<SessionState>(() => (mayHaveSession() ? RESTORING : SIGNED_OUT));
  const { mutate } = useSWRConfig();

  useEffect(() => {
    const unsubscribe = subscribeToSession((session) => {
      rememberSession(session !== null);
      if (session) {
        setState({ status: 'signed-in', user: session.user });
      } else {
        setState(SIGNED_OUT);
        // Nothing one account fetched may show to whoever signs in next on this device.
        void mutate(() => true, undefined, { revalidate: false });
      }
    });
    if (mayHaveSession()) {
      // A refusal has already ended the session through the listener; no answer counts as none.
      refreshSession().catch(() =>
        setState((current) => (current.status === 'loading' ? SIGNED_OUT : current)),
      );
    }
    return unsubscribe;
  }, [mutate]);

  const session = useMemo<Session>(
    () => ({
      ...state,
      signIn: async (input) => start(await api.post<SessionAnswer>('/auth/sign-in', input)),
      signUp: async (input) => start(await api.post<SessionAnswer>('/auth/sign-up', input)),
      signOut: async () => {
        try {
          await api.post('/auth/sign-out');
        } catch (error) {
          // A 401 means the session was over already, which is what was asked for.
          if (!(error instanceof ApiError && error.status === 401)) throw error;
        }
        endSession();
      },
    }),
    [state],
  );

  return <SessionContext value={session}>{children}</SessionContext>;
}

function start(answer: SessionAnswer): AccountUser {
  beginSession(answer);
  return answer.user;
}

/** The session; throws outside a SessionProvider, where there is none to read. */
export function useSession(): Session {
  const session = use(SessionContext);
  if (!session) throw new Error('useSession must be used inside a <SessionProvider>.');
  return session;
}

/**
 * The signed-in account, for screens under app/(app), whose layout shows them only with a
 * session; anywhere else that is a mistake in the code, so it throws.
 */
export function useSignedInUser(): AccountUser {
  const { user } = useSession();
  if (!user) throw new Error('useSignedInUser must be used under the signed-in layout.');
  return user;
}
