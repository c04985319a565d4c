import { renderRouter } from 'expo-router/testing-library';
import { SWRConfig } from 'swr';

import NotFoundScreen from '../../app/+not-found';
import RootLayout from '../../app/_layout';
import HomeScreen from '../../app/index';
import { closest, getAllByRole, getByText, textOf } from '../src/helpers/web-queries';

let mockFontsLoaded = true;
jest.mock('expo-font', () => ({
  useFonts: () => [mockFontsLoaded, null],
}));

beforeEach(() => {
  global.fetch = jest.fn(() => new Promise<Response>(() => {})) as unknown as typeof fetch;
});

function renderApp(initialUrl: string) {
  return renderRouter(
    {
      _layout: () => (
        <SWRConfig value={{ provider: () => new Map() }}>
          <RootLayout />
        </SWRConfig>
      ),
      index: HomeScreen,
      '+not-found': NotFoundScreen,
    },
    { initialUrl },
  );
}

describe('Root layout', () => {
  // Inside the describe so it runs before RNTL's cleanup: renderRouter switches to fake
  // timers, and that cleanup needs real ones to finish.
  afterEach(() => {
    jest.useRealTimers();
    mockFontsLoaded = true;
  });

  it('frames the home screen with navigation', () => {
    renderApp('/');
    const [nav] = getAllByRole('navigation');
    expect(textOf(nav)).toBe('Home');
    expect(getAllByRole('heading').map(textOf)).toContain('Sagwright');
  });

  it('shows nothing but the background until the fonts are ready', () => {
    mockFontsLoaded = false;
    const { UNSAFE_root } = renderApp('/');
    expect(getAllByRole('navigation')).toHaveLength(0);
    expect(textOf(UNSAFE_root)).toBe('');
  });

  it('answers an unknown address with the not-found screen and a way home', () => {
    renderApp('/no/such/page');
    expect(getAllByRole('heading').map(textOf)).toContain('Page not found');
    expect(closest(getByText('Back to home'), 'a')?.props.href).toBe('/');
  });
});
