/**
 * Back to baseline. The check values are worked by hand in each test: a setting's undo is the
 * baseline minus the current setting (arithmetic, no source); that clockwise adds preload on one
 * adjuster and counter-clockwise on another is the bike's own data, not a rule.
 */
import { planBackToBaseline, preloadWay } from '@shared/setup/back-to-baseline';
import { applySetupChange, settingsOf } from '@shared/setup/settings';
import type { BikeSpec, PreloadAdjuster } from '@shared/types/bike';
import type { EndSettings } from '@shared/types/setup-log';

const threaded: PreloadAdjuster = { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 15, zeroReference: 'cap fully out', addsPreload: 'clockwise' };

function end(overrides: Partial<EndSettings> = {}): EndSettings {
  return { rateNmm: 8.5, secondRateNmm: null, breakMm: null, family: 'F37x320', preloadMm: 10, preloadPosition: 5, rebound: 12, compression: 10, ...overrides };
}

describe('the worked example', () => {
  // Baseline: front preload 5 turns, rebound 12 clicks out, an 8.5 N/mm spring.
  // Then: preload to 7 turns, then 6.5; rebound to 9; the spring swapped for a 9.5 N/mm one.
  const baseline = { front: end(), rear: null };
  const current = { front: end({ preloadPosition: 6.5, preloadMm: 11.5, rebound: 9, rateNmm: 9.5 }), rear: null };
  const plan = planBackToBaseline(baseline, current, { front: threaded });

  test('preload: remove 1.5 turns, counter-clockwise as clockwise adds', () => {
    // 5 - 6.5 = -1.5 turns: negative, so preload comes off; the opposite of the adding direction.
    expect(plan.front?.preload).toEqual(
      expect.objectContaining({ fromPosition: 6.5, toPosition: 5, changeUnits: -1.5, amount: 1.5, unit: 'turns', direction: 'remove', way: 'counter-clockwise' }),
    );
    expect(plan.front?.preload?.instruction).toBe('Front preload: turn the adjuster 1.5 turns counter-clockwise (less preload), back to 5 turns from cap fully out.');
  });

  test('rebound: 3 clicks back out, from 9 to 12', () => {
    // 12 - 9 = +3: positive counts out from fully closed.
    expect(plan.front?.clickers).toEqual([
      expect.objectContaining({ clicker: 'rebound', fromPosition: 9, toPosition: 12, clicks: 3, amount: 3, direction: 'out' }),
    ]);
    expect(plan.front?.clickers[0].instruction).toBe('Front rebound: 3 clicks out, back to 12 out from fully closed.');
  });

  test('spring: back to the 8.5 N/mm one', () => {
    expect(plan.front?.spring?.from.rateNmm).toBe(9.5);
    expect(plan.front?.spring?.to.rateNmm).toBe(8.5);
    expect(plan.front?.spring?.instruction).toBe('Front spring: fit the 8.5 N/mm spring (F37x320) again in place of the 9.5 N/mm spring (F37x320).');
  });

  test('the steps come springs first, then preload, then clickers', () => {
    expect(plan.atBaseline).toBe(false);
    expect(plan.steps).toEqual([plan.front?.spring?.instruction, plan.front?.preload?.instruction, plan.front?.clickers[0].instruction]);
  });
});

test('where counter-clockwise adds preload, adding goes counter-clockwise and removing clockwise', () => {
  const ccw = { ...threaded, addsPreload: 'counter-clockwise' as const };
  expect(preloadWay(ccw, true)).toBe('counter-clockwise');
  expect(preloadWay(ccw, false)).toBe('clockwise');
  // Baseline 5 turns, now 3.25: add 1.75 turns.
  const plan = planBackToBaseline({ front: null, rear: end() }, { front: null, rear: end({ preloadPosition: 3.25 }) }, { rear: ccw });
  expect(plan.rear?.preload).toEqual(expect.objectContaining({ changeUnits: 1.75, direction: 'add', way: 'counter-clockwise' }));
});

test('a spacer goes back by being made shorter or longer, in mm', () => {
  const spacer: PreloadAdjuster = { kind: 'spacer', mmPerUnit: 1, position: 0, minPosition: -10, maxPosition: 20, zeroReference: '', addsPreload: 'longer spacer' };
  const plan = planBackToBaseline({ front: end({ preloadPosition: 0 }), rear: null }, { front: end({ preloadPosition: 2.5 }), rear: null }, { front: spacer });
  expect(plan.front?.preload).toEqual(expect.objectContaining({ changeUnits: -2.5, unit: 'mm', way: 'shorter spacer' }));
  expect(plan.front?.preload?.instruction).toBe('Front preload: fit a spacer 2.5 mm shorter (less preload), back to 0 mm.');
});

test('a stepped cam counts steps, singular for one', () => {
  const cam: PreloadAdjuster = { kind: 'stepped', mmPerUnit: 2.5, position: 2, maxPosition: 6, zeroReference: 'the softest step', addsPreload: 'clockwise' };
  const plan = planBackToBaseline({ front: null, rear: end({ preloadPosition: 2 }) }, { front: null, rear: end({ preloadPosition: 3 }) }, { rear: cam });
  expect(plan.rear?.preload?.instruction).toBe('Rear preload: turn the cam 1 step counter-clockwise (less preload), back to 2 steps from the softest step.');
});

test('nothing to undo when the settings are the baseline', () => {
  const plan = planBackToBaseline({ front: end(), rear: end() }, { front: end(), rear: end() }, { front: threaded, rear: threaded });
  expect(plan).toEqual(expect.objectContaining({ atBaseline: true, steps: [], notes: [] }));
  expect(plan.front).toEqual({ end: 'front', atBaseline: true, spring: null, preload: null, clickers: [] });
});

test('a clicker added since the baseline, or an end, is a note rather than a step', () => {
  const plan = planBackToBaseline({ front: end({ compression: null }), rear: null }, { front: end(), rear: end() }, { front: threaded, rear: threaded });
  expect(plan.atBaseline).toBe(true);
  expect(plan.notes).toHaveLength(2);
});

describe('applying a change', () => {
  const bike: BikeSpec = {
    masses: { massKg: 205, frontShare: 0.5, unsprungFrontKg: 18, unsprungRearKg: 22 },
    front: {
      travelMm: 120,
      springCount: 2,
      rakeDeg: 25,
      rateNmm: 8.5,
      secondRateNmm: null,
      breakMm: null,
      preloadMm: 10,
      family: 'F37x320',
      adjuster: threaded,
      clickers: { rebound: { position: 12, maxPosition: 20 }, compression: null },
    },
    rear: null,
  };

  test('the preload follows the adjuster: 2 turns of 1 mm pitch add 2 mm', () => {
    const outcome = applySetupChange(bike, { front: { preloadPosition: 7 } });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.fields));
    expect(settingsOf(outcome.bike).front).toEqual(expect.objectContaining({ preloadPosition: 7, preloadMm: 12 }));
  });

  test('a spring swap keeps the preload unless the new spring says otherwise', () => {
    const kept = applySetupChange(bike, { front: { spring: { rateNmm: 9.5 } } });
    const given = applySetupChange(bike, { front: { spring: { rateNmm: 9.5, preloadMm: 14 } } });
    if (!kept.ok || !given.ok) throw new Error('refused');
    expect(kept.bike.front).toEqual(expect.objectContaining({ rateNmm: 9.5, family: 'F37x320', preloadMm: 10 }));
    expect(given.bike.front?.preloadMm).toBe(14);
  });

  test('what the bike cannot take is refused by field', () => {
    const outcome = applySetupChange(bike, { front: { preloadPosition: 16, rebound: 21, compression: 3 }, rear: { rebound: 2 } });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(Object.keys(outcome.fields).sort()).toEqual(['front.compression', 'front.preloadPosition', 'front.rebound', 'rear']);
  });

  test('a change to what the bike already has is refused', () => {
    expect(applySetupChange(bike, { front: { preloadPosition: 5 } })).toEqual({ ok: false, fields: { '': expect.stringMatching(/Nothing changed/) } });
  });
});
