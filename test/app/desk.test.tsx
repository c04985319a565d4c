import { fireEvent, screen, within } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';
import type { QuoteSummary } from '@shared/types/quote';

import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond } from '../src/helpers/fake-fetch';
import { quoteSummary, quoteView } from '../src/components/quotes/fixtures';
import { renderApp } from './render-app';

let mockIsWide = true;
jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: mockIsWide ? 1280 : 390, isWide: mockIsWide }),
}));

const { fetchMock } = installFakeFetch();

const QUOTES: QuoteSummary[] = [
  quoteSummary({ id: 1, number: 'Q-0001', status: 'draft' }),
  quoteSummary({ id: 2, number: 'Q-0002', status: 'sent' }),
  quoteSummary({ id: 3, number: 'Q-0003', status: 'sent' }),
  quoteSummary({ id: 4, number: 'Q-0004', status: 'booked', fittingAt: '2026-12-10T09:00:00.000Z' }),
];

function serve() {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('desk'))),
      'GET /api/quotes?page=1&pageSize=100': respond(200, { quotes: QUOTES, total: 4, page: 1, pageSize: 100 }),
    }),
  );
}

beforeEach(() => setAuthToken(null));
afterEach(() => {
  mockIsWide = true;
});

describe('The desk’s quote board', () => {
  it('groups the quotes by status in columns on a wide screen', async () => {
    serve();
    renderApp('/desk');
    await screen.findByTestId('quote-card-Q-0001');
    const sent = within(screen.getByTestId('board-column-sent'));
    expect(sent.getByText('Sent (2)')).toBeOnTheScreen();
    expect(sent.getByTestId('quote-card-Q-0002')).toBeOnTheScreen();
    expect(sent.getByTestId('quote-card-Q-0003')).toBeOnTheScreen();
    expect(within(screen.getByTestId('board-column-draft')).getByTestId('quote-card-Q-0001')).toBeOnTheScreen();
    expect(within(screen.getByTestId('board-column-booked')).getByTestId('quote-card-Q-0004')).toBeOnTheScreen();
    expect(within(screen.getByTestId('board-column-accepted')).getByText('Accepted (0)')).toBeOnTheScreen();
  });

  it('shows one status at a time on a phone, chosen with the filter', async () => {
    mockIsWide = false;
    serve();
    renderApp('/desk');
    await screen.findByTestId('quote-card-Q-0001');
    expect(screen.queryByTestId('quote-card-Q-0002')).toBeNull();
    fireEvent.press(screen.getByRole('radio', { name: 'Sent (2)' }));
    expect(screen.getByTestId('quote-card-Q-0002')).toBeOnTheScreen();
    expect(screen.getByTestId('quote-card-Q-0003')).toBeOnTheScreen();
    expect(screen.queryByTestId('quote-card-Q-0001')).toBeNull();
  });
});

describe('The customer’s quote page', () => {
  const TOKEN = 'tok123';
  function serveQuote(status: 'sent' | 'accepted' | 'declined') {
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': respond(401, { error: { code: 'no-session', message: 'No session.' } }),
        [`GET /api/customer-quotes/${TOKEN}`]: respond(200, { quote: quoteView({ status }) }),
        [`POST /api/customer-quotes/${TOKEN}/accept`]: respond(200, { quote: quoteView({ status: 'accepted' }) }),
      }),
    );
  }

  it('opens without a session and offers accept or decline while the quote is open', async () => {
    serveQuote('sent');
    renderApp(`/q/${TOKEN}`);
    expect(await screen.findByText('Quote Q-0007')).toBeOnTheScreen();
    expect(screen.getByText('1 Workshop Lane')).toBeOnTheScreen();
    expect(screen.getByTestId('total-total')).toHaveTextContent('€149.37');
    expect(screen.getByText(/loaded spring stores dangerous energy/)).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Decline' })).toBeOnTheScreen();

    fireEvent.press(screen.getByRole('button', { name: 'Accept the quote' }));
    expect(await screen.findByText('Pay the deposit by card')).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: 'Accept the quote' })).toBeNull();
  });

  it.each(['accepted', 'declined'] as const)('offers no answer once the quote is %s', async (status) => {
    serveQuote(status);
    renderApp(`/q/${TOKEN}`);
    await screen.findByText('Quote Q-0007');
    expect(screen.queryByRole('button', { name: 'Accept the quote' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Decline' })).toBeNull();
  });
});
