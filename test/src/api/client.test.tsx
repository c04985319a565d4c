import {
  api,
  ApiError,
  apiRequest,
  CLIENT_ERROR_CODES,
  refreshSession,
  setAuthToken,
  subscribeToSession,
  type SessionListener,
} from '@/api/client';

import { accountUser, sessionAnswer } from '../helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError, requestsOf } from '../helpers/fake-fetch';

const { fetchMock } = installFakeFetch();

beforeEach(() => {
  setAuthToken(null);
});

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error('expected the request to fail');
}

describe('apiRequest', () => {
  it('asks the same origin under /api and resolves with the parsed body', async () => {
    fetchMock.mockResolvedValue(respond(200, '{"ok":true,"version":"0.1.0","database":{"ok":true,"sqlite":"3.52.0"}}'));
    await expect(api.get('/health')).resolves.toEqual({ ok: true, version: '0.1.0', database: { ok: true, sqlite: '3.52.0' } });
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toBe('/api/health');
    expect(init.method).toBe('GET');
    expect(init.body).toBeUndefined();
  });

  it('sends a body as JSON', async () => {
    fetchMock.mockResolvedValue(respond(201, '{"id":7}'));
    await api.post('/bikes', { name: 'Commuter', forkTravelMm: 120 });
    const [, init] = fetchMock.mock.calls[0];
    expect(init.method).toBe('POST');
    expect(init.body).toBe('{"name":"Commuter","forkTravelMm":120}');
    expect((init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('carries the auth token once one is set, and drops it when cleared', async () => {
    fetchMock.mockResolvedValue(respond(200, '{}'));
    setAuthToken('token-123');
    await api.get('/me');
    setAuthToken(null);
    await api.get('/me');
    const headers = fetchMock.mock.calls.map(([, init]) => init.headers as Record<string, string>);
    expect(headers[0].Authorization).toBe('Bearer token-123');
    expect(headers[1].Authorization).toBeUndefined();
  });

  it("turns the server's error envelope into an ApiError with its code, message and fields", async () => {
    fetchMock.mockResolvedValue(
      respond(
        422,
        JSON.stringify({
          error: {
            code: 'validation_failed',
            message: 'Some answers need another look.',
            fields: { riderMassKg: 'Enter a mass between 30 and 250 kg.' },
          },
        }),
      ),
    );
    const error = await caught(api.post('/riders', { riderMassKg: 5 }));
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(422);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('Some answers need another look.');
    expect(error.fields).toEqual({ riderMassKg: 'Enter a mass between 30 and 250 kg.' });
  });

  it('reports an error answer that is not the envelope (an HTML 404 page) as a bad response', async () => {
    fetchMock.mockResolvedValue(respond(404, '<html><body>Not found</body></html>'));
    const error = await caught(api.get('/health'));
    expect(error.status).toBe(404);
    expect(error.code).toBe(CLIENT_ERROR_CODES.badResponse);
    expect(error.message).toContain('404');
    expect(error.fields).toBeUndefined();
  });

  it('reports a success without a JSON body as a bad response', async () => {
    fetchMock.mockResolvedValue(respond(200, 'ok'));
    expect((await caught(api.get('/health'))).code).toBe(CLIENT_ERROR_CODES.badResponse);
  });

  it('resolves 204 No Content with undefined', async () => {
    fetchMock.mockResolvedValue(respond(204, ''));
    await expect(api.delete('/bikes/7')).resolves.toBeUndefined();
  });

  it('reports a failed connection with status 0', async () => {
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    const error = await caught(api.get('/health'));
    expect(error.status).toBe(0);
    expect(error.code).toBe(CLIENT_ERROR_CODES.network);
  });

  it('gives up after the timeout', async () => {
    jest.useFakeTimers();
    try {
      fetchMock.mockImplementation(
        (_url, init) =>
          new Promise((_resolve, reject) =>
            init.signal?.addEventListener('abort', () => reject(new Error('aborted'))),
          ),
      );
      const pending = caught(apiRequest('/health'));
      jest.advanceTimersByTime(15_000);
      const error = await pending;
      expect(error.code).toBe(CLIENT_ERROR_CODES.timeout);
      expect(error.status).toBe(0);
    } finally {
      jest.useRealTimers();
    }
  });

  it("passes the caller's own abort through untouched", async () => {
    const abortError = new Error('The operation was aborted.');
    fetchMock.mockImplementation(
      (_url, init) =>
        new Promise((_resolve, reject) =>
          init.signal?.addEventListener('abort', () => reject(abortError)),
        ),
    );
    const controller = new AbortController();
    const pending = apiRequest('/health', { signal: controller.signal });
    controller.abort();
    await expect(pending).rejects.toBe(abortError);
  });
});

/** The Authorization header each request carried, in order. */
function bearers(): (string | undefined)[] {
  return fetchMock.mock.calls.map(([, init]) => (init.headers as Record<string, string>).Authorization);
}

const expired = () => respondError(401, 'unauthorized', 'Sign in to continue.');

describe('the session', () => {
  let heard: jest.MockedFunction<SessionListener>;
  let unsubscribe: () => void;
  beforeEach(() => {
    heard = jest.fn();
    unsubscribe = subscribeToSession(heard);
  });
  afterEach(() => unsubscribe());

  it('sends cookies to the session routes only', async () => {
    fetchMock.mockResolvedValue(respond(200, '{}'));
    await api.post('/auth/sign-in', { email: 'rider@demo.test', password: 'x' });
    await api.get('/me');
    expect(fetchMock.mock.calls.map(([, init]) => init.credentials)).toEqual(['include', 'same-origin']);
  });

  it('renews an expired access token from the cookie and repeats the request once', async () => {
    setAuthToken('stale');
    const rider = accountUser('rider');
    let meCalls = 0;
    fetchMock.mockImplementation(
      answerBy({
        'GET /api/me': () => (++meCalls === 1 ? expired() : respond(200, { user: rider })),
        'POST /api/auth/refresh': respond(200, sessionAnswer(rider, 'fresh')),
      }),
    );

    await expect(api.get('/me')).resolves.toEqual({ user: rider });
    expect(requestsOf(fetchMock)).toEqual(['GET /api/me', 'POST /api/auth/refresh', 'GET /api/me']);
    expect(bearers()[2]).toBe('Bearer fresh');
    expect(fetchMock.mock.calls[1][1].credentials).toBe('include');
    expect(heard).toHaveBeenCalledWith(sessionAnswer(rider, 'fresh'));
  });

  it('renews once for requests that fail together, then repeats each of them', async () => {
    setAuthToken('stale');
    const rider = accountUser('rider');
    fetchMock.mockImplementation(
      answerBy({
        'GET /api/me': (init) =>
          (init.headers as Record<string, string>).Authorization === 'Bearer fresh'
            ? respond(200, { user: rider })
            : expired(),
        'GET /api/health': (init) =>
          (init.headers as Record<string, string>).Authorization === 'Bearer fresh'
            ? respond(200, { ok: true })
            : expired(),
        'POST /api/auth/refresh': respond(200, sessionAnswer(rider, 'fresh')),
      }),
    );

    const answers = await Promise.all([api.get('/me'), api.get('/health'), api.get('/me')]);
    expect(answers).toEqual([{ user: rider }, { ok: true }, { user: rider }]);
    const requests = requestsOf(fetchMock);
    expect(requests.filter((r) => r === 'POST /api/auth/refresh')).toHaveLength(1);
    expect(requests).toHaveLength(7);
  });

  it('ends the session when the renewal is refused, without repeating the request', async () => {
    setAuthToken('stale');
    fetchMock.mockImplementation(
      answerBy({
        'GET /api/me': expired(),
        'POST /api/auth/refresh': respondError(401, 'session-expired', 'Your session has ended; sign in again.'),
      }),
    );

    const error = await caught(api.get('/me'));
    expect(error.code).toBe('session-expired');
    expect(requestsOf(fetchMock)).toEqual(['GET /api/me', 'POST /api/auth/refresh']);
    expect(heard).toHaveBeenCalledWith(null);

    fetchMock.mockImplementation(answerBy({ 'GET /api/health': respond(200, '{}') }));
    await api.get('/health');
    expect(bearers().at(-1)).toBeUndefined();
  });

  it('keeps the session when the renewal gets no answer at all', async () => {
    setAuthToken('stale');
    fetchMock.mockImplementation(async (url) => {
      if (url === '/api/auth/refresh') throw new TypeError('Failed to fetch');
      return expired();
    });
    expect((await caught(api.get('/me'))).code).toBe(CLIENT_ERROR_CODES.network);
    expect(heard).not.toHaveBeenCalled();
  });

  it('takes a wrong password as final: no renewal', async () => {
    fetchMock.mockResolvedValue(respondError(401, 'bad-credentials', 'The e-mail or password is wrong.'));
    expect((await caught(api.post('/auth/sign-in', {}))).code).toBe('bad-credentials');
    expect(requestsOf(fetchMock)).toEqual(['POST /api/auth/sign-in']);
  });

  it('asks for a new renewal once the last one has settled', async () => {
    const rider = accountUser('rider');
    fetchMock.mockImplementation(answerBy({ 'POST /api/auth/refresh': respond(200, sessionAnswer(rider)) }));
    await refreshSession();
    await refreshSession();
    expect(requestsOf(fetchMock)).toEqual(['POST /api/auth/refresh', 'POST /api/auth/refresh']);
  });
});
