import { render } from '@testing-library/react-native';
import { SWRConfig } from 'swr';

import HomeScreen from '../../app/index';
import { getByTestId, queryAllByText, textOf } from '../src/helpers/web-queries';

beforeEach(() => {
  global.fetch = jest.fn(() => new Promise<Response>(() => {})) as unknown as typeof fetch;
});

function renderHome() {
  return render(
    <SWRConfig value={{ provider: () => new Map() }}>
      <HomeScreen />
    </SWRConfig>,
  );
}

describe('Home screen', () => {
  it('heads the page with the product name in the title face', () => {
    renderHome();
    const title = getByTestId('home-title');
    expect(textOf(title)).toBe('Sagwright');
    expect(title.props.role).toBe('heading');
    expect(title.props.style.fontFamily).toMatch(/^"Figtree SemiBold"/);
  });

  it('says in one sentence what the product does', () => {
    renderHome();
    expect(queryAllByText(/^Sagwright measures .*sag.*spring rate.*preload.*\.$/)).toHaveLength(1);
  });

  it('shows the safety notice and the server status', () => {
    renderHome();
    expect(textOf(getByTestId('safety-notice'))).toContain('spring compressors');
    expect(textOf(getByTestId('server-status'))).toContain('Checking the server');
    expect(global.fetch).toHaveBeenCalledWith('/api/health', expect.anything());
  });
});
