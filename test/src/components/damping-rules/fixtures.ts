/**
 * Rows of the symptom-to-change table as GET /api/damping-rules answers them. The seeded rows and
 * their words are the common-practice seed (shared/damping/seeded-rules.ts, common practice, no
 * source); the shop's rows and their texts are invented.
 */
import { SEEDED_DAMPING_RULES, symptomOf } from '@shared/damping';
import type { DampingRule } from '@shared/types/damping';
import type { DampingRuleView } from '@shared/types/test-ride';

export const KINDS = [
  { key: 'rebound', label: 'Rebound', circuit: 'rebound', speed: 'all' },
  { key: 'compression', label: 'Compression', circuit: 'compression', speed: 'all' },
  { key: 'hs-compression', label: 'High-speed compression', circuit: 'compression', speed: 'high' },
  { key: 'ls-compression', label: 'Low-speed compression', circuit: 'compression', speed: 'low' },
  { key: 'hs-rebound', label: 'High-speed rebound', circuit: 'rebound', speed: 'high' },
  { key: 'ls-rebound', label: 'Low-speed rebound', circuit: 'rebound', speed: 'low' },
] as const;

export function ruleView(rule: Omit<DampingRule, 'id'> & { id: number }): DampingRuleView {
  return {
    ...rule,
    symptomWords: symptomOf(rule.symptom).words,
    adjusterLabel: KINDS.find((kind) => kind.key === rule.adjuster)?.label ?? rule.adjuster,
    createdById: rule.source === 'shop' ? 2 : null,
    createdAt: '2026-12-01T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
  };
}

/** The seed as stored, ids in seed order. */
export const SEEDED: DampingRuleView[] = SEEDED_DAMPING_RULES.map((rule, index) => ruleView({ ...rule, id: index + 1 }));

/**
 * The seed plus two rows of the shop's own at "Keeps bouncing after a bump", front: an active one
 * tried between the seeded 1 and 2, and one switched off at priority 1.
 */
export const SHOP_ROWS: DampingRuleView[] = [
  ruleView({
    id: 101,
    symptom: 'bounces-after-bump',
    end: 'front',
    adjuster: 'hs-rebound',
    direction: 'more',
    priority: 1,
    why: 'Our forks settle best with a touch more high-speed rebound first.',
    feelFor: 'One movement after a pothole, no second dip.',
    claim: null,
    source: 'shop',
    active: true,
  }),
  ruleView({
    id: 102,
    symptom: 'bounces-after-bump',
    end: 'front',
    adjuster: 'compression',
    direction: 'less',
    priority: 1,
    why: 'Tried on the workshop fork, did not help.',
    feelFor: 'Less pitching after the bump.',
    claim: null,
    source: 'shop',
    active: false,
  }),
];

/** As the server sorts them: symptom key, end, priority, id. */
export function serverOrder(rules: readonly DampingRuleView[]): DampingRuleView[] {
  return [...rules].sort(
    (a, b) => a.symptom.localeCompare(b.symptom) || a.end.localeCompare(b.end) || a.priority - b.priority || a.id - b.id,
  );
}
