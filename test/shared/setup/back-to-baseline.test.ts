/**
 * Back to baseline. The check values are worked by hand in each test: a setting's undo is the
 * baseline minus the current setting (arithmetic, no source); that clockwise adds preload on one
 * adjuster and counter-clockwise on another is the bike's own data, not a rule. Damping adjusters
 * count out from fully closed, in whole clicks or quarter turns (common practice, no source).
 */
import { planBackToBaseline, preloadWay } from '@shared/setup/back-to-baseline';
import { applySetupChange, damperUnitsOf, diffSettings, settingsOf } from '@shared/setup/settings';
import type { BikeSpec, PreloadAdjuster } from '@shared/types/bike';
import type { DamperAdjuster } from '@shared/types/damping';
import type { BackToBaseline, EndChangeInput, EndSettings } from '@shared/types/setup-log';

const threaded: PreloadAdjuster = { kind: 'threaded', mmPerUnit: 1, position: 5, maxPosition: 15, zeroReference: 'cap fully out', addsPreload: 'clockwise' };

function end(overrides: Partial<EndSettings> = {}): EndSettings {
  return { rateNmm: 8.5, secondRateNmm: null, breakMm: null, family: 'F37x320', preloadMm: 10, preloadPosition: 5, dampers: { rebound: 12, compression: 10 }, ...overrides };
}

const CLICKS = { front: { rebound: 'clicks', compression: 'clicks' }, rear: { rebound: 'clicks', compression: 'clicks' } } as const;

describe('the worked example', () => {
  // Baseline: front preload 5 turns, rebound 12 clicks out, an 8.5 N/mm spring.
  // Then: preload to 7 turns, then 6.5; rebound to 9; the spring swapped for a 9.5 N/mm one.
  const baseline = { front: end(), rear: null };
  const current = { front: end({ preloadPosition: 6.5, preloadMm: 11.5, dampers: { rebound: 9, compression: 10 }, rateNmm: 9.5 }), rear: null };
  const plan = planBackToBaseline(baseline, current, { front: threaded }, { units: CLICKS, labels: { rebound: 'Rebound' } });

  test('preload: remove 1.5 turns, counter-clockwise as clockwise adds', () => {
    // 5 - 6.5 = -1.5 turns: negative, so preload comes off; the opposite of the adding direction.
    expect(plan.front?.preload).toEqual(
      expect.objectContaining({ fromPosition: 6.5, toPosition: 5, changeUnits: -1.5, amount: 1.5, unit: 'turns', direction: 'remove', way: 'counter-clockwise' }),
    );
    expect(plan.front?.preload?.instruction).toBe('Front preload: turn the adjuster 1.5 turns counter-clockwise (less preload), back to 5 turns from cap fully out.');
  });

  test('rebound: 3 clicks back out, from 9 to 12', () => {
    // 12 - 9 = +3: positive counts out from fully closed.
    expect(plan.front?.dampers).toEqual([
      { adjuster: 'rebound', unit: 'clicks', from: 9, to: 12, amount: 3, direction: 'out', instruction: 'Front rebound: 3 clicks out, back to 12 out from fully closed.' },
    ]);
  });

  test('spring: back to the 8.5 N/mm one', () => {
    expect(plan.front?.spring?.from.rateNmm).toBe(9.5);
    expect(plan.front?.spring?.to.rateNmm).toBe(8.5);
    expect(plan.front?.spring?.instruction).toBe('Front spring: fit the 8.5 N/mm spring (F37x320) again in place of the 9.5 N/mm spring (F37x320).');
  });

  test('the steps come springs first, then preload, then damping', () => {
    expect(plan.atBaseline).toBe(false);
    expect(plan.steps).toEqual([plan.front?.spring?.instruction, plan.front?.preload?.instruction, plan.front?.dampers[0].instruction]);
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
  expect(plan.front).toEqual({ end: 'front', atBaseline: true, spring: null, preload: null, dampers: [] });
});

test('an adjuster added or removed since the baseline, or an end, is a note rather than a step', () => {
  const plan = planBackToBaseline(
    { front: end({ dampers: { rebound: 12, 'ls-compression': 8 } }), rear: null },
    { front: end(), rear: end() },
    { front: threaded, rear: threaded },
    { labels: { compression: 'Compression' } },
  );
  expect(plan.atBaseline).toBe(true);
  expect(plan.notes).toEqual([
    "The fork's compression adjuster was added since the baseline: set it by hand.",
    "The fork's ls compression adjuster was removed since the baseline: set it by hand.",
    'The shock was added to the bike after the baseline: it has no baseline to go back to.',
  ]);
});

describe('turns and split adjusters', () => {
  // Baseline: shock high-speed compression 1.5 turns out, low-speed 10 clicks; now 2.25 turns and 7 clicks.
  const baseline = { front: null, rear: end({ dampers: { 'hs-compression': 1.5, 'ls-compression': 10 } }) };
  const current = { front: null, rear: end({ dampers: { 'hs-compression': 2.25, 'ls-compression': 7 } }) };
  const units = { rear: { 'hs-compression': 'turns', 'ls-compression': 'clicks' } } as const;

  test('quarter turns back in, clicks back out, named by the shop’s labels', () => {
    const plan = planBackToBaseline(baseline, current, { rear: threaded }, { units, labels: { 'hs-compression': 'High-speed compression', 'ls-compression': 'Low-speed compression' } });
    // 1.5 - 2.25 = -0.75 turns: in; 10 - 7 = +3 clicks: out.
    expect(plan.rear?.dampers.map((d) => [d.adjuster, d.unit, d.amount, d.direction])).toEqual([
      ['hs-compression', 'turns', 0.75, 'in'],
      ['ls-compression', 'clicks', 3, 'out'],
    ]);
    expect(plan.steps).toEqual([
      'Rear high-speed compression: 0.75 turns in, back to 1.5 out from fully closed.',
      'Rear low-speed compression: 3 clicks out, back to 10 out from fully closed.',
    ]);
  });

  test('without the shop’s list, the key in words', () => {
    const plan = planBackToBaseline(baseline, current, { rear: threaded }, { units });
    expect(plan.steps[0]).toBe('Rear hs compression: 0.75 turns in, back to 1.5 out from fully closed.');
  });
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
      dampers: [{ kind: 'rebound', unit: 'clicks', maxPosition: 20, standard: 12, position: 12, dampingPerStepNsPerM: null }],
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

  test('a damper setting moves that adjuster alone, and the change names it with its unit', () => {
    const outcome = applySetupChange(bike, { front: { dampers: { rebound: 14 } } });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.fields));
    expect(outcome.bike.front?.dampers).toEqual([{ ...bike.front!.dampers[0], position: 14 }]);
    expect(bike.front?.dampers[0].position).toBe(12);
    expect(diffSettings(settingsOf(bike), settingsOf(outcome.bike), damperUnitsOf(bike))).toEqual([
      { end: 'front', setting: 'damper', adjuster: 'rebound', unit: 'clicks', from: 12, to: 14 },
    ]);
  });

  test('what the bike cannot take is refused by field', () => {
    const outcome = applySetupChange(bike, { front: { preloadPosition: 16, dampers: { rebound: 21, compression: 3 } }, rear: { dampers: { rebound: 2 } } });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.fields).toEqual({
      'front.preloadPosition': expect.stringMatching(/goes from 0 to 15/),
      'front.dampers.rebound': 'The setting must be from 0 (fully closed) to 20 clicks out (fully open).',
      'front.dampers.compression': 'The fork has no compression adjuster recorded: add it to the bike first.',
      rear: expect.stringMatching(/no shock/),
    });
  });

  test('a setting between steps is refused: whole clicks, quarter turns', () => {
    const turns: DamperAdjuster = { kind: 'hs-compression', unit: 'turns', maxPosition: 3, standard: null, position: 1.5, dampingPerStepNsPerM: null };
    const split = { ...bike, front: { ...bike.front!, dampers: [...bike.front!.dampers, turns] } };
    const outcome = applySetupChange(split, { front: { dampers: { rebound: 12.5, 'hs-compression': 1.3 } } });
    expect(outcome).toEqual({ ok: false, fields: { 'front.dampers.rebound': 'Set whole clicks.', 'front.dampers.hs-compression': 'Set turns in quarter turns (0.25, 0.5, 0.75).' } });
    const quarter = applySetupChange(split, { front: { dampers: { 'hs-compression': 1.75 } } });
    expect(quarter.ok && quarter.bike.front?.dampers[1].position).toBe(1.75);
  });

  test('a change to what the bike already has is refused', () => {
    expect(applySetupChange(bike, { front: { preloadPosition: 5 } })).toEqual({ ok: false, fields: { '': expect.stringMatching(/Nothing changed/) } });
  });
});

describe('the plan, carried out, gives the baseline back', () => {
  // A fork with a rebound clicker, a compression clicker and high-speed compression in turns.
  const dampers: DamperAdjuster[] = [
    { kind: 'rebound', unit: 'clicks', maxPosition: 20, standard: 12, position: 12, dampingPerStepNsPerM: null },
    { kind: 'compression', unit: 'clicks', maxPosition: 20, standard: 10, position: 10, dampingPerStepNsPerM: null },
    { kind: 'hs-compression', unit: 'turns', maxPosition: 3, standard: 1.5, position: 1.5, dampingPerStepNsPerM: null },
  ];
  const start: BikeSpec = {
    masses: { massKg: 205, frontShare: 0.5, unsprungFrontKg: 18, unsprungRearKg: 22 },
    front: { travelMm: 120, springCount: 2, rakeDeg: 25, rateNmm: 8.5, secondRateNmm: null, breakMm: null, preloadMm: 10, family: 'F37x320', adjuster: threaded, dampers },
    rear: null,
  };

  function applied(bike: BikeSpec, change: EndChangeInput): BikeSpec {
    const outcome = applySetupChange(bike, { front: change });
    if (!outcome.ok) throw new Error(JSON.stringify(outcome.fields));
    return outcome.bike;
  }

  /** Each step as the rider would carry it out: the damper moved by its amount in its direction. */
  function carriedOut(plan: BackToBaseline, preloadMm: number): EndChangeInput {
    const undo = plan.front!;
    return {
      ...(undo.spring && { spring: { ...undo.spring.to, preloadMm } }),
      ...(undo.preload && { preloadPosition: undo.preload.fromPosition + undo.preload.changeUnits }),
      dampers: Object.fromEntries(undo.dampers.map((d) => [d.adjuster, d.from + (d.direction === 'out' ? d.amount : -d.amount)])),
    };
  }

  test('after changes to the spring, the preload and every kind of adjuster', () => {
    const baseline = settingsOf(start);
    let bike = applied(start, { preloadPosition: 7, dampers: { rebound: 9, 'hs-compression': 2.25 } });
    bike = applied(bike, { spring: { rateNmm: 9.5 }, dampers: { compression: 13, 'hs-compression': 0.5 } });
    const plan = planBackToBaseline(baseline, settingsOf(bike), { front: bike.front!.adjuster }, { units: damperUnitsOf(bike) });
    expect(plan.front?.dampers.map((d) => [d.adjuster, d.amount, d.direction])).toEqual([
      ['rebound', 3, 'out'],
      ['compression', 3, 'in'],
      ['hs-compression', 1, 'out'],
    ]);
    const back = applied(bike, carriedOut(plan, baseline.front!.preloadMm));
    expect(settingsOf(back)).toEqual(baseline);
    expect(planBackToBaseline(baseline, settingsOf(back), { front: back.front!.adjuster }).atBaseline).toBe(true);
  });
});
