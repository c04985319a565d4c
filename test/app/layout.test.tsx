import { fireEvent, renderRouter, screen, waitFor, within } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import RootLayout from '../../app/_layout';
import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError } from '../src/helpers/fake-fetch';
import { TestSWR } from '../src/helpers/swr';

let mockFontsLoaded = true;
jest.mock('expo-font', () => ({
  useFonts: () => [mockFontsLoaded, null],
}));

const { fetchMock, unanswered } = installFakeFetch();

// The first render loads every route module; on a busy machine that alone can pass Jest's 5 s.
jest.setTimeout(20_000);

const NO_SESSION = respondError(401, 'session-expired', 'Your session has ended; sign in again.');

/** The session the refresh cookie buys on start, if any; the health check stays on its way. */
function serve(session: ReturnType<typeof sessionAnswer> | null, answers: Parameters<typeof answerBy>[0] = {}) {
  fetchMock.mockImplementation((url, init) =>
    url === '/api/health'
      ? unanswered()
      : answerBy({ 'POST /api/auth/refresh': session ? respond(200, session) : NO_SESSION, ...answers })(url, init),
  );
}

function renderApp(initialUrl: string) {
  return renderRouter(
    {
      appDir: 'app',
      overrides: {
        _layout: () => (
          <TestSWR>
            <RootLayout />
          </TestSWR>
        ),
      },
    },
    { initialUrl },
  );
}

const navText = () => screen.getByTestId('app-navigation');
const navLabels = () =>
  within(navText())
    .getAllByRole('link')
    .map((link) => within(link).getByText(/.+/).props.children as string);

beforeEach(() => setAuthToken(null));

describe('Root layout', () => {
  // Inside the describe so it runs before RNTL's cleanup: renderRouter switches to fake
  // timers, and that cleanup needs real ones to finish.
  afterEach(() => {
    jest.useRealTimers();
    mockFontsLoaded = true;
  });

  it('shows nothing but the background until the fonts are ready', () => {
    mockFontsLoaded = false;
    serve(null);
    renderApp('/');
    expect(screen.queryByTestId('app-navigation')).toBeNull();
    expect(screen.root).toHaveTextContent('');
  });

  it('shows no destinations and no screen while the session is being restored', () => {
    fetchMock.mockImplementation(unanswered);
    renderApp('/rider');
    expect(screen.getByText('Restoring your session…')).toBeOnTheScreen();
    expect(within(navText()).queryAllByRole('link')).toHaveLength(0);
    expect(screen.queryByRole('header', { name: 'Garage' })).toBeNull();
  });

  it('frames the public home page with home and sign-in, and offers to sign in or up', async () => {
    serve(null);
    renderApp('/');
    expect(await screen.findByRole('header', { name: 'Sagwright' })).toBeOnTheScreen();
    expect(navLabels()).toEqual(['Home', 'Sign in']);
    const main = within(screen.getByTestId('app-main'));
    expect(main.getByRole('link', { name: 'Sign in' })).toHaveProp('href', '/sign-in');
    expect(main.getByRole('link', { name: 'Create an account' })).toHaveProp('href', '/sign-up');
    expect(screen.queryByTestId('app-account')).toBeNull();
  });

  it('answers an unknown address with the not-found screen and a way home', async () => {
    serve(null);
    renderApp('/no/such/page');
    expect(await screen.findByRole('header', { name: 'Page not found' })).toBeOnTheScreen();
    expect(screen.getByRole('link', { name: 'Back to home' })).toHaveProp('href', '/');
  });

  it('sends a signed-out visitor of a protected address to sign in, to come back afterwards', async () => {
    serve(null);
    const app = renderApp('/counter');
    expect(await screen.findByRole('header', { name: 'Sign in' })).toBeOnTheScreen();
    expect(app.getPathnameWithParams()).toBe('/sign-in?next=%2Fcounter');
  });

  it("restores a rider's session into the garage, with the rider's navigation and name", async () => {
    serve(sessionAnswer(accountUser('rider')));
    renderApp('/rider');
    expect(await screen.findByRole('header', { name: 'Garage' })).toBeOnTheScreen();
    expect(navLabels()).toEqual(['Garage']);
    expect(screen.getByTestId('app-account')).toHaveTextContent(/Mara Linden.*Sign out/);
  });

  it("sends a role to its own area from another role's address", async () => {
    serve(sessionAnswer(accountUser('desk')));
    const app = renderApp('/counter');
    expect(await screen.findByRole('header', { name: 'Quotes' })).toBeOnTheScreen();
    expect(app.getPathname()).toBe('/desk');
  });

  it('lets the admin into the desk and the counter', async () => {
    serve(sessionAnswer(accountUser('admin')));
    const app = renderApp('/counter');
    expect(await screen.findByRole('header', { name: 'Spring catalogue' })).toBeOnTheScreen();
    expect(app.getPathname()).toBe('/counter');
  });

  it('offers a signed-in person on the home page the way to their area', async () => {
    serve(sessionAnswer(accountUser('counter')));
    renderApp('/');
    expect(await screen.findByRole('link', { name: 'Go to your area' })).toHaveProp('href', '/counter');
  });

  it('signs out from the frame and leaves the protected screen for sign-in', async () => {
    serve(sessionAnswer(accountUser('rider')), { 'POST /api/auth/sign-out': respond(204) });
    const app = renderApp('/rider');
    await screen.findByRole('header', { name: 'Garage' });
    fireEvent.press(screen.getByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('header', { name: 'Sign in' })).toBeOnTheScreen();
    expect(app.getPathnameWithParams()).toBe('/sign-in?next=%2Frider');
    await waitFor(() => expect(navLabels()).toEqual(['Home', 'Sign in']));
  });
});
