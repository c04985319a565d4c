/**
 * The bike form's damping adjusters: added from the shop's list, removed, each with its unit,
 * fully-open count, maker's standard, setting and dyno figure, checked as typed. The kinds are the
 * six of the trade (common practice, no source); the bike's figures are invented.
 */
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react-native';

import { BikeForm } from '@/components/garage/bike-form';
import type { BikeSpec } from '@shared/types/bike';

import { answerBy, installFakeFetch, respond } from '../../helpers/fake-fetch';
import { TestSWR } from '../../helpers/swr';

const { fetchMock } = installFakeFetch();

const KINDS = [
  { key: 'rebound', label: 'Rebound', circuit: 'rebound', speed: 'all' },
  { key: 'compression', label: 'Compression', circuit: 'compression', speed: 'all' },
  { key: 'hs-compression', label: 'High-speed compression', circuit: 'compression', speed: 'high' },
  { key: 'ls-compression', label: 'Low-speed compression', circuit: 'compression', speed: 'low' },
  { key: 'hs-rebound', label: 'High-speed rebound', circuit: 'rebound', speed: 'high' },
  { key: 'ls-rebound', label: 'Low-speed rebound', circuit: 'rebound', speed: 'low' },
];

const REBOUND = { kind: 'rebound', unit: 'clicks' as const, maxPosition: 20, standard: 10, position: 12, dampingPerStepNsPerM: null };

/** A road bike: a fork without damping adjusters, a shock with a rebound clicker. */
const SPEC: BikeSpec = {
  masses: { massKg: 190, frontShare: 0.5, unsprungFrontKg: 18, unsprungRearKg: 22 },
  front: {
    travelMm: 130,
    springCount: 2,
    rakeDeg: 25,
    rateNmm: 9,
    secondRateNmm: null,
    breakMm: null,
    preloadMm: 10,
    family: 'fork',
    adjuster: { kind: 'spacer', mmPerUnit: 1, position: 0, minPosition: -10, maxPosition: 20, zeroReference: 'stock spacer', addsPreload: 'longer spacer' },
    dampers: [],
  },
  rear: {
    wheelTravelMm: 135,
    shockStrokeMm: 50,
    gasForceN: null,
    linkage: null,
    rateNmm: 95,
    secondRateNmm: null,
    breakMm: null,
    preloadMm: 10,
    family: 'shock',
    adjuster: { kind: 'stepped', mmPerUnit: 2.5, position: 2, minPosition: 0, maxPosition: 6, zeroReference: 'softest step', addsPreload: 'clockwise' },
    dampers: [REBOUND],
  },
};

function renderForm(fromModel = false) {
  fetchMock.mockImplementation(
    answerBy({
      'GET /api/me/units': respond(200, { units: { system: 'metric', rateUnit: 'N/mm', length: 'mm', mass: 'kg', force: 'N' } }),
      'GET /api/damper-kinds': respond(200, { kinds: KINDS }),
    }),
  );
  const onSubmit = jest.fn(async (_values: BikeSpec) => undefined);
  render(
    <TestSWR>
      <BikeForm spec={SPEC} nickname="Blue one" fromModel={fromModel} submitLabel="Save" onSubmit={onSubmit} />
    </TestSWR>,
  );
  return onSubmit;
}

describe('the damping adjusters on the bike form', () => {
  it('adds one from the shop’s list and sends what was typed', async () => {
    const onSubmit = renderForm();
    fireEvent.press(await screen.findByTestId('add-damper-rear-hs-compression'));
    fireEvent.changeText(screen.getByLabelText('High-speed compression: fully open (clicks out)'), '12');
    fireEvent.changeText(screen.getByLabelText('High-speed compression: maker’s standard (clicks out)'), '5');
    fireEvent.changeText(screen.getByLabelText('High-speed compression: set now (clicks out)'), '6');
    // A kind already on the end is not offered again.
    expect(screen.queryByTestId('add-damper-rear-hs-compression')).toBeNull();
    expect(screen.getByTestId('add-damper-front-hs-compression')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0][0].rear?.dampers).toEqual([
      REBOUND,
      { kind: 'hs-compression', unit: 'clicks', maxPosition: 12, standard: 5, position: 6, dampingPerStepNsPerM: null },
    ]);
  });

  it('counts turns in quarter turns: a setting between them is refused on its field', async () => {
    const onSubmit = renderForm();
    fireEvent.press(await screen.findByTestId('add-damper-front-rebound'));
    const row = within(screen.getByTestId('damper-front-rebound'));
    fireEvent.press(row.getByRole('radio', { name: 'Turns' }));
    fireEvent.changeText(row.getByLabelText('Rebound: fully open (turns out)'), '3');
    fireEvent.changeText(row.getByLabelText('Rebound: set now (turns out)'), '1,3');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('Set turns in quarter turns (0.25, 0.5, 0.75).')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(row.getByLabelText('Rebound: set now (turns out)'), '1,25');
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0][0].front?.dampers).toEqual([{ kind: 'rebound', unit: 'turns', maxPosition: 3, standard: null, position: 1.25, dampingPerStepNsPerM: null }]);
  });

  it('removes one', async () => {
    const onSubmit = renderForm();
    fireEvent.press(await screen.findByRole('button', { name: 'Remove Rebound' }));
    expect(screen.queryByTestId('damper-rear-rebound')).toBeNull();
    fireEvent.press(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalled());
    expect(onSubmit.mock.calls[0][0].rear?.dampers).toEqual([]);
  });

  it('puts the setting now among the rider’s changes on a bike copied from a model, once', async () => {
    renderForm(true);
    expect(await screen.findByLabelText('Rebound: set now (clicks out)')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Show every value' }));
    expect(await screen.findByLabelText('Rebound: maker’s standard (clicks out)')).toBeOnTheScreen();
    expect(screen.getAllByLabelText('Rebound: set now (clicks out)')).toHaveLength(1);
  });
});
