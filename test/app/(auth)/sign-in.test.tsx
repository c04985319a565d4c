import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import { accountUser, sessionAnswer } from '../../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError, requestsOf, type Answers } from '../../src/helpers/fake-fetch';
import { renderApp } from '../render-app';

const { fetchMock } = installFakeFetch();

/** No cookie to restore a session from, plus whatever the test adds. */
function serve(answers: Answers = {}) {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respondError(401, 'session-expired', 'Your session has ended; sign in again.'),
      ...answers,
    }),
  );
}

async function openSignIn(url = '/sign-in') {
  renderApp(url);
  await screen.findByRole('header', { name: 'Sign in' });
}

const email = () => screen.getByLabelText('E-mail');
const password = () => screen.getByLabelText('Password');
const submit = () => fireEvent.press(screen.getByRole('button', { name: 'Sign in' }));

beforeEach(() => setAuthToken(null));

describe('Sign-in screen', () => {
  // Before RNTL's cleanup, which needs the real timers renderRouter replaced.
  afterEach(() => jest.useRealTimers());

  it('asks for both fields when sent empty, without asking the server', async () => {
    serve();
    await openSignIn();
    submit();
    expect(await screen.findByText('Enter your e-mail address.')).toBeOnTheScreen();
    expect(screen.getByText('Enter your password.')).toBeOnTheScreen();
    expect(requestsOf(fetchMock)).toEqual(['POST /api/auth/refresh']);
  });

  it('says how an e-mail address looks once the field is left', async () => {
    serve();
    await openSignIn();
    fireEvent.changeText(email(), 'rider-at-demo');
    fireEvent(email(), 'blur');
    expect(await screen.findByText('Enter an e-mail address like name@example.com.')).toBeOnTheScreen();
    expect(screen.queryByText('Enter your password.')).toBeNull();
  });

  it("puts the server's field messages under their fields", async () => {
    serve({
      'POST /api/auth/sign-in': respondError(400, 'invalid', 'Some fields need attention.', {
        password: 'A password has at most 200 characters.',
      }),
    });
    await openSignIn();
    fireEvent.changeText(email(), 'rider@demo.test');
    fireEvent.changeText(password(), 'long enough for the client');
    submit();
    expect(await screen.findByText('A password has at most 200 characters.')).toBeOnTheScreen();
    expect(screen.queryByTestId('form-error')).toBeNull();
  });

  it.each([
    [401, 'bad-credentials', 'The e-mail or password is wrong.'],
    [403, 'account-inactive', 'This account has been switched off; ask the shop.'],
    [429, 'rate-limited', 'Too many attempts; wait a few minutes and try again.'],
  ])("shows the server's message for a %i", async (status, code, message) => {
    serve({ 'POST /api/auth/sign-in': respondError(status, code, message) });
    await openSignIn();
    fireEvent.changeText(email(), 'rider@demo.test');
    fireEvent.changeText(password(), 'not the password');
    // Enter in a field submits the form.
    fireEvent(password(), 'submitEditing');
    expect(await screen.findByTestId('form-error')).toHaveTextContent(message);
  });

  it('sends the cast values and goes on to the address it was asked for', async () => {
    const admin = accountUser('admin');
    serve({
      'POST /api/auth/sign-in': respond(200, sessionAnswer(admin)),
      'GET /api/users?q=&page=1&pageSize=20': respond(200, { users: [admin], total: 1, page: 1, pageSize: 20 }),
    });
    await openSignIn('/sign-in?next=%2Fadmin%2Fusers');
    expect(screen.getByText(/That page needs an account/)).toBeOnTheScreen();
    fireEvent.changeText(email(), '  Admin@Demo.test ');
    fireEvent.changeText(password(), 'sagwright-demo');
    submit();

    expect(await screen.findByRole('header', { name: 'Users' })).toBeOnTheScreen();
    const signIn = fetchMock.mock.calls.find(([url]) => url === '/api/auth/sign-in')!;
    expect(JSON.parse(signIn[1].body as string)).toEqual({ email: 'admin@demo.test', password: 'sagwright-demo' });
    await waitFor(() => expect(screen.getByTestId('app-account')).toHaveTextContent(/Ada Brennick/));
  });
});
