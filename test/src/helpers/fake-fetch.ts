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

/** The server's error envelope. */
export function respondError(status: number, code: string, message: string, fields?: Record<string, string>) {
  return respond(status, { error: { code, message, ...(fields && { fields }) } });
}

/** Answers, or makers of answers, by `METHOD /api/path?query`. */
export type Answers = Record<string, Response | ((init: RequestInit) => Response | Promise<Response>)>;

/**
 * A fetch that answers each request from `answers`. A request with no answer gets a 501 whose
 * message names it, so a test that forgot one fails on a readable message.
 */
export function answerBy(answers: Answers) {
  return async (url: string, init: RequestInit): Promise<Response> => {
    const request = `${init.method ?? 'GET'} ${url}`;
    const answer = answers[request];
    if (!answer) return respondError(501, 'no-answer-in-test', `No answer for ${request}`);
    return typeof answer === 'function' ? answer(init) : answer;
  };
}

/** Installs a fresh mock before each test of the calling file. */
export function installFakeFetch(): { fetchMock: FetchMock; unanswered: () => Promise<Response> } {
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

/** The requests made so far, as `METHOD /api/path`. */
export function requestsOf(fetchMock: FetchMock): string[] {
  return fetchMock.mock.calls.map(([url, init]) => `${init.method ?? 'GET'} ${url}`);
}
