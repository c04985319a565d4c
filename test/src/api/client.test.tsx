import { api, ApiError, apiRequest, CLIENT_ERROR_CODES, setAuthToken } from '@/api/client';

/** A minimal fetch Response: only what the client reads. */
function respond(status: number, body: string) {
  return { ok: status >= 200 && status < 300, status, text: async () => body } as Response;
}

const fetchMock = jest.fn<Promise<Response>, [string, RequestInit]>();

beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
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
