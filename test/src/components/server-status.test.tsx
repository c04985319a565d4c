import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';

import { ServerStatus } from '@/components/server-status';
import { fontFaces } from '@/theme';

import { respond, installFakeFetch } from '../helpers/fake-fetch';
import { TestSWR } from '../helpers/swr';

const { fetchMock, unanswered } = installFakeFetch();

function renderStatus() {
  return render(
    <TestSWR>
      <ServerStatus />
    </TestSWR>,
  );
}

const status = () => screen.getByTestId('server-status');

describe('ServerStatus', () => {
  it('says it is checking while the answer is on its way', () => {
    fetchMock.mockImplementation(unanswered);
    renderStatus();
    expect(status()).toHaveTextContent(/Checking the server/);
    expect(fetchMock.mock.calls[0][0]).toBe('/api/health');
  });

  it('shows the version and database state of a healthy server', async () => {
    fetchMock.mockResolvedValue(
      respond(200, { ok: true, version: '0.1.0', database: { ok: true, sqlite: '3.52.0' } }),
    );
    renderStatus();
    expect(await screen.findByText('Server up')).toBeOnTheScreen();
    expect(screen.getByText('0.1.0')).toHaveStyle({ fontFamily: fontFaces.mono });
    expect(screen.getByText('SQLite 3.52.0')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Try again' })).toBeNull();
  });

  it('shows a warning when the server answers but reports a problem', async () => {
    fetchMock.mockResolvedValue(respond(200, { ok: false, version: '0.1.0', database: { ok: false } }));
    renderStatus();
    expect(await screen.findByText('Server up, reporting a problem')).toBeOnTheScreen();
    expect(screen.getByText('not answering')).toBeOnTheScreen();
  });

  it("shows the server's own message for an error answer and checks again on request", async () => {
    fetchMock.mockResolvedValueOnce(
      respond(503, { error: { code: 'database_unavailable', message: 'The database is not answering.' } }),
    );
    renderStatus();
    expect(await screen.findByText('Server check failed')).toBeOnTheScreen();
    expect(screen.getByText('The database is not answering.')).toBeOnTheScreen();

    fetchMock.mockResolvedValueOnce(
      respond(200, { ok: true, version: '0.1.1', database: { ok: true, sqlite: '3.52.0' } }),
    );
    fireEvent.press(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('Server up')).toBeOnTheScreen();
    expect(screen.getByText('0.1.1')).toBeOnTheScreen();
    expect(fetchMock).toHaveBeenCalledTimes(2);
  });

  it('tells an unreachable server apart from a failing one', async () => {
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    renderStatus();
    expect(await screen.findByText('Server unreachable')).toBeOnTheScreen();
    await waitFor(() => expect(status()).toHaveTextContent(/Could not reach the server/));
  });
});
