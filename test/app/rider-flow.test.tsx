/**
 * The rider's screens under the real router: the garage with its bikes, and a measuring step
 * that checks its readings as they are typed (decimal comma, order of lengths, range).
 */
import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';
import { toDisplayUnits } from '@shared/garage/units';

import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, type Answers } from '../src/helpers/fake-fetch';
import { renderApp } from './render-app';

const { fetchMock } = installFakeFetch();

const REAR = {
  wheelTravelMm: 135,
  shockStrokeMm: 50,
  gasForceN: null,
  linkage: null,
  rateNmm: 95,
  secondRateNmm: null,
  breakMm: null,
  preloadMm: 10,
  family: 'shock',
  adjuster: { kind: 'stepped', mmPerUnit: 2.5, position: 2, maxPosition: 6, zeroReference: '', addsPreload: 'clockwise' },
  dampers: [],
};

const BIKE = {
  id: 7,
  ownerId: 1,
  nickname: 'Blue one',
  model: { id: 1, name: 'Tarn 690 Roadster' },
  masses: { massKg: 190, frontShare: 0.5, unsprungFrontKg: 18, unsprungRearKg: 22 },
  front: null,
  rear: REAR,
  createdAt: '2026-11-30T10:00:00.000Z',
  updatedAt: '2026-11-30T10:00:00.000Z',
  draft: { step: 'rear-static', updatedAt: '2026-12-01T10:00:00.000Z' },
  lastSizing: null,
};

const DRAFT = {
  bikeId: 7,
  step: 'rear-static',
  answers: { weighInConfirmed: true, ends: ['rear'], rear: { extendedMm: 600 } },
  hints: null,
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
};

function serve(answers: Answers) {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('rider'))),
      'GET /api/me/units': respond(200, { units: toDisplayUnits({ system: 'metric', rateUnit: 'N/mm' }) }),
      'GET /api/weigh-in': respond(200, { weighIn: null, weighedAt: null, totals: null }),
      ...answers,
    }),
  );
}

beforeEach(() => setAuthToken(null));

describe('the garage', () => {
  it('lists each bike with a way to resume its open draft', async () => {
    serve({ 'GET /api/bikes': respond(200, { bikes: [BIKE] }) });
    renderApp('/rider');
    expect(await screen.findByText('Blue one')).toBeTruthy();
    expect(screen.getByText('Tarn 690 Roadster')).toBeTruthy();
    expect(screen.getByTestId('resume-7')).toBeTruthy();
    expect(screen.getByText('Not measured yet.')).toBeTruthy();
  });

  it('says so when there are no bikes yet', async () => {
    serve({ 'GET /api/bikes': respond(200, { bikes: [] }) });
    renderApp('/rider');
    expect(await screen.findByText('No bikes yet')).toBeTruthy();
  });
});

describe('a measuring step', () => {
  it('checks the static readings as they are typed', async () => {
    serve({
      'GET /api/bikes/7': respond(200, { bike: BIKE }),
      'GET /api/bikes/7/draft': respond(200, { draft: DRAFT }),
    });
    renderApp('/rider/measure/7/rear-static');
    expect(await screen.findByText('Rear on its wheels, no rider')).toBeTruthy();
    expect(screen.getByText('Step 4 of 6 · Rear: on its wheels')).toBeTruthy();

    fireEvent.changeText(screen.getByTestId('reading-pushed'), '610');
    expect(
      await screen.findByText(/The static length is longer than the extended length: re-measure both/),
    ).toBeTruthy();

    fireEvent.changeText(screen.getByTestId('reading-pushed'), '586,5');
    fireEvent.changeText(screen.getByTestId('reading-lifted'), '3000');
    expect(await screen.findByText(/after lifting must be above 0 and at most 2000 mm/)).toBeTruthy();

    fireEvent.changeText(screen.getByTestId('reading-lifted'), '592');
    await waitFor(() => expect(screen.queryByText(/at most 2000 mm/)).toBeNull());
    expect(screen.queryByText(/longer than the extended/)).toBeNull();
  });
});

describe('adding a bike by hand', () => {
  it('shows each value with its unit and help, and names what is missing', async () => {
    serve({ 'GET /api/bike-models': respond(200, { models: [] }) });
    renderApp('/rider/bikes/new');
    expect(await screen.findByText('The shop has no bike models yet')).toBeTruthy();
    fireEvent.press(screen.getByRole('radio', { name: 'By hand' }));
    expect(await screen.findByText('Bike wet mass (kg)')).toBeTruthy();
    expect(screen.getByText('Shock spring rate (N/mm)')).toBeTruthy();
    expect(screen.getAllByText(/Printed on the spring or stated in its paperwork/)).toHaveLength(2);
    fireEvent.press(screen.getByRole('button', { name: 'Add to garage' }));
    expect(await screen.findByText('Bike wet mass is missing.')).toBeTruthy();
  });
});
