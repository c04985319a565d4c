/**
 * A stand-in for `fetch` in component tests. Each test queues its own answers; a request a test
 * leaves unanswered is settled after it, so the client's timeout timer never outlives the test.
 */
export type FetchMock = jest.Mock<Promise<Response>, [string, RequestInit]>;

/** A minimal Response: only what the API client reads. */
export function respond(status: number, body?: unknown): Response {
  const text = body === undefined ? '' : typeof body === 'string' ? body : JSON.stringify(body);
  return { ok: status >= 200 && status < 300, status, text: async () => text } as Response;
}

/** Installs a fresh mock before each test of the calling file. */
export function useFakeFetch(): { fetchMock: FetchMock; unanswered: () => Promise<Response> } {
  const fetchMock: FetchMock = jest.fn();
  const open: ((response: Response) => void)[] = [];

  beforeEach(() => {
    fetchMock.mockReset();
    global.fetch = fetchMock as unknown as typeof fetch;
  });
  afterEach(() => {
    open.splice(0).forEach((settle) => settle(respond(503)));
  });

  return {
    fetchMock,
    /** An answer that stays on its way for the rest of the test. */
    unanswered: () => new Promise<Response>((resolve) => open.push(resolve)),
  };
}
