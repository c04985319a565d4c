import { fireEvent, screen } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';

import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond } from '../src/helpers/fake-fetch';
import { quoteView } from '../src/components/quotes/fixtures';
import { BIKE_ID, bike, clicks, KINDS, turns } from '../src/components/test-ride/fixtures';
import { planToBaseline, planToStandard } from '@shared/damping';
import type { DamperPlans } from '@shared/types/test-ride';
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

  it('adds the fitting’s damper steps: the maker’s standard first, then back to the rider’s baseline', async () => {
    // Invented bike: shock rebound at 14 of 24 clicks (standard 12), fork rebound at its standard.
    const current = bike([clicks('rebound', 14, 24, 12)], [turns('rebound', 1.5, 3, 1.5)]);
    // An empty log: the settings now are the baseline, so the server's baseline plan has no step.
    const plans: DamperPlans = {
      front: { standard: planToStandard('front', current.front!.dampers), baseline: planToBaseline('front', current.front!.dampers, { rebound: 1.5 }) },
      rear: { standard: planToStandard('rear', current.rear!.dampers), baseline: planToBaseline('rear', current.rear!.dampers, { rebound: 14 }) },
      baselineText: 'The setup log is empty, so the settings now are the baseline.',
    };
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('desk'))),
        'GET /api/quotes/7': respond(200, { quote: quoteView({ status: 'booked', bikeId: BIKE_ID }) }),
        [`GET /api/bikes/${BIKE_ID}`]: respond(200, { bike: current }),
        [`GET /api/bikes/${BIKE_ID}/damper-plans`]: respond(200, plans),
        [`GET /api/bikes/${BIKE_ID}/setup-log`]: respond(200, { entries: [], baseline: null, current: {} }),
        'GET /api/damper-kinds': respond(200, { kinds: KINDS }),
      }),
    );
    renderApp('/desk/quotes/7/print');
    expect(await screen.findByTestId('fitting-dampers')).toHaveTextContent(/Dampers at fitting/);
    expect(screen.getByTestId('fitting-rear-standard-step-0')).toHaveTextContent('Rear rebound: turn in (clockwise) until it stops, then out 12 clicks.');
    expect(screen.getByTestId('fitting-rear-baseline-step-0')).toHaveTextContent('Rear rebound: turn in (clockwise) until it stops, then out 14 clicks.');
    expect(screen.getByTestId('fitting-front-standard-already')).toHaveTextContent('Nothing to turn; already there: Front rebound at 1.5 turns out.');
    expect(screen.getByTestId('fitting-front-baseline-already')).toHaveTextContent('Nothing to turn; already there: Front rebound at 1.5 turns out.');
    expect(screen.getByTestId('fitting-dampers-caution')).toHaveTextContent(/Follow the maker’s manual/);
  });
});
