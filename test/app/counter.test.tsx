import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';
import type { SpringDetail, SpringPage } from '@shared/types/catalogue';

import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond, requestsOf, type Answers } from '../src/helpers/fake-fetch';
import { renderApp } from './render-app';

let mockIsWide = true;
jest.mock('@/theme/use-layout', () => ({
  useLayout: () => ({ width: mockIsWide ? 1280 : 390, isWide: mockIsWide }),
}));

const { fetchMock } = installFakeFetch();

const FIRST_PAGE = 'GET /api/catalogue/springs?unit=kgf%2Fmm&sort=sku&order=asc&page=1&pageSize=25';
const RANGE_PAGE = 'GET /api/catalogue/springs?rateMin=0.9&rateMax=1&unit=kgf%2Fmm&sort=sku&order=asc&page=1&pageSize=25';

const spring: SpringDetail = {
  id: 7,
  sku: 'KF37-0090',
  kind: 'fork',
  family: 'F37x320',
  rateNmm: 9,
  secondRateNmm: null,
  breakMm: null,
  rateInUnit: 0.917,
  secondRateInUnit: null,
  freeLengthMm: 320,
  innerDiameterMm: null,
  outerDiameterMm: 37,
  wireDiameterMm: 4.6,
  maxDeflectionMm: 190,
  priceCents: 8900,
  available: 1,
  active: true,
  onHand: 1,
  reserved: 0,
  reorderPoint: 2,
  belowReorderPoint: true,
  costCents: 4600,
  supplier: 'Tarnwell Coilworks',
  supplierCode: 'TW-37-0090',
  bin: 'FA-08',
};

const page = (springs: SpringDetail[]): SpringPage => ({ springs, total: springs.length, page: 1, pageSize: 25, unit: 'kgf/mm' });

function serve(answers: Answers = {}) {
  fetchMock.mockImplementation(
    answerBy({
      'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('counter'))),
      'GET /api/me/units': respond(200, { units: { system: 'metric', rateUnit: 'kgf/mm', length: 'mm', mass: 'kg', force: 'N' } }),
      'GET /api/catalogue/families': respond(200, { families: [{ kind: 'fork', family: 'F37x320', springs: 12, available: 20 }] }),
      [FIRST_PAGE]: respond(200, page([spring])),
      ...answers,
    }),
  );
}

beforeEach(() => setAuthToken(null));
afterEach(() => {
  mockIsWide = true;
});

describe('Spring catalogue screen', () => {
  it('shows the springs as a table on a wide window, rates in the person’s unit and prices from cents', async () => {
    serve();
    renderApp('/counter');
    const row = await screen.findByTestId('spring-row-KF37-0090');
    expect(row).toHaveTextContent(/KF37-0090.*fork · F37x320.*0\.92 kgf\/mm.*FA-08.*€89\.00/);
    expect(screen.getByText('Page 1 of 1 · 1 spring')).toBeOnTheScreen();
  });

  it('shows cards on a phone, marking a spring below its reorder point', async () => {
    mockIsWide = false;
    serve();
    renderApp('/counter');
    expect(await screen.findByTestId('spring-card-KF37-0090')).toHaveTextContent(/Below its reorder point of 2/);
    expect(screen.queryByTestId('spring-row-KF37-0090')).toBeNull();
  });

  it('asks for the rate range in the person’s unit', async () => {
    serve({ [RANGE_PAGE]: respond(200, page([])) });
    renderApp('/counter');
    await screen.findByTestId('spring-row-KF37-0090');
    fireEvent.changeText(screen.getByLabelText('Lowest rate, kgf/mm'), '0,9');
    fireEvent.changeText(screen.getByLabelText('Highest rate, kgf/mm'), '1');
    fireEvent.press(screen.getByRole('button', { name: 'Search' }));
    expect(await screen.findByText('No spring matches these filters.')).toBeOnTheScreen();
    await waitFor(() => expect(requestsOf(fetchMock)).toContain(RANGE_PAGE));
  });
});
