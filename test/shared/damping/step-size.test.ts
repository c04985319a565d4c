/**
 * The first-step rule of step-size.ts (common practice, no source): base = min(2, floor(range/6))
 * steps, at least 1; slight 1 step, clear the base, strong twice the base but at most a quarter of
 * the range (never less than the base). Expected values worked by hand from that rule.
 */
import { firstStep, STEP_RULE_TEXT } from '@shared/damping';
import type { DamperUnit, SymptomStrength } from '@shared/types/damping';

describe('firstStep', () => {
  it.each([
    // range in steps, floor(R/6) -> base, floor(R/4) -> cap on strong
    ['clicks', 4, 1, 1, 1], // floor(4/6) = 0 -> base 1; strong min(2, floor(1)) = 1
    ['clicks', 8, 1, 1, 2], // floor(8/6) = 1; strong min(2, 2) = 2
    ['clicks', 12, 1, 2, 3], // floor(12/6) = 2; strong min(4, 3) = 3
    ['clicks', 24, 1, 2, 4], // base 2; strong min(4, 6) = 4
    ['clicks', 40, 1, 2, 4], // base 2; strong min(4, 10) = 4
    // 3 turns = 12 quarter turns: base 2 (a half turn), strong 3 quarter turns.
    ['turns', 3, 0.25, 0.5, 0.75],
  ] as const)('%s, range %d: slight %d, clear %d, strong %d', (unit: DamperUnit, maxPosition, slight, clear, strong) => {
    const expected: Record<SymptomStrength, number> = { slight, clear, strong };
    for (const strength of ['slight', 'clear', 'strong'] as const) {
      expect(firstStep({ unit, maxPosition }, strength)).toBe(expected[strength]);
    }
  });

  it('is at least one step even on a range too short to divide', () => {
    expect(firstStep({ unit: 'clicks', maxPosition: 1 }, 'strong')).toBe(1);
    expect(firstStep({ unit: 'turns', maxPosition: 0.5 }, 'clear')).toBe(0.25);
  });

  it('states the rule in words the UI can quote', () => {
    expect(STEP_RULE_TEXT).toMatch(/sixth of the adjuster’s range/);
    expect(STEP_RULE_TEXT).toMatch(/quarter of the range/);
  });
});
