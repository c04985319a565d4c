import { fireEvent, screen, waitFor } from 'expo-router/testing-library';

import { setAuthToken } from '@/api/client';
import type { BikeModel } from '@shared/types/bike';
import type { GarageBike, SizingRecordSummary } from '@shared/types/garage';

import { accountUser, sessionAnswer } from '../src/helpers/accounts';
import { answerBy, installFakeFetch, respond } from '../src/helpers/fake-fetch';
import { renderApp } from './render-app';

const { fetchMock } = installFakeFetch();

// Only the fields these screens read; the rest of each answer does not matter here.
const MODEL = { id: 4, name: 'Shop model 650' } as BikeModel;
const BIKE = { id: 5, nickname: 'Red one', model: { id: 4, name: 'Shop model 650' } } as GarageBike;
const RECORD = { id: 12, profileLabel: 'Road', createdAt: '2026-12-01T08:00:00.000Z', front: null, rear: null } as SizingRecordSummary;

beforeEach(() => setAuthToken(null));

describe('A walk-in at the desk', () => {
  it('adds the customer, their bike from a shop model and a sizing record from the weights', async () => {
    let bikes: GarageBike[] = [];
    let records: SizingRecordSummary[] = [];
    const posted: Record<string, unknown> = {};
    const keep = (request: string, status: number, body: unknown, after?: () => void) => (init: RequestInit) => {
      posted[request] = JSON.parse(String(init.body));
      after?.();
      return respond(status, body);
    };
    fetchMock.mockImplementation(
      answerBy({
        'POST /api/auth/refresh': respond(200, sessionAnswer(accountUser('desk'))),
        'GET /api/customers?q=&page=1&pageSize=20': respond(200, { customers: [], total: 0, page: 1, pageSize: 20 }),
        'POST /api/customers': keep('customer', 201, { customer: { id: 9, name: 'Ada Walker', email: 'ada@example.test', bikes: 0, createdAt: '2026-12-01T08:00:00.000Z' } }),
        'GET /api/bikes?riderId=9': () => respond(200, { bikes }),
        'GET /api/bike-models': respond(200, { models: [MODEL] }),
        'GET /api/weigh-in?riderId=9': respond(200, { weighIn: null, weighedAt: null, totals: null }),
        'GET /api/target-profiles': respond(200, { profiles: [] }),
        'POST /api/bikes': keep('bike', 201, { bike: BIKE }, () => (bikes = [BIKE])),
        'GET /api/bikes/5/sizing-records': () => respond(200, { records }),
        'POST /api/bikes/5/sizing-records': keep('record', 201, { record: RECORD }, () => (records = [RECORD])),
      }),
    );
    renderApp('/desk/customers');
    fireEvent.press(await screen.findByRole('button', { name: 'New walk-in customer' }));
    fireEvent.press(screen.getByRole('button', { name: 'Add the customer' }));
    expect(await screen.findByText('Give the rider a name.')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('Customer name'), 'Ada Walker');
    fireEvent.changeText(screen.getByLabelText('Customer e-mail'), 'ada@example.test');
    fireEvent.press(screen.getByRole('button', { name: 'Add the customer' }));

    expect(await screen.findByText('No bikes yet.')).toBeOnTheScreen();
    expect(posted.customer).toEqual({ name: 'Ada Walker', email: 'ada@example.test' });
    fireEvent.press(await screen.findByRole('radio', { name: 'Shop model 650' }));
    fireEvent.changeText(screen.getByLabelText('Bike name'), 'Red one');
    fireEvent.press(screen.getByRole('button', { name: 'Add the bike' }));

    fireEvent.press(await screen.findByTestId('size-from-weights-5'));
    expect(await screen.findByTestId('sizing-record-12')).toBeOnTheScreen();
    expect(posted.bike).toEqual({ riderId: 9, modelId: 4, nickname: 'Red one' });
    expect(posted.record).toEqual({ ends: ['front', 'rear'] });
    await waitFor(() => expect(screen.getByRole('button', { name: 'Make a quote' })).toBeEnabled());
  });
});
