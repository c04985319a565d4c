import { act, render, waitFor } from '@testing-library/react-native';
import { SWRConfig } from 'swr';

import { ServerStatus } from '@/components/server-status';

import { getByTestId, getByText, press, queryAllByText, textOf } from '../helpers/web-queries';

function respond(status: number, body: unknown) {
  const text = typeof body === 'string' ? body : JSON.stringify(body);
  return { ok: status >= 200 && status < 300, status, text: async () => text } as Response;
}

const fetchMock = jest.fn<Promise<Response>, [string, RequestInit]>();

beforeEach(() => {
  fetchMock.mockReset();
  global.fetch = fetchMock as unknown as typeof fetch;
});

/** A cache of its own per test, and no automatic retries, so each test sees only its answers. */
function renderStatus() {
  return render(
    <SWRConfig value={{ provider: () => new Map(), shouldRetryOnError: false, dedupingInterval: 0 }}>
      <ServerStatus />
    </SWRConfig>,
  );
}

const statusText = () => textOf(getByTestId('server-status'));

describe('ServerStatus', () => {
  it('says it is checking while the answer is on its way', async () => {
    fetchMock.mockReturnValue(new Promise(() => {}));
    renderStatus();
    expect(statusText()).toContain('Checking the server');
    expect(fetchMock.mock.calls[0][0]).toBe('/api/health');
  });

  it('shows the version and database state of a healthy server', async () => {
    fetchMock.mockResolvedValue(respond(200, { ok: true, version: '0.1.0', database: { ok: true, sqlite: '3.52.0' } }));
    renderStatus();
    await waitFor(() => expect(statusText()).toContain('Server up'));
    expect(getByText('0.1.0').props.style.fontFamily).toContain('Azeret Mono');
    expect(queryAllByText('Try again')).toHaveLength(0);
  });

  it('shows a warning when the server answers but reports a problem', async () => {
    fetchMock.mockResolvedValue(respond(200, { ok: false, version: '0.1.0', database: { ok: false } }));
    renderStatus();
    await waitFor(() => expect(statusText()).toContain('reporting a problem'));
    expect(statusText()).toContain('down');
  });

  it("shows the server's own message for an error answer and checks again on request", async () => {
    fetchMock.mockResolvedValueOnce(
      respond(503, { error: { code: 'database_unavailable', message: 'The database is not answering.' } }),
    );
    renderStatus();
    await waitFor(() => expect(statusText()).toContain('Server check failed'));
    expect(statusText()).toContain('The database is not answering.');

    fetchMock.mockResolvedValueOnce(respond(200, { ok: true, version: '0.1.1', database: { ok: true, sqlite: '3.52.0' } }));
    await act(async () => {
      press(getByText('Try again'));
    });
    await waitFor(() => expect(statusText()).toContain('Server up'));
    expect(statusText()).toContain('0.1.1');
    expect(fetchMock).toHaveBeenCalledTimes(2);
  });

  it('tells an unreachable server apart from a failing one', async () => {
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    renderStatus();
    await waitFor(() => expect(statusText()).toContain('Server unreachable'));
    expect(statusText()).toContain('Could not reach the server');
  });
});
