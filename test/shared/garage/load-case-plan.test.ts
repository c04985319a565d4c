/**
 * A bike's load cases as the garage plans them: from the latest pass's loads, on the spring the bike
 * has now, kept clear of coil-bind by the same coil-bind length the engine uses (the catalogue's,
 * where the bike does not give one). Arithmetic from sizing.md section 4 (dp = dW*LR/k), no source.
 */
import { planLoadCases } from '@shared/garage/load-case-plan';
import { buildSizingRequest } from '@shared/garage/build-sizing-request';
import { sizeBike } from '@shared/sizing';
import type { BikeSpec } from '@shared/types/bike';
import { makeContext, shockSpring, thresholds } from '../sizing/fixtures';

const g = 9.80665; // standard gravity (CGPM 1901; NIST SP 811)

/** A rear-only bike: 100 N/mm at LR 2.5, 8 mm of preload, a collar of 1.5 mm a turn at 4 turns of 40. */
const bike: BikeSpec = {
  masses: { massKg: 220, frontShare: 0.5, unsprungFrontKg: 20, unsprungRearKg: 25 },
  front: null,
  rear: {
    wheelTravelMm: 125,
    shockStrokeMm: 50,
    gasForceN: 0,
    linkage: null,
    rateNmm: 100,
    secondRateNmm: null,
    breakMm: null,
    preloadMm: 8,
    family: 'S60-180',
    adjuster: { kind: 'threaded', mmPerUnit: 1.5, position: 4, maxPosition: 40, zeroReference: 'collar backed off', addsPreload: 'clockwise' },
    dampers: [],
  },
};
const weighIn = { bodyKg: 80, gear: { helmet: 8 }, loads: [{ kind: 'passenger' as const, massKg: 90, rearShare: 1 }], discipline: 'road', position: 'neutral' as const, rearShare: 0.65 };

test('a passenger is set on the fitted spring, stopping short of the coil-bind length the engine uses', () => {
  const request = buildSizingRequest({ bike, weighIn, ends: ['rear'] });
  // The catalogue's 100 N/mm spring of this fit binds at 90 mm: at most 90 - 3 - 50 = 37 mm of preload.
  const catalogue = [shockSpring('S100', 100)];
  const result = sizeBike(request, makeContext({ springs: { front: [], rear: catalogue } }));
  // Solo at 10 turns: 8 + 6*1.5 = 17 mm of preload; the passenger would need 17 + 22.065 = 39.1 mm.
  const solo = { rear: 10 };
  const [plan] = planLoadCases({ bike, solo, request, result, catalogue: { rear: catalogue }, thresholds });
  const planned = plan.ends.rear!;
  // 90 kg at a rear share of 1: 90 g = 882.6 N, dp = 882.6*2.5/100 = 22.065 mm on top of solo.
  expect((90 * g * 2.5) / 100).toBeCloseTo(22.065, 3);
  expect(planned.preloadMm).toBeLessThanOrEqual(90 - 3 - 50);
  expect(planned).toMatchObject({ carries: false, limit: 'coil-bind' });
  // Without the catalogue's length there is nothing to stop at but the collar's last turn.
  const [unbounded] = planLoadCases({ bike, solo, request, result, catalogue: {}, thresholds });
  expect(unbounded.ends.rear!.preloadMm).toBeGreaterThan(37);
  expect(unbounded.ends.rear!.carries).toBe(true);
});
