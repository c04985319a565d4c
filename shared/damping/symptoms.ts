/**
 * What a rider can report after a test ride, in plain words, and the names of damping adjusters.
 * `springFirst` marks the feelings a spring too soft or preload out of place gives as well: the
 * loop looks at the end's sizing before it proposes a damper change for them (common practice, no
 * source).
 */

import type { DamperKind, Symptom, SymptomKey } from '../types/damping';
import type { EndKind } from '../types/sizing';
import { damperName } from '../setup/damper-words';

export const SYMPTOMS: readonly Symptom[] = [
  {
    key: 'dives-braking',
    words: 'Dives hard under braking',
    situation: 'The front drops fast and deep as soon as you brake, and the bike pitches forward.',
    ends: ['front'],
    springFirst: true,
  },
  {
    key: 'bounces-after-bump',
    words: 'Keeps bouncing after a bump',
    situation: 'After a single bump or a dip the end goes up and down more than once before it settles.',
    ends: ['front', 'rear'],
    springFirst: false,
  },
  {
    key: 'harsh-small-bumps',
    words: 'Harsh over small sharp bumps',
    situation: 'Small sharp edges (cracks, road studs, patched tarmac) come through as knocks in the bars or the seat.',
    ends: ['front', 'rear'],
    springFirst: false,
  },
  {
    key: 'wallows-long-corners',
    words: 'Vague or wallowing in long corners',
    situation: 'Through a long, fast bend the bike feels loose and keeps moving on its suspension instead of holding its line.',
    ends: ['front', 'rear'],
    springFirst: false,
  },
  {
    key: 'sinks-repeated-bumps',
    words: 'Sinks lower over repeated bumps (packs down)',
    situation: 'Over a run of bumps close together the end rides lower with each one and feels hard by the last.',
    ends: ['front', 'rear'],
    springFirst: false,
  },
  {
    key: 'bottoms-big-hits',
    words: 'Bottoms hard on big hits',
    situation: 'A big bump, a pothole or a landing uses all the travel and ends in a clunk.',
    ends: ['front', 'rear'],
    springFirst: true,
  },
  {
    key: 'kicks-after-dip',
    words: 'Kicks back or tops out after a dip',
    situation: 'Coming out of a dip or off a bump the end springs back up fast, lifting or kicking.',
    ends: ['front', 'rear'],
    springFirst: false,
  },
  {
    key: 'runs-wide-throttle',
    words: 'Runs wide on the throttle',
    situation: 'Opening the throttle out of a corner, the rear sits down and the bike drifts out of its line.',
    ends: ['rear'],
    springFirst: true,
  },
  {
    key: 'chatters-corners',
    words: 'Chatters in corners',
    situation: 'Leaned over on a rippled surface the tyre hops and judders instead of tracking the road.',
    ends: ['front', 'rear'],
    springFirst: false,
  },
  {
    key: 'squats-throttle',
    words: 'Squats under power',
    situation: 'The rear drops noticeably when you open the throttle hard.',
    ends: ['rear'],
    springFirst: true,
  },
];

const BY_KEY = new Map(SYMPTOMS.map((symptom) => [symptom.key, symptom]));

export function symptomOf(key: SymptomKey): Symptom {
  const symptom = BY_KEY.get(key);
  if (!symptom) throw new RangeError(`No symptom ${key}.`);
  return symptom;
}

/** The six kinds of the trade, as their migration seeds them; the fallback when the shop's list is not at hand. */
export const DAMPER_KIND_LABELS: Readonly<Record<string, string>> = {
  rebound: 'Rebound',
  compression: 'Compression',
  'hs-compression': 'High-speed compression',
  'ls-compression': 'Low-speed compression',
  'hs-rebound': 'High-speed rebound',
  'ls-rebound': 'Low-speed rebound',
};

/** An adjuster's label: from the shop's list, else the trade's, else its key in words ("mid-valve" -> "Mid valve"). */
export function damperLabel(kind: string, kinds?: readonly DamperKind[]): string {
  const label = kinds?.find((known) => known.key === kind)?.label ?? DAMPER_KIND_LABELS[kind];
  if (label) return label;
  const words = kind.replace(/-/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

const END_NAME: Record<EndKind, string> = { front: 'Front', rear: 'Rear' };

/** The adjuster's name inside a sentence: "high-speed compression", an acronym such as "HSC" kept. */
export function describeAdjuster(kind: string, kinds?: readonly DamperKind[]): string {
  return damperName(kind, { [kind]: damperLabel(kind, kinds) });
}

/** The start of an instruction: "Front rebound", "Rear HSC". */
export function describeAdjusterAt(end: EndKind, kind: string, kinds?: readonly DamperKind[]): string {
  return `${END_NAME[end]} ${describeAdjuster(kind, kinds)}`;
}
