import { act, render, renderHook, screen, waitFor } from '@testing-library/react-native';
import { Text } from 'react-native';

import { api, setAuthToken } from '@/api/client';
import { SessionProvider, useSession, type Session } from '@/session/session-provider';

import { accountUser, sessionAnswer } from '../helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError, requestsOf } from '../helpers/fake-fetch';
import { TestSWR } from '../helpers/swr';

const { fetchMock } = installFakeFetch();
const rider = accountUser('rider');

beforeEach(() => setAuthToken(null));

/** Renders the provider and hands out the session it gives, kept up to date. */
function renderSession() {
  const latest: { current?: Session } = {};
  function Probe() {
    const session = useSession();
    latest.current = session;
    return <Text testID="status">{`${session.status} ${session.user?.name ?? ''}`.trim()}</Text>;
  }
  render(
    <TestSWR>
      <SessionProvider>
        <Probe />
      </SessionProvider>
    </TestSWR>,
  );
  return () => latest.current!;
}

const status = () => screen.getByTestId('status');

describe('useSession', () => {
  it('throws outside a SessionProvider', () => {
    // React reports the error it rethrows; that report is expected here.
    jest.spyOn(console, 'error').mockImplementation(() => {});
    expect(() => renderHook(() => useSession())).toThrow('useSession must be used inside a <SessionProvider>.');
  });
});

describe('SessionProvider', () => {
  afterEach(() => jest.restoreAllMocks());

  it('restores the session from the refresh cookie on start', async () => {
    fetchMock.mockImplementation(answerBy({ 'POST /api/auth/refresh': respond(200, sessionAnswer(rider)) }));
    renderSession();
    expect(status()).toHaveTextContent('loading');
    await waitFor(() => expect(status()).toHaveTextContent('signed-in Mara Linden'));
  });

  it('settles as signed out when the cookie buys no session', async () => {
    fetchMock.mockImplementation(
      answerBy({ 'POST /api/auth/refresh': respondError(401, 'session-expired', 'Your session has ended.') }),
    );
    renderSession();
    await waitFor(() => expect(status()).toHaveTextContent('signed-out'));
  });

  it('settles as signed out when the server does not answer', async () => {
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    renderSession();
    await waitFor(() => expect(status()).toHaveTextContent('signed-out'));
  });

  it('signs in, then carries the token on later requests', async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': respondError(401, 'session-expired', 'Your session has ended.'),
        'POST /api/auth/sign-in': respond(200, sessionAnswer(rider, 'rider-token')),
        'GET /api/me': respond(200, { user: rider }),
      }),
    );
    const session = renderSession();
    await waitFor(() => expect(status()).toHaveTextContent('signed-out'));

    await act(() => session().signIn({ email: 'rider@demo.test', password: 'sagwright-demo' }));
    expect(status()).toHaveTextContent('signed-in Mara Linden');
    const [, init] = fetchMock.mock.calls[1];
    expect(JSON.parse(init.body as string)).toEqual({ email: 'rider@demo.test', password: 'sagwright-demo' });
  });

  it('signs out on the server and then here', async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': respond(200, sessionAnswer(rider)),
        'POST /api/auth/sign-out': respond(204),
      }),
    );
    const session = renderSession();
    await waitFor(() => expect(status()).toHaveTextContent(/^signed-in/));

    await act(() => session().signOut());
    expect(status()).toHaveTextContent('signed-out');
    expect(requestsOf(fetchMock)).toEqual(['POST /api/auth/refresh', 'POST /api/auth/sign-out']);
  });

  it('stays signed in when the sign-out does not reach the server', async () => {
    fetchMock.mockImplementation(async (url) => {
      if (url === '/api/auth/refresh') return respond(200, sessionAnswer(rider));
      throw new TypeError('Failed to fetch');
    });
    const session = renderSession();
    await waitFor(() => expect(status()).toHaveTextContent(/^signed-in/));

    await act(() => expect(session().signOut()).rejects.toMatchObject({ code: 'network_error' }));
    expect(status()).toHaveTextContent('signed-in Mara Linden');
  });

  it('ends when the client finds the session gone mid-request', async () => {
    let refreshes = 0;
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': () =>
          ++refreshes === 1
            ? respond(200, sessionAnswer(rider))
            : respondError(401, 'session-expired', 'Your session has ended.'),
        'GET /api/me': respondError(401, 'unauthorized', 'Sign in to continue.'),
      }),
    );
    const session = renderSession();
    await waitFor(() => expect(status()).toHaveTextContent(/^signed-in/));
    expect(session().user).toEqual(rider);

    await act(() => expect(api.get('/me')).rejects.toMatchObject({ code: 'session-expired' }));
    expect(status()).toHaveTextContent('signed-out');
  });
});
