import { fireEvent, screen } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond } from '../src/helpers/fake-fetch';
import { quoteView } from '../src/components/quotes/fixtures';
import { renderApp } from './render-app';

const { fetchMock } = installFakeFetch();

beforeEach(() => setAuthToken(null));

describe('The quote’s print view', () => {
  it('opens from the quote editor and shows the quote on its own page', async () => {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('desk'))),
        'GET /api/quotes/7': respond(200, { quote: quoteView({ status: 'sent' }) }),
      }),
    );
    const app = renderApp('/desk/quotes/7');
    fireEvent.press(await screen.findByText('Print view'));
    expect(await screen.findByTestId('quote-print')).toBeOnTheScreen();
    expect(app.getPathname()).toBe('/desk/quotes/7/print');
    expect(screen.getByTestId('print-number')).toHaveTextContent('Quote Q-0007, version 1');
    expect(screen.getByTestId('total-total')).toHaveTextContent('€149.37');
  });
});
