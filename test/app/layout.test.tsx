import { renderRouter, screen } from 'expo-router/testing-library';

import NotFoundScreen from '../../app/+not-found';
import RootLayout from '../../app/_layout';
import HomeScreen from '../../app/index';
import { useFakeFetch } from '../src/helpers/fake-fetch';
import { TestSWR } from '../src/helpers/swr';

let mockFontsLoaded = true;
jest.mock('expo-font', () => ({
  useFonts: () => [mockFontsLoaded, null],
}));

const { fetchMock, unanswered } = useFakeFetch();

beforeEach(() => {
  fetchMock.mockImplementation(unanswered);
});

function renderApp(initialUrl: string) {
  return renderRouter(
    {
      _layout: () => (
        <TestSWR>
          <RootLayout />
        </TestSWR>
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
    expect(screen.getByTestId('app-navigation')).toHaveTextContent('Home');
    expect(screen.getByRole('header', { name: 'Sagwright' })).toBeOnTheScreen();
  });

  it('shows nothing but the background until the fonts are ready', () => {
    mockFontsLoaded = false;
    renderApp('/');
    expect(screen.queryByTestId('app-navigation')).toBeNull();
    expect(screen.root).toHaveTextContent('');
  });

  it('answers an unknown address with the not-found screen and a way home', () => {
    renderApp('/no/such/page');
    expect(screen.getByRole('header', { name: 'Page not found' })).toBeOnTheScreen();
    expect(screen.getByRole('link', { name: 'Back to home' })).toHaveProp('href', '/');
  });
});
