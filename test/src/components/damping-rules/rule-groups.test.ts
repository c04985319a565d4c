/**
 * The rules screen's grouping and order: symptoms in the rider's order (shared/damping/symptoms.ts),
 * fork before shock, each group's rows in the order the loop tries them (priority, then the older
 * row, as `activeRules` in server/services/damping-rules.service.ts), rows switched off last and
 * unnumbered. Rows from the common-practice seed and invented shop rows (./fixtures.ts).
 */
import { directionWords, groupRules, sourceWords } from '@/components/damping-rules/rule-groups';
import { SYMPTOMS } from '@shared/damping';

import { SEEDED, SHOP_ROWS, serverOrder } from './fixtures';

describe('groupRules', () => {
  const groups = groupRules(serverOrder([...SEEDED, ...SHOP_ROWS]));

  it('puts the groups in the rider’s order of symptoms, fork before shock, whatever order the server sends', () => {
    const expected = SYMPTOMS.flatMap((symptom) => (['front', 'rear'] as const).filter((end) => symptom.ends.includes(end)).map((end) => `${symptom.key}:${end}`));
    expect(groups.map((group) => group.key)).toEqual(expected);
    // The server's first row is "bottoms-big-hits"; the rider's list starts with braking dive.
    expect(groups[0]).toMatchObject({ symptom: 'dives-braking', end: 'front', symptomWords: 'Dives hard under braking' });
  });

  it('numbers the active rows in the order tried, a tie in priority going to the older row, and puts rows switched off last', () => {
    const bounce = groups.find((group) => group.key === 'bounces-after-bump:front')!;
    expect(bounce.rows.map(({ rule, tried }) => [rule.id, rule.adjuster, tried])).toEqual([
      // Seeded row 3 (rebound, priority 1) is older than shop row 101 (priority 1).
      [3, 'rebound', 1],
      [101, 'hs-rebound', 2],
      [4, 'ls-rebound', 3],
      [102, 'compression', null],
    ]);
  });

  it('keeps every row exactly once', () => {
    const ids = groups.flatMap((group) => group.rows.map((row) => row.rule.id));
    expect(ids).toHaveLength(SEEDED.length + SHOP_ROWS.length);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('says the direction and the source in words', () => {
    expect(directionWords('more')).toBe('more damping (turn in)');
    expect(directionWords('less')).toBe('less damping (turn out)');
    expect(sourceWords('common-practice')).toBe('common practice');
    expect(sourceWords('shop')).toBe('added by the shop');
  });
});
