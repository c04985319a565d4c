import { screen, within } from 'expo-router/testing-library';

import { fontFaces } from '@/theme';

import { answerBy, installFakeFetch, respondError } from '../src/helpers/fake-fetch';
import { renderApp } from './render-app';

const { fetchMock, unanswered } = installFakeFetch();

beforeEach(() => {
  fetchMock.mockImplementation((url, init) =>
    url === '/api/health'
      ? unanswered()
      : answerBy({ 'POST /api/auth/refresh': respondError(401, 'session-expired', 'No session.') })(url, init),
  );
});

async function renderHome() {
  renderApp('/');
  return screen.findByTestId('home-title');
}

describe('Home screen', () => {
  afterEach(() => jest.useRealTimers());

  it('heads the page with the product name in the title face', async () => {
    const title = await renderHome();
    expect(title).toHaveTextContent('Sagwright');
    expect(title).toHaveStyle({ fontFamily: fontFaces.sansSemiBold });
    expect(screen.getByRole('header', { name: 'Sagwright' })).toBe(title);
  });

  it('says in one sentence what the product does', async () => {
    await renderHome();
    expect(screen.getAllByText(/^Sagwright measures .*sag.*spring rate.*preload.*\.$/)).toHaveLength(1);
  });

  it('shows the safety notice and the server status', async () => {
    await renderHome();
    expect(within(screen.getByTestId('safety-notice')).getByText(/spring compressors/)).toBeOnTheScreen();
    expect(within(screen.getByTestId('server-status')).getByText(/Checking the server/)).toBeOnTheScreen();
    expect(fetchMock).toHaveBeenCalledWith('/api/health', expect.anything());
  });
});
