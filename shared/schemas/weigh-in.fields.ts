/**
 * Typical values the weigh-in offers before the rider weighs anything: gear masses, the rear share
 * of each riding position and of each kind of load. None has a published source: all are from
 * memory, shown as such, and every one can be changed on the form.
 */

import type { GearItem, LoadKind, RidingPosition } from '../types/garage';

export const TYPICAL_VALUES_SOURCE = 'from memory';

export interface GearItemInfo {
  label: string;
  /** kg, a starting value the rider overwrites with a scale reading. */
  typicalKg: number;
  /** Most an item of this kind plausibly weighs, for the form's check. */
  maxKg: number;
  note: string;
}

export const GEAR_ITEMS_INFO: Readonly<Record<GearItem, GearItemInfo>> = {
  helmet: { label: 'Helmet', typicalKg: 1.5, maxKg: 5, note: 'Full-face about 1.4-1.7 kg, open-face less.' },
  jacket: { label: 'Jacket', typicalKg: 2.5, maxKg: 10, note: 'Textile about 2-3 kg, leather 2.5-3.5 kg, with armour.' },
  trousers: { label: 'Trousers', typicalKg: 1.5, maxKg: 8, note: 'Textile about 1-2 kg, leather about 2 kg; a one-piece suit goes under jacket.' },
  boots: { label: 'Boots (pair)', typicalKg: 2.5, maxKg: 8, note: 'Touring about 2-3 kg the pair, motocross 3-4 kg.' },
  gloves: { label: 'Gloves (pair)', typicalKg: 0.3, maxKg: 2, note: 'About 0.2-0.5 kg the pair.' },
  backProtector: { label: 'Back protector', typicalKg: 0.8, maxKg: 4, note: 'About 0.5-1.2 kg, unless built into the jacket.' },
  pack: { label: 'Backpack', typicalKg: 3, maxKg: 30, note: 'Varies most of all: weigh it packed as ridden, water and tools in.' },
  other: { label: 'Anything else worn', typicalKg: 0, maxKg: 30, note: 'A heated vest, a tool roll in a pocket: weigh it.' },
};

export interface RidingPositionInfo {
  label: string;
  /** Fraction of the rider's weight on the rear wheel. */
  rearShare: number;
  description: string;
}

/** The rider's rear share by position: upright puts more on the rear, crouched less (0.55-0.75, from memory). */
export const RIDING_POSITIONS_INFO: Readonly<Record<RidingPosition, RidingPositionInfo>> = {
  'feet-forward': { label: 'Feet forward', rearShare: 0.75, description: 'Cruiser: feet ahead of the knees, back upright or reclined.' },
  upright: { label: 'Upright', rearShare: 0.7, description: 'Tourer or adventure bike: back straight, wide bars.' },
  neutral: { label: 'Neutral', rearShare: 0.65, description: 'Naked or standard bike: slight lean forward.' },
  leaning: { label: 'Leaning forward', rearShare: 0.62, description: 'Sport-tourer: clearly leaning onto the bars.' },
  crouched: { label: 'Crouched', rearShare: 0.57, description: 'Sport or track bike: clip-ons, chest near the tank.' },
};

export interface LoadKindInfo {
  label: string;
  /** Fraction of the load's weight on the rear wheel; above 1 behind the axle, as it also unloads the front. */
  rearShare: number;
  note: string;
}

export const LOAD_KINDS_INFO: Readonly<Record<LoadKind, LoadKindInfo>> = {
  passenger: { label: 'Passenger', rearShare: 0.95, note: 'About 0.9-1.0, in full gear on the pillion.' },
  panniers: { label: 'Panniers', rearShare: 1, note: 'Side cases beside the rear wheel, about 0.9-1.05.' },
  'top-box': { label: 'Top box', rearShare: 1.2, note: 'Behind the rear axle: about 1.1-1.3.' },
  'tank-bag': { label: 'Tank bag', rearShare: 0.3, note: 'Ahead of the rider, mostly on the front: about 0.2-0.4.' },
  other: { label: 'Other luggage', rearShare: 0.95, note: 'A tail pack or a roll on the seat: about 0.9-1.0.' },
};
