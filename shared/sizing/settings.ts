/**
 * The engine's settings are stored flat (one key, one number), so the admin edits each on its own.
 * This maps the stored rows onto the structure the engine takes.
 */

import type { WarningThresholds, Window } from '../types/sizing';

export interface EngineSettingValue {
  key: string;
  value: number;
}

const PLAUSIBLE_KEYS = [
  'bikeKg',
  'riderBodyKg',
  'gearKg',
  'luggageKg',
  'unsprungKg',
  'frontShare',
  'riderRearShare',
] as const;

export const SETTING_KEYS: readonly string[] = [
  'frictionSpreadMm.front',
  'frictionSpreadMm.rear',
  'impliedRateMismatchPct',
  'staticLoadMismatchPct',
  'marginalRatePct',
  'minCaptivePreloadMm',
  'coilBindMarginMm',
  'adjusterResolution.threaded',
  'adjusterResolution.stepped',
  'adjusterResolution.spacer',
  'smallStaticSagMm',
  'sameRatePct',
  'luggageRearShare',
  'dampingRatio',
  ...PLAUSIBLE_KEYS.flatMap((k) => [`plausible.${k}.min`, `plausible.${k}.max`]),
];

/** Throws, naming every missing key, when the stored settings are incomplete. */
export function buildWarningThresholds(settings: readonly EngineSettingValue[]): WarningThresholds {
  const byKey = new Map(settings.map((s) => [s.key, s.value]));
  const missing = SETTING_KEYS.filter((k) => !Number.isFinite(byKey.get(k)));
  if (missing.length > 0) throw new Error(`Sizing settings missing: ${missing.join(', ')}`);
  const read = (key: string): number => byKey.get(key) as number;
  const window = (name: string): Window => [read(`plausible.${name}.min`), read(`plausible.${name}.max`)];
  return {
    frictionSpreadMm: { front: read('frictionSpreadMm.front'), rear: read('frictionSpreadMm.rear') },
    impliedRateMismatchPct: read('impliedRateMismatchPct'),
    staticLoadMismatchPct: read('staticLoadMismatchPct'),
    marginalRatePct: read('marginalRatePct'),
    minCaptivePreloadMm: read('minCaptivePreloadMm'),
    coilBindMarginMm: read('coilBindMarginMm'),
    adjusterResolution: {
      threaded: read('adjusterResolution.threaded'),
      stepped: read('adjusterResolution.stepped'),
      spacer: read('adjusterResolution.spacer'),
    },
    smallStaticSagMm: read('smallStaticSagMm'),
    sameRatePct: read('sameRatePct'),
    luggageRearShare: read('luggageRearShare'),
    dampingRatio: read('dampingRatio'),
    plausible: {
      bikeKg: window('bikeKg'),
      riderBodyKg: window('riderBodyKg'),
      gearKg: window('gearKg'),
      luggageKg: window('luggageKg'),
      unsprungKg: window('unsprungKg'),
      frontShare: window('frontShare'),
      riderRearShare: window('riderRearShare'),
    },
  };
}
