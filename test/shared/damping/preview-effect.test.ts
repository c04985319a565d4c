/**
 * The preview of a damper change: zeta = c / (2*sqrt(k*m)) (Rao, Mechanical Vibrations; Ogata,
 * Modern Control Engineering, ch. 5) and the load-step overshoot exp(-pi*zeta/sqrt(1-zeta^2))
 * (Ogata ch. 5). The example is worked by hand below; its inputs are invented round numbers.
 */
import { dampingChangeEffect } from '@shared/damping';
import { computeOvershoot } from '@shared/sizing';
import type { DamperAdjuster } from '@shared/types/damping';

function adjuster(dampingPerStepNsPerM: number | null, unit: DamperAdjuster['unit'] = 'clicks'): DamperAdjuster {
  return { kind: 'rebound', unit, maxPosition: 20, standard: null, position: 10, dampingPerStepNsPerM };
}

// k = 20 N/mm at the wheel = 20,000 N/m, m = 100 kg: critical damping 2*sqrt(2e6) = 2828.427 N s/m.
// zeta 0.3 -> c = 848.528 N s/m.
const BASE = { springRateAtWheelNPerM: 20000, sprungMassKg: 100, zetaNow: 0.3 };

describe('dampingChangeEffect', () => {
  it('two clicks in at 100 N s/m per click: c 848.528 -> 1048.528, zeta 0.370711', () => {
    const effect = dampingChangeEffect({ ...BASE, adjuster: adjuster(100), delta: -2 });
    expect(effect.direction).toBe('more');
    expect(effect.zetaAfter).toBeCloseTo(1048.528 / 2828.427, 6); // 0.370711
    // exp(-pi*0.3/sqrt(0.91)) = 0.3723 (Ogata ch. 5 formula, worked by hand); at 0.370711: exp(-1.253965) = 0.2854.
    expect(effect.overshootNow).toBeCloseTo(0.3723, 4);
    expect(effect.overshootAfter).toBeCloseTo(0.2854, 4);
    expect(effect.overshootAfter).toBeCloseTo(computeOvershoot('load', effect.zetaAfter as number), 12);
  });

  it('three clicks out: c falls by 300 N s/m, zeta 0.193934', () => {
    const effect = dampingChangeEffect({ ...BASE, adjuster: adjuster(100), delta: 3 });
    expect(effect.direction).toBe('less');
    expect(effect.zetaAfter).toBeCloseTo(548.528 / 2828.427, 6);
    expect(effect.overshootAfter as number).toBeGreaterThan(effect.overshootNow);
  });

  it('counts quarter turns as steps: half a turn in at 50 N s/m per step is +100 N s/m', () => {
    const effect = dampingChangeEffect({ ...BASE, adjuster: adjuster(50, 'turns'), delta: -0.5 });
    expect(effect.zetaAfter).toBeCloseTo(948.528 / 2828.427, 6);
  });

  it('never below no damping at all', () => {
    expect(dampingChangeEffect({ ...BASE, adjuster: adjuster(1000), delta: 5 }).zetaAfter).toBe(0);
  });

  it('without a dyno figure: the direction only, no size', () => {
    expect(dampingChangeEffect({ ...BASE, adjuster: adjuster(null), delta: -2 })).toEqual({
      direction: 'more',
      zetaAfter: null,
      overshootNow: computeOvershoot('load', 0.3),
      overshootAfter: null,
    });
    expect(dampingChangeEffect({ ...BASE, adjuster: adjuster(null), delta: 1 }).direction).toBe('less');
  });

  it('refuses a change of nothing', () => {
    expect(() => dampingChangeEffect({ ...BASE, adjuster: adjuster(100), delta: 0 })).toThrow(RangeError);
  });
});
