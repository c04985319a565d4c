/**
 * The admin's shop data editors: a target profile (PUT /api/target-profiles/:discipline), the
 * engine's settings (PATCH /api/engine-settings, each key with its own range), the audit list's query.
 */

import { mixed, number, object, string, tuple, type TestContext } from 'yup';
import { SETTING_KEYS } from '../sizing/settings';
import { parseUserNumber } from '../units/parse-number';
import { describeRange, numberField, type NumberRange } from './number-field';

function windowSchema(label: string) {
  return tuple([numberField(`${label} from`, { min: 0, max: 100 }, '%'), numberField(`${label} to`, { min: 0, max: 100 }, '%')])
    .required(`The ${label.toLowerCase()} window is missing.`)
    .typeError(`The ${label.toLowerCase()} window must be two numbers, from and to, in % of travel.`)
    .test('ordered', function (window) {
      if (!window || !(window[0] >= window[1])) return true;
      return this.createError({ path: `${this.path}[1]`, message: `${label} must end above where it starts.` });
    });
}

function checkRiderAboveStatic(context: TestContext, end: { riderSagPct?: unknown; staticSagPct?: unknown }) {
  const rider = end.riderSagPct as [number, number] | undefined;
  const stat = end.staticSagPct as [number, number] | undefined;
  if (!Array.isArray(rider) || !Array.isArray(stat) || !(rider[0] < stat[1])) return true;
  return context.createError({
    path: `${context.path}.riderSagPct[0]`,
    message: 'The rider sag window must sit above the static sag window: start it at or above where static sag ends.',
  });
}

function endWindowsSchema(part: string) {
  return object({ riderSagPct: windowSchema('Rider sag'), staticSagPct: windowSchema('Static sag') })
    .default(undefined)
    .required(`The ${part} windows are missing.`)
    .test('rider-above-static', function (end) {
      return end ? checkRiderAboveStatic(this, end) : true;
    });
}

/** The same shape GET /api/target-profiles lists, less the discipline, which the URL names. */
export const targetProfileUpdateSchema = object({
  label: string().trim().required('Give the profile a label.').max(40, 'Keep the label to 40 characters.'),
  note: string().trim().max(500, 'Keep the note to 500 characters.').default(''),
  front: endWindowsSchema('front'),
  rear: endWindowsSchema('rear'),
}).typeError('Send the profile as { label, note, front, rear }.');

/** The range each engine setting may take, in its stored unit. */
export const ENGINE_SETTING_RANGES: Readonly<Record<string, NumberRange>> = {
  'frictionSpreadMm.front': { min: 0, max: 100, aboveMin: true },
  'frictionSpreadMm.rear': { min: 0, max: 100, aboveMin: true },
  impliedRateMismatchPct: { min: 0, max: 100, aboveMin: true },
  staticLoadMismatchPct: { min: 0, max: 100, aboveMin: true },
  marginalRatePct: { min: 0, max: 100, aboveMin: true },
  minCaptivePreloadMm: { min: 0, max: 20 },
  coilBindMarginMm: { min: 0, max: 30 },
  'adjusterResolution.threaded': { min: 0, max: 5, aboveMin: true },
  'adjusterResolution.stepped': { min: 1, max: 10, integer: true },
  'adjusterResolution.spacer': { min: 0, max: 10, aboveMin: true },
  smallStaticSagMm: { min: 0, max: 50 },
  sameRatePct: { min: 0, max: 50 },
  luggageRearShare: { min: 0, max: 1.5 },
  dampingRatio: { min: 0, max: 3, aboveMin: true },
  'plausible.bikeKg.min': { min: 0, max: 1000 },
  'plausible.bikeKg.max': { min: 0, max: 1000 },
  'plausible.riderBodyKg.min': { min: 0, max: 400 },
  'plausible.riderBodyKg.max': { min: 0, max: 400 },
  'plausible.gearKg.min': { min: 0, max: 100 },
  'plausible.gearKg.max': { min: 0, max: 100 },
  'plausible.luggageKg.min': { min: 0, max: 400 },
  'plausible.luggageKg.max': { min: 0, max: 400 },
  'plausible.unsprungKg.min': { min: 0, max: 200 },
  'plausible.unsprungKg.max': { min: 0, max: 200 },
  'plausible.frontShare.min': { min: 0, max: 1 },
  'plausible.frontShare.max': { min: 0, max: 1 },
  'plausible.riderRearShare.min': { min: 0, max: 1 },
  'plausible.riderRearShare.max': { min: 0, max: 1 },
};

export interface StoredSetting {
  key: string;
  value: number;
  unit: string;
  label: string;
}

export type SettingsCheck = { ok: true; values: Record<string, number> } | { ok: false; fields: Record<string, string> };

function outOfRange(value: number, range: NumberRange): boolean {
  return value > range.max || (range.aboveMin ? value <= range.min : value < range.min) || (!!range.integer && !Number.isInteger(value));
}

/**
 * Checks a set of new values against each key's range, and each plausibility window's minimum
 * against its maximum as they will stand after the change. Errors are keyed by the setting's key.
 */
export function checkEngineSettings(input: unknown, stored: readonly StoredSetting[]): SettingsCheck {
  if (!input || typeof input !== 'object' || Array.isArray(input)) {
    return { ok: false, fields: { values: 'Send the settings to change as { "values": { key: number } }.' } };
  }
  const byKey = new Map(stored.map((s) => [s.key, s]));
  const fields: Record<string, string> = {};
  const values: Record<string, number> = {};
  const entries = Object.entries(input);
  if (entries.length === 0) return { ok: false, fields: { values: 'Change at least one setting.' } };
  for (const [key, raw] of entries) {
    const setting = byKey.get(key);
    const range = ENGINE_SETTING_RANGES[key];
    if (!setting || !range || !SETTING_KEYS.includes(key)) {
      fields[key] = 'There is no such setting.';
      continue;
    }
    const value = typeof raw === 'number' || typeof raw === 'string' ? parseUserNumber(raw) : undefined;
    const unit = setting.unit === '%' || setting.unit === '' ? setting.unit : ` ${setting.unit}`;
    if (value === undefined) fields[key] = `${setting.label} must be a number.`;
    else if (outOfRange(value, range)) fields[key] = `${setting.label} must be ${describeRange(range, '')}${unit}${range.integer ? ', a whole number' : ''}.`;
    else values[key] = value;
  }
  for (const key of Object.keys(values)) {
    const pair = /^(plausible\.\w+)\.(min|max)$/.exec(key);
    if (!pair) continue;
    const [minKey, maxKey] = [`${pair[1]}.min`, `${pair[1]}.max`];
    const min = values[minKey] ?? byKey.get(minKey)?.value;
    const max = values[maxKey] ?? byKey.get(maxKey)?.value;
    if (min !== undefined && max !== undefined && !(min < max)) fields[key] ??= 'The lowest usual value must be below the highest.';
  }
  return Object.keys(fields).length === 0 ? { ok: true, values } : { ok: false, fields };
}

export const AUDIT_ENTITIES = ['bike-model', 'target-profile', 'engine-setting', 'shop-settings', 'damper-kind', 'damping-rule'] as const;

export type AuditEntity = (typeof AUDIT_ENTITIES)[number];

export const auditQuerySchema = object({
  entity: mixed<AuditEntity>().optional().oneOf([...AUDIT_ENTITIES, undefined], 'Choose bike-model, target-profile, engine-setting, shop-settings, damper-kind or damping-rule.'),
  page: number().integer().min(1).default(1).typeError('The page must be a whole number.'),
  pageSize: number().integer().min(1).max(100).default(50).typeError('The page size must be a whole number up to 100.'),
});
