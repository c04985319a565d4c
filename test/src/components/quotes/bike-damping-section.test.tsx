/**
 * A bike's damping on the desk's customer page: closed, each adjuster's setting beside the maker's
 * standard and the latest rides newest first with the server's status; open, the test-ride loop
 * and the setup log newest first. The bike and rides are the test-ride fixtures (invented figures);
 * the log's notes are invented.
 */
import { fireEvent, render, screen, within } from '@testing-library/react-native';

import { BikeDampingSection } from '@/components/quotes/bike-damping-section';
import type { SetupLog, SetupLogEntry } from '@shared/types/setup-log';

import { answerBy, installFakeFetch, respond } from '../../helpers/fake-fetch';
import { TestSWR } from '../../helpers/swr';
import { bike, BIKE_ID, KINDS, list, plans, propose, REAR_DAMPERS, ride } from '../test-ride/fixtures';

jest.mock('@/session/session-provider', () => ({
  useSignedInUser: () => jest.requireActual<typeof import('../../helpers/accounts')>('../../helpers/accounts').accountUser('desk'),
}));

const { fetchMock } = installFakeFetch();

const change = propose('bounces-after-bump', 'rear', 'clear', REAR_DAMPERS);

/** Four rides, newest first as the server lists them. */
const RIDES = list([
  ride(4, { kind: 'change', change }, 'judged', { statusText: 'Rode better. If the bike still does it, report it again for the next step.' }),
  ride(3, { kind: 'change', change }, 'superseded', { statusText: 'Not made: a later report replaced this proposal.' }),
  ride(2, { kind: 'none', reason: 'Nothing left to try.' }, 'no-change', { statusText: 'Nothing left to try.' }),
  ride(1, { kind: 'change', change }, 'judged', { statusText: 'Made no difference; the change is still on the bike.' }),
]);

function entry(id: number, note: string, from: number, to: number): SetupLogEntry {
  return {
    id,
    bikeId: BIKE_ID,
    kind: 'change',
    note,
    createdAt: `2026-12-0${id}T10:00:00.000Z`,
    createdById: 1,
    before: { front: null, rear: null },
    after: { front: null, rear: null },
    changes: [{ end: 'rear', setting: 'damper', adjuster: 'rebound', unit: 'clicks', from, to }],
    sizing: null,
  };
}

/** Six entries, oldest first as the server lists them. */
const LOG: SetupLog = {
  entries: [1, 2, 3, 4, 5, 6].map((id) => entry(id, `Change ${id}`, 10 + id, 11 + id)),
  baseline: null,
  current: { front: null, rear: null },
};

function renderSection() {
  const current = bike();
  fetchMock.mockImplementation(
    answerBy({
      [`GET /api/bikes/${BIKE_ID}/test-rides`]: respond(200, RIDES),
      [`GET /api/bikes/${BIKE_ID}`]: respond(200, { bike: current }),
      [`GET /api/bikes/${BIKE_ID}/damper-plans`]: respond(200, plans(current)),
      [`GET /api/bikes/${BIKE_ID}/setup-log`]: respond(200, LOG),
      'GET /api/damper-kinds': respond(200, { kinds: KINDS }),
      'GET /api/me/units': respond(200, { units: { system: 'metric', rateUnit: 'N/mm', length: 'mm', mass: 'kg', force: 'N' } }),
    }),
  );
  render(
    <TestSWR>
      <BikeDampingSection bike={current} />
    </TestSWR>,
  );
}

describe('BikeDampingSection', () => {
  it('shows, closed, each adjuster beside its maker’s standard and the three latest rides with their status', async () => {
    renderSection();
    expect(await screen.findByTestId(`bike-ride-4-status`)).toHaveTextContent('Rode better. If the bike still does it, report it again for the next step.');
    expect(screen.getByTestId(`bike-damper-${BIKE_ID}-front-rebound`)).toHaveTextContent('Rebound 1.5 turns out · maker’s standard 1.5 turns out');
    expect(screen.getByTestId(`bike-damper-${BIKE_ID}-rear-ls-rebound`)).toHaveTextContent('Low-speed rebound 10 clicks out · maker’s standard 10 clicks out');
    const shown = within(screen.getByTestId(`bike-rides-${BIKE_ID}`)).getAllByTestId(/^bike-ride-\d+$/);
    expect(shown.map((row) => row.props.testID)).toEqual(['bike-ride-4', 'bike-ride-3', 'bike-ride-2']);
    expect(screen.getByText('and 1 earlier ride: open the test rides to see them all.')).toBeOnTheScreen();
    expect(screen.queryByTestId('ride-loop')).toBeNull();
  });

  it('opens to the test-ride loop and the setup log, newest first, five entries until asked for all', async () => {
    renderSection();
    fireEvent.press(await screen.findByRole('button', { name: 'Test rides and setup log' }));
    expect(await screen.findByTestId('ride-loop')).toBeOnTheScreen();
    const log = within(await screen.findByTestId(`desk-setup-log-${BIKE_ID}`));
    await log.findByTestId('desk-log-entry-6');
    expect(log.getAllByTestId(/^desk-log-entry-/).map((row) => row.props.testID)).toEqual([6, 5, 4, 3, 2].map((id) => `desk-log-entry-${id}`));
    expect(log.getByTestId('desk-log-entry-6')).toHaveTextContent(/Change 6/);
    expect(log.getByTestId('desk-log-entry-6')).toHaveTextContent(/Rear rebound 16 → 17 clicks out/);
    fireEvent.press(log.getByRole('button', { name: 'Show all 6 entries' }));
    expect(log.getAllByTestId(/^desk-log-entry-/)).toHaveLength(6);
    // Closed again, the loop goes and the short lines come back.
    fireEvent.press(screen.getByRole('button', { name: 'Close the test rides' }));
    expect(screen.queryByTestId('ride-loop')).toBeNull();
    expect(screen.getByTestId(`bike-damper-${BIKE_ID}-rear-rebound`)).toBeOnTheScreen();
  });
});
