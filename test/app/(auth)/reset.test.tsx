import { fireEvent, screen } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import { answerBy, installFakeFetch, respond, respondError } from '../../src/helpers/fake-fetch';
import { renderApp } from '../render-app';

const { fetchMock } = installFakeFetch();

const NO_SESSION = respondError(401, 'session-expired', 'Your session has ended; sign in again.');
const BAD_LINK = 'This reset link has expired or was already used; ask for a new one.';

beforeEach(() => setAuthToken(null));

describe('Reset screen', () => {
  afterEach(() => jest.useRealTimers());

  it("asks for a link and shows the server's answer", async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': NO_SESSION,
        'POST /api/auth/reset-request': respond(202, {
          message: 'If an account uses this e-mail, a reset link is on its way.',
        }),
      }),
    );
    renderApp('/reset');
    await screen.findByRole('header', { name: 'Reset your password' });
    fireEvent.changeText(screen.getByLabelText('E-mail'), 'rider@demo.test');
    fireEvent(screen.getByLabelText('E-mail'), 'submitEditing');
    expect(await screen.findByText('If an account uses this e-mail, a reset link is on its way.')).toBeOnTheScreen();
  });

  it('sets the new password with the token of the link', async () => {
    fetchMock.mockImplementation(
      answerBy({ 'POST /api/auth/refresh': NO_SESSION, 'POST /api/auth/reset': respond(204) }),
    );
    renderApp('/reset?token=abc123');
    await screen.findByRole('header', { name: 'Choose a new password' });
    fireEvent.changeText(screen.getByLabelText('New password'), 'switchbacks in the rain');
    fireEvent.press(screen.getByRole('button', { name: 'Set the new password' }));
    expect(await screen.findByText(/Your password is changed/)).toBeOnTheScreen();
    const reset = fetchMock.mock.calls.find(([url]) => url === '/api/auth/reset')!;
    expect(JSON.parse(reset[1].body as string)).toEqual({ token: 'abc123', password: 'switchbacks in the rain' });
  });

  it("shows a refused link's message, which belongs to no field on the form, in the banner", async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': NO_SESSION,
        'POST /api/auth/reset': respondError(400, 'invalid', BAD_LINK, { token: BAD_LINK }),
      }),
    );
    renderApp('/reset?token=used');
    await screen.findByRole('header', { name: 'Choose a new password' });
    fireEvent.changeText(screen.getByLabelText('New password'), 'switchbacks in the rain');
    fireEvent.press(screen.getByRole('button', { name: 'Set the new password' }));
    expect(await screen.findByTestId('form-error')).toHaveTextContent(BAD_LINK);
    expect(screen.getByRole('link', { name: 'Ask for a new link' })).toBeOnTheScreen();
  });
});
