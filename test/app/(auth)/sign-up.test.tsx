import { fireEvent, screen } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import { accountUser, sessionAnswer } from '../../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, respondError } from '../../src/helpers/fake-fetch';
import { renderApp } from '../render-app';

const { fetchMock } = installFakeFetch();

const NO_SESSION = respondError(401, 'session-expired', 'Your session has ended; sign in again.');

async function fillSignUp() {
  renderApp('/sign-up');
  await screen.findByRole('header', { name: 'Create an account' });
  fireEvent.changeText(screen.getByLabelText('Name'), 'Tess Varga');
  fireEvent.changeText(screen.getByLabelText('E-mail'), 'rider@demo.test');
  fireEvent.changeText(screen.getByLabelText('Password'), 'gravel road at dawn');
  fireEvent.press(screen.getByRole('button', { name: 'Create account' }));
}

beforeEach(() => setAuthToken(null));

describe('Sign-up screen', () => {
  afterEach(() => jest.useRealTimers());

  it('asks for a long enough password before asking the server', async () => {
    fetchMock.mockImplementation(answerBy({ 'POST /api/auth/refresh': NO_SESSION }));
    renderApp('/sign-up');
    await screen.findByRole('header', { name: 'Create an account' });
    fireEvent.changeText(screen.getByLabelText('Password'), 'short');
    fireEvent(screen.getByLabelText('Password'), 'blur');
    expect(await screen.findByText(/^Use at least 10 characters/)).toBeOnTheScreen();
  });

  it('shows a taken e-mail under the e-mail field', async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': NO_SESSION,
        'POST /api/auth/sign-up': respondError(409, 'email-taken', 'An account with this e-mail already exists.', {
          email: 'An account with this e-mail already exists.',
        }),
      }),
    );
    await fillSignUp();
    expect(await screen.findByText('An account with this e-mail already exists.')).toBeOnTheScreen();
    expect(screen.queryByTestId('form-error')).toBeNull();
  });

  it("lands the new rider in the garage", async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': NO_SESSION,
        'POST /api/auth/sign-up': respond(201, sessionAnswer(accountUser('rider', { name: 'Tess Varga' }))),
      }),
    );
    await fillSignUp();
    expect(await screen.findByRole('header', { name: 'Garage' })).toBeOnTheScreen();
  });
});
