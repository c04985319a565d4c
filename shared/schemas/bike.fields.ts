/**
 * Every value of a bike (and of a shop's bike model) with its label, its quantity (which decides the
 * unit it is shown in), its range in SI and a one-line help text saying where to find it or how to
 * measure it. The bike schema reads its ranges from here, so the form and the checks cannot drift.
 * Keyed by the field's path in the bike's JSON, e.g. 'front.adjuster.mmPerUnit'. The damping
 * adjusters are a list per end (`front.dampers[1].position`): their fields are DAMPER_FIELDS.
 */

import type { DamperAdjuster, DamperUnit } from '../types/damping';
import type { EndKind } from '../types/sizing';
import type { NumberRange } from './number-field';

/**
 * How a value is shown: 'length' in mm or in, 'mass' in kg or lb, 'rate' in N/mm, kgf/mm or lbf/in,
 * 'force' in N or lbf; 'adjuster' in the preload adjuster's own unit (turns, steps or spacer mm);
 * 'share' as a fraction; 'angle' in degrees; 'count', 'text', 'choice' and 'points' as they are.
 */
export type FieldQuantity = 'length' | 'mass' | 'rate' | 'force' | 'adjuster' | 'share' | 'angle' | 'count' | 'text' | 'choice' | 'points';

export interface BikeFieldInfo {
  label: string;
  quantity: FieldQuantity;
  /** The unit the API stores it in ('' for plain numbers and text). */
  siUnit: string;
  /** Numbers only; always in siUnit. */
  range?: NumberRange;
  help: string;
}

const POSITION_RANGE: NumberRange = { min: -1000, max: 1000 };

const massFields: Record<string, BikeFieldInfo> = {
  'masses.massKg': {
    label: 'Bike wet mass',
    quantity: 'mass',
    siUnit: 'kg',
    range: { min: 30, max: 700 },
    help: 'As ridden, with fuel, oil and everything fitted: weigh each wheel on a scale and add the two, or take the manual’s wet mass.',
  },
  'masses.frontShare': {
    label: 'Front weight share',
    quantity: 'share',
    siUnit: '',
    range: { min: 0, max: 1 },
    help: 'The front wheel’s scale reading over the total, bike upright and no rider, e.g. 0.50 (cruisers about 0.40, sport bikes about 0.55).',
  },
  'masses.unsprungFrontKg': {
    label: 'Unsprung front mass',
    quantity: 'mass',
    siUnit: 'kg',
    range: { min: 0, max: 150 },
    help: 'What moves with the front wheel: wheel, tyre, discs, calipers and fork lowers; about 15-30 kg on road bikes, 10-15 kg on small or off-road bikes (from memory).',
  },
  'masses.unsprungRearKg': {
    label: 'Unsprung rear mass',
    quantity: 'mass',
    siUnit: 'kg',
    range: { min: 0, max: 150 },
    help: 'Wheel, tyre, brake and sprocket, plus the swingarm’s mass times the distance of its centre of mass from the pivot over the pivot-to-axle length.',
  },
};

function endLabel(end: EndKind): string {
  return end === 'front' ? 'Fork' : 'Shock';
}

function springAndAdjusterFields(end: EndKind): Record<string, BikeFieldInfo> {
  const part = endLabel(end);
  const where = end === 'front' ? 'fork cap' : 'shock collar';
  return {
    [`${end}.rateNmm`]: {
      label: `${part} spring rate`,
      quantity: 'rate',
      siUnit: 'N/mm',
      range: { min: 0, max: end === 'front' ? 50 : 500, aboveMin: true },
      help: 'Printed on the spring or stated in its paperwork; 1 kgf/mm is 9.81 N/mm.',
    },
    [`${end}.secondRateNmm`]: {
      label: 'Second rate',
      quantity: 'rate',
      siUnit: 'N/mm',
      range: { min: 0, max: 500, aboveMin: true },
      help: 'Dual-rate springs only: the rate above the break point, from the spring’s paperwork; leave empty for a single-rate spring.',
    },
    [`${end}.breakMm`]: {
      label: 'Break point',
      quantity: 'length',
      siUnit: 'mm',
      range: { min: 0, max: 500, aboveMin: true },
      help: 'Dual-rate springs only: the spring compression at which the second rate starts; leave empty for a single-rate spring.',
    },
    [`${end}.preloadMm`]: {
      label: `${part} preload`,
      quantity: 'length',
      siUnit: 'mm',
      range: { min: 0, max: 100 },
      help: 'How far the spring is compressed with the end fully extended: its free length minus its fitted length.',
    },
    [`${end}.family`]: {
      label: 'Spring family',
      quantity: 'text',
      siUnit: '',
      help:
        end === 'front'
          ? 'The fork spring’s size, outer diameter x length in mm, e.g. F43x290, so the shop’s catalogue can match it.'
          : 'The shock spring’s size, inner diameter x free length in mm, e.g. S56x150, so the shop’s catalogue can match it.',
    },
    [`${end}.adjuster.kind`]: {
      label: 'Preload adjuster',
      quantity: 'choice',
      siUnit: '',
      help: 'Threaded collar or cap (counted in turns), stepped cam (in steps), or a spacer under the fork cap (in mm).',
    },
    [`${end}.adjuster.mmPerUnit`]: {
      label: 'Preload per adjuster unit',
      quantity: 'length',
      siUnit: 'mm',
      range: { min: 0, max: 50, aboveMin: true },
      help: 'The thread pitch in mm per turn (1.0-1.5 mm on most shock collars; the manual states it), the mm per cam step, or 1 for a spacer.',
    },
    [`${end}.adjuster.position`]: {
      label: 'Adjuster setting',
      quantity: 'adjuster',
      siUnit: '',
      range: POSITION_RANGE,
      help: `The current setting of the ${where}, counted from its zero (below) in turns, steps or spacer mm.`,
    },
    [`${end}.adjuster.minPosition`]: {
      label: 'Adjuster minimum',
      quantity: 'adjuster',
      siUnit: '',
      range: POSITION_RANGE,
      help: 'The lowest setting it reaches, counted from its zero; 0 unless the count starts part way along.',
    },
    [`${end}.adjuster.maxPosition`]: {
      label: 'Adjuster maximum',
      quantity: 'adjuster',
      siUnit: '',
      range: POSITION_RANGE,
      help: 'The highest setting it reaches: count the turns or steps from the zero to the end stop, or take it from the manual.',
    },
    [`${end}.adjuster.zeroReference`]: {
      label: 'Adjuster zero',
      quantity: 'text',
      siUnit: '',
      help: 'Where the count starts, in words: “cap fully out”, “collar backed off to the top of the thread”, “stock spacer”.',
    },
    [`${end}.adjuster.addsPreload`]: {
      label: 'Adds preload',
      quantity: 'choice',
      siUnit: '',
      help: 'Which way adds preload, seen from where you work the adjuster: clockwise or counter-clockwise; for a spacer, a longer spacer.',
    },
  };
}

const frontFields: Record<string, BikeFieldInfo> = {
  'front.travelMm': {
    label: 'Fork travel',
    quantity: 'length',
    siUnit: 'mm',
    range: { min: 30, max: 350 },
    help: 'Travel along the fork axis, from the manual; or the stanchion showing at full extension less what shows at full compression.',
  },
  'front.springCount': {
    label: 'Sprung legs',
    quantity: 'count',
    siUnit: '',
    range: { min: 1, max: 2, integer: true },
    help: 'Fork legs that hold a spring: 2 on most forks, 1 where one leg springs and the other only damps.',
  },
  'front.rakeDeg': {
    label: 'Rake',
    quantity: 'angle',
    siUnit: 'deg',
    range: { min: 0, max: 45 },
    help: 'The fork’s angle from vertical, from the manual’s specifications (often 23-30 degrees on road bikes).',
  },
  ...springAndAdjusterFields('front'),
};

const rearFields: Record<string, BikeFieldInfo> = {
  'rear.wheelTravelMm': {
    label: 'Rear wheel travel',
    quantity: 'length',
    siUnit: 'mm',
    range: { min: 30, max: 400 },
    help: 'Vertical travel of the rear axle, from the manual.',
  },
  'rear.shockStrokeMm': {
    label: 'Shock stroke',
    quantity: 'length',
    siUnit: 'mm',
    range: { min: 10, max: 200 },
    help: 'The shock’s travel from full extension to its bump stop: eye-to-eye length extended less fully compressed, from the manual.',
  },
  'rear.gasForceN': {
    label: 'Gas force',
    quantity: 'force',
    siUnit: 'N',
    range: { min: 0, max: 2000 },
    help: 'Gas pressure times rod area, about 150-300 N on a gas-charged shock (from memory); leave empty if unknown.',
  },
  'rear.linkage': {
    label: 'Linkage curve',
    quantity: 'points',
    siUnit: 'mm',
    help: 'Linkage bikes only: points of [wheel travel, shock compression] in mm from [0, 0] to [wheel travel, stroke], both increasing; measured with the spring off.',
  },
  ...springAndAdjusterFields('rear'),
};

export const BIKE_FIELDS: Readonly<Record<string, BikeFieldInfo>> = { ...massFields, ...frontFields, ...rearFields };

/** How far out fully open may be: no damper has more clicks than this, or more turns (common practice, no source). */
export const DAMPER_MAX_OPEN: Readonly<Record<DamperUnit, number>> = { clicks: 100, turns: 20 };

/** N s/m per step; a figure above this is a slip of the keyboard, not a dyno sheet's (common practice, no source). */
export const DAMPING_PER_STEP_RANGE: NumberRange = { min: 0, max: 100_000, aboveMin: true };

/** An end has a handful of damping adjusters at most; the bound keeps a stored bike small. */
export const MAX_DAMPERS_PER_END = 12;

/**
 * The values of one damping adjuster, `<end>.dampers[i].<field>`. Settings count out from fully
 * closed in the adjuster's own unit, clicks or turns.
 */
export const DAMPER_FIELDS: Readonly<Record<keyof DamperAdjuster, { label: string; help: string }>> = {
  kind: { label: 'Adjuster', help: 'What it adjusts, from the shop’s list of adjuster kinds.' },
  unit: { label: 'Counted in', help: 'Clicks, or turns for an adjuster without detents (set in quarter turns).' },
  maxPosition: {
    label: 'Fully open',
    help: 'Out from fully closed to the other stop, from the manual or counted once: turn it gently in (clockwise on most) to the stop, then out to the end.',
  },
  standard: { label: 'Maker’s standard', help: 'The standard setting the service manual gives, out from fully closed; leave empty if not known.' },
  position: {
    label: 'Set now',
    help: 'Where it is now, out from fully closed: turn it gently in to the stop, counting, then back out as many.',
  },
  dampingPerStepNsPerM: {
    label: 'Damping per step',
    help: 'From a dyno sheet of this damper only: how much the damping at the wheel falls per step out. Leave empty otherwise.',
  },
};

/** The field's info; throws for a path that is not a bike field, so a typo fails at once. */
export function bikeField(path: string): BikeFieldInfo {
  const info = BIKE_FIELDS[path];
  if (!info) throw new Error(`No bike field ${path}`);
  return info;
}
