/**
 * The symptom-to-change table as the rules screen shows it: one group per symptom and end, in the
 * order the rider's list names the symptoms (fork before shock), each group's rows in the order
 * the loop tries them. The server lists symptoms by key; the screen follows the rider's words.
 */
import { SYMPTOMS } from '@shared/damping/symptoms';
import type { DampingDirection, RuleSource, SymptomKey } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import type { DampingRuleView } from '@shared/types/test-ride';

export interface OrderedRule {
  rule: DampingRuleView;
  /** 1 for the row tried first; null for a row switched off, which the loop never tries. */
  tried: number | null;
}

export interface RuleGroup {
  /** `${symptom}:${end}`, unique on the screen. */
  key: string;
  symptom: SymptomKey;
  symptomWords: string;
  end: EndKind;
  rows: OrderedRule[];
}

const END_ORDER: readonly EndKind[] = ['front', 'rear'];

export const END_WORDS: Record<EndKind, string> = { front: 'Front (fork)', rear: 'Rear (shock)' };

const DIRECTION_WORDS: Record<DampingDirection, string> = {
  more: 'more damping (turn in)',
  less: 'less damping (turn out)',
};

const SOURCE_WORDS: Record<RuleSource, string> = {
  'common-practice': 'common practice',
  shop: 'added by the shop',
};

/** Which way the row turns its adjuster, in the words the rules screen uses. */
export function directionWords(direction: DampingDirection): string {
  return DIRECTION_WORDS[direction];
}

export function sourceWords(source: RuleSource): string {
  return SOURCE_WORDS[source];
}

/** The loop's own order (`activeRules` on the server): lowest priority first, the older row on a tie. */
function byTrialOrder(a: DampingRuleView, b: DampingRuleView): number {
  return a.priority - b.priority || a.id - b.id;
}

/** Rows of a symptom the screen does not know (none today) sort after the known ones. */
function symptomRank(symptom: SymptomKey): number {
  const index = SYMPTOMS.findIndex((known) => known.key === symptom);
  return index === -1 ? SYMPTOMS.length : index;
}

/**
 * Groups in the rider's order of symptoms, front before rear; within a group the active rows in
 * the order they are tried, numbered from 1, then the rows switched off in the same order.
 */
export function groupRules(rules: readonly DampingRuleView[]): RuleGroup[] {
  const groups = new Map<string, RuleGroup>();
  for (const rule of rules) {
    const key = `${rule.symptom}:${rule.end}`;
    let group = groups.get(key);
    if (!group) {
      group = { key, symptom: rule.symptom, symptomWords: rule.symptomWords, end: rule.end, rows: [] };
      groups.set(key, group);
    }
    group.rows.push({ rule, tried: null });
  }
  const ordered = [...groups.values()].sort(
    (a, b) => symptomRank(a.symptom) - symptomRank(b.symptom) || END_ORDER.indexOf(a.end) - END_ORDER.indexOf(b.end),
  );
  for (const group of ordered) {
    const active = group.rows.filter((row) => row.rule.active).sort((a, b) => byTrialOrder(a.rule, b.rule));
    const off = group.rows.filter((row) => !row.rule.active).sort((a, b) => byTrialOrder(a.rule, b.rule));
    group.rows = [...active.map((row, index) => ({ ...row, tried: index + 1 })), ...off];
  }
  return ordered;
}
