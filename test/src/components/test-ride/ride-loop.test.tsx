/**
 * The test-ride loop on screen: the proposal card's big words agree with the proposal's own from
 * and to (and with the instruction the server wrote from them), and each step is offered only in
 * the state that allows it: "I made this change" while the change waits to be made, how it rode
 * once it is made, the way back only after a worse ride. The rows are the seed (common practice,
 * no source); every expected position is worked by hand from the step rule of
 * shared/damping/step-size.ts.
 */
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react-native';

import { RideLoop } from '@/components/test-ride/ride-loop';
import { formatNumber } from '@shared/sizing/format';
import type { GarageBike } from '@shared/types/garage';
import type { DamperPlans, TestRideList } from '@shared/types/test-ride';

import { answerBy, installFakeFetch, requestsOf, respond, respondError, type Answers } from '../../helpers/fake-fetch';
import { TestSWR } from '../../helpers/swr';
import { bike, BIKE_ID, clicks, KINDS, list, plans, propose, REAR_DAMPERS, ride, turns, worseRide } from './fixtures';

let mockRole: 'rider' | 'desk' = 'rider';
jest.mock('@/session/session-provider', () => ({
  useSignedInUser: () => jest.requireActual<typeof import('../../helpers/accounts')>('../../helpers/accounts').accountUser(mockRole),
}));

const { fetchMock } = installFakeFetch();

const RIDES = `GET /api/bikes/${BIKE_ID}/test-rides`;

function renderLoop(rides: TestRideList, extra: Answers = {}, current: GarageBike = bike(), planAnswer: DamperPlans = plans(current)) {
  fetchMock.mockImplementation(
    answerBy({
      [RIDES]: respond(200, rides),
      [`GET /api/bikes/${BIKE_ID}`]: respond(200, { bike: current }),
      'GET /api/damper-kinds': respond(200, { kinds: KINDS }),
      [`GET /api/bikes/${BIKE_ID}/damper-plans`]: respond(200, planAnswer),
      ...extra,
    }),
  );
  render(
    <TestSWR>
      <RideLoop bikeId={BIKE_ID} />
    </TestSWR>,
  );
}

function bodyOf(request: string): unknown {
  const call = fetchMock.mock.calls.find(([url, init]) => `${init.method ?? 'GET'} ${url}` === request);
  return call ? JSON.parse(String(call[1].body ?? 'null')) : undefined;
}

const madeButton = () => screen.queryByRole('button', { name: 'I made this change' });
const outcomeChoices = () => ['Better', 'Worse', 'The same'].map((name) => screen.queryByRole('radio', { name }));
const undoButton = () => screen.queryByRole('button', { name: 'I’ve turned it back' });

beforeEach(() => {
  mockRole = 'rider';
});

describe('the proposal card', () => {
  const cases = [
    // 24 clicks, clear: min(2, floor(24 / 6)) = 2 clicks in (more rebound damping).
    { name: 'rear rebound in 2 clicks', change: propose('bounces-after-bump', 'rear', 'clear', REAR_DAMPERS), adjuster: 'Rear rebound', way: 'Turn in (clockwise)', amount: '2 clicks', fromTo: 'from 12 to 10 clicks out from fully closed' },
    // 3 turns = 12 quarter turns, strong: max(2, min(4, floor(12 / 4))) = 3 quarter turns out (less rebound).
    { name: 'front rebound out three quarters of a turn', change: propose('sinks-repeated-bumps', 'front', 'strong', [turns('rebound', 1.5, 3)]), adjuster: 'Front rebound', way: 'Turn out (counter-clockwise)', amount: 'three quarters of a turn', fromTo: 'from 1.5 to 2.25 turns out from fully closed' },
    // Slight: 1 click out, from 1 to 2: within 2 clicks of fully closed, so warned.
    { name: 'rear high-speed compression out 1 click, near the stop', change: propose('harsh-small-bumps', 'rear', 'slight', [clicks('hs-compression', 1, 10)]), adjuster: 'Rear high-speed compression', way: 'Turn out (counter-clockwise)', amount: '1 click', fromTo: 'from 1 to 2 clicks out from fully closed' },
  ];

  it.each(cases)('says $name, as the proposal’s from and to and its instruction do', async ({ change, adjuster, way, amount, fromTo }) => {
    renderLoop(list([ride(31, { kind: 'change', change }, 'to-make')]));
    expect(await screen.findByTestId('proposal-adjuster')).toHaveTextContent(adjuster);
    expect(screen.getByTestId('proposal-way')).toHaveTextContent(way);
    expect(screen.getByTestId('proposal-amount')).toHaveTextContent(amount);
    expect(screen.getByTestId('proposal-from-to')).toHaveTextContent(fromTo);

    // The way follows from and to: in (towards closed, more damping) exactly when the setting falls.
    expect(way.startsWith('Turn in')).toBe(change.to < change.from);
    expect(change.direction === 'more').toBe(change.to < change.from);
    // The instruction the server wrote says the same move between the same settings.
    const setting = (value: number) => formatNumber(value, 2);
    expect(change.instruction).toBe(`${adjuster}: ${way.charAt(0).toLowerCase()}${way.slice(1)} ${amount}, from ${setting(change.from)} to ${setting(change.to)} out from fully closed.`);
    expect(fromTo).toBe(`from ${setting(change.from)} to ${setting(change.to)} ${change.unit} out from fully closed`);
    expect(screen.queryByTestId('proposal-end-stop') !== null).toBe(change.endStopWarning !== null);
    expect(screen.getByTestId('proposal-why')).toHaveTextContent(change.why);
    expect(screen.getByTestId('proposal-feel-for')).toHaveTextContent(change.feelFor);
  });

  it('shows the step rule on demand', async () => {
    renderLoop(list([ride(31, { kind: 'change', change: cases[0].change }, 'to-make')]));
    fireEvent.press(await screen.findByRole('button', { name: 'How far does a change go?' }));
    expect(screen.getByTestId('proposal-step-rule')).toHaveTextContent(/One step is a click or a quarter turn/);
  });
});

describe('what each state offers', () => {
  const change = propose('bounces-after-bump', 'rear', 'clear', REAR_DAMPERS);
  const proposal = { kind: 'change', change } as const;

  it('to make: only "I made this change"', async () => {
    renderLoop(list([ride(31, proposal, 'to-make')]));
    expect(await screen.findByRole('button', { name: 'I made this change' })).toBeOnTheScreen();
    expect(outcomeChoices()).toEqual([null, null, null]);
    expect(undoButton()).toBeNull();
  });

  it('to judge: only how it rode', async () => {
    renderLoop(list([ride(31, proposal, 'to-judge')]));
    expect(await screen.findByRole('radio', { name: 'Worse' })).toBeOnTheScreen();
    expect(outcomeChoices().every((choice) => choice !== null)).toBe(true);
    expect(madeButton()).toBeNull();
    expect(undoButton()).toBeNull();
    // One change at a time: nothing new is reported while this one waits for its verdict.
    expect(screen.queryByTestId('ride-report')).toBeNull();
  });

  it('judged worse: only the way back, counted from where the adjuster is now', async () => {
    renderLoop(list([worseRide(31, change, REAR_DAMPERS[0])]));
    expect(await screen.findByRole('button', { name: 'I’ve turned it back' })).toBeOnTheScreen();
    // 10 back to 12 is 2 clicks out.
    expect(screen.getByTestId('ride-undo-step-0')).toHaveTextContent('1. Rear rebound: turn out (counter-clockwise) 2 clicks, back to 12 out from fully closed.');
    expect(madeButton()).toBeNull();
    expect(outcomeChoices()).toEqual([null, null, null]);
  });

  it.each([
    ['better', ride(31, proposal, 'judged', { outcome: { at: '2026-12-01T11:00:00.000Z', byId: 1, outcome: 'better', note: '' } })],
    ['same', ride(31, proposal, 'judged', { outcome: { at: '2026-12-01T11:00:00.000Z', byId: 1, outcome: 'same', note: '' } })],
    ['worse and taken back', ride(31, proposal, 'undone', { outcome: { at: '2026-12-01T11:00:00.000Z', byId: 1, outcome: 'worse', note: '' } })],
    ['superseded', ride(31, proposal, 'superseded')],
  ])('%s: none of the three, and a new report can be made', async (_state, judged) => {
    renderLoop(list([judged]));
    expect(await screen.findByTestId('ride-report')).toBeOnTheScreen();
    expect(madeButton()).toBeNull();
    expect(outcomeChoices()).toEqual([null, null, null]);
    expect(undoButton()).toBeNull();
  });
});

describe('each step goes to the server, and its refusal is shown in its own words', () => {
  const change = propose('bounces-after-bump', 'rear', 'clear', REAR_DAMPERS);
  const proposal = { kind: 'change', change } as const;

  it('"I made this change" posts it and says where it went', async () => {
    renderLoop(list([ride(31, proposal, 'to-make')]), {
      'POST /api/test-rides/31/made': respond(200, { ride: ride(31, proposal, 'to-judge'), entry: { note: `Test ride: Keeps bouncing after a bump: ${change.instruction}` }, bike: bike() }),
    });
    fireEvent.press(await screen.findByRole('button', { name: 'I made this change' }));
    expect(await screen.findByTestId('ride-notice')).toHaveTextContent(/is in the setup log/);
    expect(requestsOf(fetchMock)).toContain('POST /api/test-rides/31/made');
  });

  it('a refused change shows the server’s message', async () => {
    const message = 'Rear rebound is at 14 now, not at 12 as when this was proposed: report again for a proposal from where it is.';
    renderLoop(list([ride(31, proposal, 'to-make')]), { 'POST /api/test-rides/31/made': respondError(409, 'adjuster-moved', message) });
    fireEvent.press(await screen.findByRole('button', { name: 'I made this change' }));
    expect(await screen.findByText(message)).toBeOnTheScreen();
  });

  it('how it rode: asks for the outcome, then sends it with the note', async () => {
    renderLoop(list([ride(31, proposal, 'to-judge')]), {
      'POST /api/test-rides/31/outcome': respond(200, { ride: ride(31, proposal, 'judged', { statusText: 'Rode worse: take the change back.' }) }),
    });
    fireEvent.press(await screen.findByRole('button', { name: 'Save how it rode' }));
    expect(await screen.findByText('Say how it rode: better, worse or same.')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('radio', { name: 'Worse' }));
    fireEvent.changeText(screen.getByLabelText('Note (optional)'), ' Kicked on the bypass ');
    fireEvent.press(screen.getByRole('button', { name: 'Save how it rode' }));
    await waitFor(() => expect(bodyOf('POST /api/test-rides/31/outcome')).toEqual({ outcome: 'worse', note: 'Kicked on the bypass' }));
  });

  it('"I’ve turned it back" posts the undo', async () => {
    renderLoop(list([worseRide(31, change, REAR_DAMPERS[0])]), {
      'POST /api/test-rides/31/undo': respond(200, { ride: ride(31, proposal, 'undone'), entry: { note: 'Test ride undone' }, bike: bike() }),
    });
    fireEvent.press(await screen.findByRole('button', { name: 'I’ve turned it back' }));
    await waitFor(() => expect(requestsOf(fetchMock)).toContain('POST /api/test-rides/31/undo'));
  });
});

describe('the report', () => {
  it('lists only the chosen end’s symptoms, and sends end, symptom, strength and note', async () => {
    renderLoop(list([]), {
      [`POST /api/bikes/${BIKE_ID}/test-rides`]: respond(201, { ride: ride(32, { kind: 'change', change: propose('bounces-after-bump', 'rear', 'clear', REAR_DAMPERS) }, 'to-make'), superseded: [], supersededText: null }),
    });
    const report = within(await screen.findByTestId('ride-report'));
    expect(report.queryByRole('radio', { name: 'Keeps bouncing after a bump' })).toBeNull();
    fireEvent.press(report.getByRole('radio', { name: 'Front (fork)' }));
    fireEvent.press(report.getByRole('radio', { name: 'Dives hard under braking' }));
    // The fork's alone: switching to the rear drops it from the list and from the choice.
    fireEvent.press(report.getByRole('radio', { name: 'Rear (shock)' }));
    expect(report.queryByRole('radio', { name: 'Dives hard under braking' })).toBeNull();
    expect(report.getByRole('radio', { name: 'Squats under power' })).toBeOnTheScreen();
    fireEvent.press(report.getByRole('button', { name: 'Propose one change' }));
    expect(await report.findByText('Say what the bike did: choose a symptom from the list.')).toBeOnTheScreen();

    fireEvent.press(report.getByRole('radio', { name: 'Keeps bouncing after a bump' }));
    expect(report.getByText('After a single bump or a dip the end goes up and down more than once before it settles.')).toBeOnTheScreen();
    fireEvent.press(report.getByRole('radio', { name: 'Strong' }));
    fireEvent.press(report.getByRole('button', { name: 'Propose one change' }));
    await waitFor(() =>
      expect(bodyOf(`POST /api/bikes/${BIKE_ID}/test-rides`)).toEqual({ end: 'rear', symptom: 'bounces-after-bump', strength: 'strong', note: '' }),
    );
  });

  it('puts the server’s field message under its field and any other refusal above the button', async () => {
    const fieldMessage = 'This bike has no fork recorded: report a symptom at the end it has.';
    let answer = respondError(400, 'invalid', 'Some fields need attention.', { end: fieldMessage });
    renderLoop(list([]), { [`POST /api/bikes/${BIKE_ID}/test-rides`]: () => answer });
    const report = within(await screen.findByTestId('ride-report'));
    fireEvent.press(report.getByRole('radio', { name: 'Front (fork)' }));
    fireEvent.press(report.getByRole('radio', { name: 'Keeps bouncing after a bump' }));
    fireEvent.press(report.getByRole('button', { name: 'Propose one change' }));
    expect(await report.findByText(fieldMessage)).toBeOnTheScreen();
    expect(report.queryByText('Some fields need attention.')).toBeNull();

    const openMessage = 'The change of test ride 30 is made and not yet judged: tell how the last change rode first (better, worse or the same).';
    answer = respondError(409, 'ride-open', openMessage);
    fireEvent.press(report.getByRole('button', { name: 'Propose one change' }));
    expect(await report.findByText(openMessage)).toBeOnTheScreen();
  });
});

describe('no damper change', () => {
  const spring = { kind: 'spring', reason: 'This can come from the spring or its preload rather than the damping.', recordId: 12 } as const;

  it('refers the rider to the bike’s latest result', async () => {
    renderLoop(list([ride(33, spring, 'no-change')]));
    expect(await screen.findByText(spring.reason)).toBeOnTheScreen();
    expect(screen.getByRole('link', { name: 'Open the bike’s latest result' })).toBeOnTheScreen();
  });

  it('gives the desk the reason alone: the rider’s result screen is not theirs to open', async () => {
    mockRole = 'desk';
    renderLoop(list([ride(33, spring, 'no-change')]));
    expect(await screen.findByText(spring.reason)).toBeOnTheScreen();
    expect(screen.queryByRole('link', { name: 'Open the bike’s latest result' })).toBeNull();
    expect(screen.getAllByText('Back to the rider’s baseline')).toHaveLength(2);
  });
});

describe('the way back', () => {
  it('lists the turns to the maker’s standard, and logs them only when there is something to set', async () => {
    // Rear rebound moved to 10 (standard 12); low-speed rebound at its standard; the front at its standard.
    const moved = bike([clicks('rebound', 10, 24, 12), clicks('ls-rebound', 10, 20, 10)]);
    renderLoop(list([]), {
      [`POST /api/bikes/${BIKE_ID}/damper-plans/standard`]: respond(201, { target: 'standard', plan: plans(moved).rear!.standard, entry: { note: "Back to the maker's standard (rear damping)" }, bike: moved }),
    }, moved, plans(moved, { rear: { rebound: 12, 'ls-rebound': 10 }, front: { rebound: 1.5 } }));
    expect(await screen.findByTestId('plan-rear-standard-step-0')).toHaveTextContent('1. Rear rebound: turn in (clockwise) until it stops, then out 12 clicks.');
    expect(screen.getByTestId('plan-front-standard-at-target')).toBeOnTheScreen();
    expect(screen.getByTestId('plan-front-standard-apply')).toBeDisabled();
    expect(screen.getByTestId('plan-front-baseline-apply')).toBeDisabled();
    fireEvent.press(screen.getByTestId('plan-rear-standard-apply'));
    expect(await screen.findByText("Back to the maker's standard (rear damping): in the setup log.")).toBeOnTheScreen();
    expect(bodyOf(`POST /api/bikes/${BIKE_ID}/damper-plans/standard`)).toEqual({ end: 'rear' });
  });

  it('names an adjuster with no standard as left as it is', async () => {
    const unknown = bike([clicks('rebound', 10, 24, null)]);
    renderLoop(list([]), {}, unknown);
    expect(await screen.findByTestId('plan-rear-standard-missing')).toHaveTextContent('Rear rebound: no standard setting is known.');
    expect(screen.getByTestId('plan-rear-standard-apply')).toBeDisabled();
    expect(screen.getByTestId('dampers-rear-rebound-standard')).toHaveTextContent('maker’s standard not known');
  });
});
