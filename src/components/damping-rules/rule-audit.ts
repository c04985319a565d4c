/**
 * What an audited write of the symptom-to-change table did, in the rules screen's words: the row
 * a create added, or one line per field an edit changed ("Priority: 1 → 3"). The audit keeps the
 * row as the server stored it (`toAuditShape` in damping-rules.service.ts).
 */
import { damperLabel, SYMPTOMS } from '@shared/damping/symptoms';
import type { DamperKind, DampingRule } from '@shared/types/damping';

import { directionWords, END_WORDS, sourceWords } from './rule-groups';

/** The symptom's words, or its key should a later version have renamed it. */
function symptomWords(key: string): string {
  return SYMPTOMS.find((symptom) => symptom.key === key)?.words ?? key;
}

const quoted = (text: string) => `“${text}”`;

/** Each field an admin can change, as the rules screen names it, with its value in words. */
function fieldWords(kinds: readonly DamperKind[]): { [K in keyof DampingRule]?: { label: string; show: (value: DampingRule[K]) => string } } {
  return {
    symptom: { label: 'Symptom', show: symptomWords },
    end: { label: 'End', show: (end) => END_WORDS[end] },
    adjuster: { label: 'Adjuster', show: (kind) => damperLabel(kind, kinds) },
    direction: { label: 'Direction', show: directionWords },
    priority: { label: 'Priority', show: String },
    why: { label: 'Why', show: quoted },
    feelFor: { label: 'What to feel for', show: quoted },
    claim: { label: 'Claim', show: (claim) => claim ?? 'none' },
    active: { label: 'Active', show: (active) => (active ? 'yes, tried' : 'no, switched off') },
  };
}

/** The lines under a damping-rule entry on the audit screen. */
export function describeRuleAudit(before: unknown, after: unknown, kinds: readonly DamperKind[]): string[] {
  const old = before as DampingRule | null;
  const now = after as DampingRule | null;
  if (!now) return [];
  const where = `${symptomWords(now.symptom)}, ${END_WORDS[now.end].toLowerCase()}`;
  if (!old) {
    return [`${where}: ${damperLabel(now.adjuster, kinds)}, ${directionWords(now.direction)}`, `Priority ${now.priority} · ${sourceWords(now.source)}`];
  }
  const fields = fieldWords(kinds);
  const changes = (Object.keys(fields) as (keyof DampingRule)[]).flatMap((key) => {
    const show = fields[key]!.show as (value: unknown) => string;
    const [from, to] = [show(old[key]), show(now[key])];
    return from === to ? [] : [`${fields[key]!.label}: ${from} → ${to}`];
  });
  return [where, ...changes];
}
