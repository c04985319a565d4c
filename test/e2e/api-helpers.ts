/** The API of a browser test's server, for the set-up a test needs before it opens a page. */
import { DEMO_PASSWORD } from '../../server/seed/demo-accounts';
import { call as callAt } from '../support/api-call';
import { RunningServer } from './server-process';

/** Requests to `live.server`, whose address is read at each call since the server starts in beforeAll. */
export function apiFor(live: { server: RunningServer }) {
  /** A JSON request to the API with the given access token; fails the test on any error answer. */
  const call = <T>(method: string, path: string, token?: string, body?: unknown): Promise<T> =>
    callAt<T>(live.server.url, method, path, token, body);

  /** An access token for the account, a demo one unless a password is given. */
  const signInApi = async (email: string, password = DEMO_PASSWORD) =>
    (await call<{ token: string }>('POST', '/auth/sign-in', undefined, { email, password })).token;

  return { call, signInApi };
}
