import { render, screen, within } from '@testing-library/react-native';

import { fontFaces } from '@/theme';

import HomeScreen from '../../app/index';
import { useFakeFetch } from '../src/helpers/fake-fetch';
import { TestSWR } from '../src/helpers/swr';

const { fetchMock, unanswered } = useFakeFetch();

beforeEach(() => {
  fetchMock.mockImplementation(unanswered);
});

function renderHome() {
  return render(
    <TestSWR>
      <HomeScreen />
    </TestSWR>,
  );
}

describe('Home screen', () => {
  it('heads the page with the product name in the title face', () => {
    renderHome();
    expect(screen.getByRole('header', { name: 'Sagwright' })).toHaveStyle({
      fontFamily: fontFaces.sansSemiBold,
    });
  });

  it('says in one sentence what the product does', () => {
    renderHome();
    expect(screen.getAllByText(/^Sagwright measures .*sag.*spring rate.*preload.*\.$/)).toHaveLength(1);
  });

  it('shows the safety notice and the server status', () => {
    renderHome();
    expect(within(screen.getByTestId('safety-notice')).getByText(/spring compressors/)).toBeOnTheScreen();
    expect(within(screen.getByTestId('server-status')).getByText(/Checking the server/)).toBeOnTheScreen();
    expect(fetchMock).toHaveBeenCalledWith('/api/health', expect.anything());
  });
});
