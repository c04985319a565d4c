/**
 * Seed data only: the starting target profiles and engine settings, loaded once and then edited
 * by the shop's admin. None of these numbers has a published source: each is labelled common
 * practice or from memory, and the engine receives them as arguments, never importing this file.
 */

import type { TargetProfile } from '../../shared/types/sizing';

export interface EngineSettingSeed {
  key: string;
  value: number;
  unit: string;
  label: string;
  source: 'common practice' | 'from memory';
}

const PROFILE_NOTE = 'Common practice, no published source: starting values for the shop to edit.';

/** Windows in % of travel, [min, max]. Front static sag runs larger than rear static sag. */
export const targetProfileSeeds: TargetProfile[] = [
  {
    discipline: 'road',
    label: 'Road',
    front: { riderSagPct: [28, 33], staticSagPct: [15, 22] },
    rear: { riderSagPct: [28, 33], staticSagPct: [5, 12] },
    note: PROFILE_NOTE,
  },
  {
    discipline: 'track',
    label: 'Track',
    front: { riderSagPct: [25, 30], staticSagPct: [12, 20] },
    rear: { riderSagPct: [25, 30], staticSagPct: [5, 10] },
    note: `${PROFILE_NOTE} A few points less rider sag than road.`,
  },
  {
    discipline: 'touring',
    label: 'Touring',
    front: { riderSagPct: [28, 33], staticSagPct: [15, 22] },
    rear: { riderSagPct: [28, 33], staticSagPct: [5, 12] },
    note: `${PROFILE_NOTE} Road windows for the solo rider; luggage and a passenger are load cases that add preload on that spring.`,
  },
  {
    discipline: 'trail',
    label: 'Trail',
    front: { riderSagPct: [25, 32], staticSagPct: [10, 18] },
    rear: { riderSagPct: [30, 35], staticSagPct: [8, 15] },
    note: `${PROFILE_NOTE} About a third of travel for rider sag on the rear.`,
  },
  {
    discipline: 'motocross',
    label: 'Motocross',
    front: { riderSagPct: [22, 30], staticSagPct: [8, 15] },
    rear: { riderSagPct: [31, 35], staticSagPct: [8, 13] },
    note: `${PROFILE_NOTE} About a third of travel for rider sag on the rear.`,
  },
];

/** The settings the one-decision-per-end engine added; a later seed part gives them to installations made before it. */
export function decisionSettingSeeds(): EngineSettingSeed[] {
  return [
    { key: 'staticLoadMismatchPct', value: 20, unit: '%', label: 'Static load from the readings against the weighed one before a warning', source: 'common practice' },
    { key: 'marginalRatePct', value: 20, unit: '%', label: 'Fitted rate this far off the ideal makes a keep marginal', source: 'common practice' },
  ];
}

export const engineSettingSeeds: EngineSettingSeed[] = [
  { key: 'frictionSpreadMm.front', value: 10, unit: 'mm', label: 'Pushed/lifted spread that flags friction, fork', source: 'common practice' },
  { key: 'frictionSpreadMm.rear', value: 5, unit: 'mm', label: 'Pushed/lifted spread that flags friction, shock', source: 'common practice' },
  { key: 'impliedRateMismatchPct', value: 15, unit: '%', label: 'Implied against stated rate before the answer says to check first', source: 'common practice' },
  ...decisionSettingSeeds(),
  { key: 'minCaptivePreloadMm', value: 2, unit: 'mm', label: 'Least preload that keeps a spring captive (2-3 mm)', source: 'common practice' },
  { key: 'coilBindMarginMm', value: 3, unit: 'mm', label: 'Spring deflection kept clear of coil-bind at full travel', source: 'from memory' },
  { key: 'adjusterResolution.threaded', value: 0.25, unit: 'turns', label: 'Smallest collar or cap change (a quarter turn)', source: 'common practice' },
  { key: 'adjusterResolution.stepped', value: 1, unit: 'steps', label: 'Smallest cam change (a whole step)', source: 'common practice' },
  { key: 'adjusterResolution.spacer', value: 0.5, unit: 'mm', label: 'Smallest spacer change', source: 'common practice' },
  { key: 'smallStaticSagMm', value: 3, unit: 'mm', label: 'Predicted static sag below which top-out springs make it unreliable', source: 'from memory' },
  { key: 'sameRatePct', value: 2, unit: '%', label: 'Rate change small enough to leave rebound alone', source: 'from memory' },
  { key: 'luggageRearShare', value: 0.95, unit: '', label: 'Rear share of a passenger or luggage when not given (0.9-1.0; a top box 1.1-1.3)', source: 'from memory' },
  { key: 'dampingRatio', value: 0.3, unit: '', label: 'Ride damping ratio assumed for the preview (motorcycles about 0.2-0.5)', source: 'from memory' },
  { key: 'plausible.bikeKg.min', value: 80, unit: 'kg', label: 'Lightest usual wet mass', source: 'from memory' },
  { key: 'plausible.bikeKg.max', value: 450, unit: 'kg', label: 'Heaviest usual wet mass', source: 'from memory' },
  { key: 'plausible.riderBodyKg.min', value: 40, unit: 'kg', label: 'Lightest usual rider', source: 'from memory' },
  { key: 'plausible.riderBodyKg.max', value: 150, unit: 'kg', label: 'Heaviest usual rider', source: 'from memory' },
  { key: 'plausible.gearKg.min', value: 2, unit: 'kg', label: 'Least usual riding gear', source: 'from memory' },
  { key: 'plausible.gearKg.max', value: 25, unit: 'kg', label: 'Most usual riding gear', source: 'from memory' },
  { key: 'plausible.luggageKg.min', value: 0, unit: 'kg', label: 'Least luggage or passenger', source: 'from memory' },
  { key: 'plausible.luggageKg.max', value: 130, unit: 'kg', label: 'Most usual luggage or passenger', source: 'from memory' },
  { key: 'plausible.unsprungKg.min', value: 10, unit: 'kg', label: 'Least usual unsprung mass per end (10-15 kg small or off-road front)', source: 'from memory' },
  { key: 'plausible.unsprungKg.max', value: 35, unit: 'kg', label: 'Most usual unsprung mass per end (15-30 kg on road bikes)', source: 'from memory' },
  { key: 'plausible.frontShare.min', value: 0.38, unit: '', label: 'Lowest usual front weight share (cruisers 0.40)', source: 'from memory' },
  { key: 'plausible.frontShare.max', value: 0.58, unit: '', label: 'Highest usual front weight share (sport bikes 0.55)', source: 'from memory' },
  { key: 'plausible.riderRearShare.min', value: 0.5, unit: '', label: "Lowest usual rider's rear share (crouched sport 0.55)", source: 'from memory' },
  { key: 'plausible.riderRearShare.max', value: 0.8, unit: '', label: "Highest usual rider's rear share (upright tourer 0.75)", source: 'from memory' },
];
