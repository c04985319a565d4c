/**
 * Damping adjusters in words: an adjuster's name inside a sentence ("Front rebound: ...") and an
 * amount in its unit ("2 clicks", "0.75 turns").
 */

import { unitWord } from '../damping/adjuster-range';
import { formatNumber } from '../sizing/format';
import type { DamperKind, DamperUnit } from '../types/damping';

/** Kind key -> label, from the shop's list of adjuster kinds. */
export type DamperLabels = Readonly<Record<string, string>>;

export function labelsOf(kinds: readonly Pick<DamperKind, 'key' | 'label'>[]): DamperLabels {
  return Object.fromEntries(kinds.map((kind) => [kind.key, kind.label]));
}

/**
 * The adjuster's name in lower case for the middle of a sentence: its label where known ("High-speed
 * compression" -> "high-speed compression", an acronym such as "HSC" kept), else its key in words.
 */
export function damperName(kind: string, labels: DamperLabels = {}): string {
  const label = labels[kind];
  if (!label) return kind.replace(/-/g, ' ');
  return /^[A-Z]{2}/.test(label) ? label : label.charAt(0).toLowerCase() + label.slice(1);
}

/** Quarter turns need two decimals: "1.25 turns". */
export function damperAmount(unit: DamperUnit, amount: number): string {
  return `${formatNumber(amount, 2)} ${unitWord(unit, amount)}`;
}
