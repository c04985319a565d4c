/**
 * A change the rider reports in the setup log (POST /api/bikes/:id/setup-log): per end a new preload
 * setting, new damping adjuster settings by kind, a spring swap. Whether the bike can take it (the
 * adjusters' ranges and steps, the adjusters it has) is checked against the bike by
 * `applySetupChange` (shared/setup/settings.ts).
 */

import { mixed, object, string, ValidationError } from 'yup';
import { DAMPER_MAX_OPEN, MAX_DAMPERS_PER_END } from './bike.fields';
import { DAMPER_KIND_KEY, DAMPER_KIND_KEY_MESSAGE } from './damper-kind.schema';
import { nullableNumberField, numberField, optionalNumberField } from './number-field';

const springSwapSchema = object({
  rateNmm: numberField('New spring rate', { min: 0, max: 500, aboveMin: true }, 'N/mm'),
  family: string().trim().max(60, 'Spring family must be at most 60 characters.').optional(),
  secondRateNmm: nullableNumberField('Second rate', { min: 0, max: 500, aboveMin: true }, 'N/mm'),
  breakMm: nullableNumberField('Break point', { min: 0, max: 500, aboveMin: true }, 'mm'),
  preloadMm: optionalNumberField('New spring preload', { min: 0, max: 100 }, 'mm'),
})
  .default(undefined)
  .typeError('The new spring must be given as its rate (and family, preload).')
  .test('dual-rate-pair', function (spring) {
    if (!spring || (spring.secondRateNmm === null) === (spring.breakMm === null)) return true;
    const missing = spring.secondRateNmm === null ? 'secondRateNmm' : 'breakMm';
    return this.createError({
      path: `${this.path}.${missing}`,
      message: 'A dual-rate spring needs both its second rate and its break point.',
    });
  });

const isPlainObject = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null && !Array.isArray(value);

/** Kind -> new setting. Each setting is a number in range here; against the bike's own adjuster in applySetupChange. */
const damperSettingsSchema = mixed<Record<string, number>>()
  .optional()
  .test('damper-settings', function (value) {
    if (value === undefined) return true;
    if (!isPlainObject(value)) return this.createError({ message: 'Give the damping adjusters as { kind: setting }, e.g. { "rebound": 12 }.' });
    const entries = Object.entries(value);
    if (entries.length > MAX_DAMPERS_PER_END) return this.createError({ message: `An end has at most ${MAX_DAMPERS_PER_END} damping adjusters.` });
    const errors = entries.flatMap(([kind, setting]) => {
      const at = (message: string) => [this.createError({ path: `${this.path}.${kind}`, message })];
      if (!DAMPER_KIND_KEY.test(kind)) return at(DAMPER_KIND_KEY_MESSAGE);
      if (typeof setting !== 'number' || !Number.isFinite(setting)) return at('The setting must be a number, out from fully closed.');
      if (setting < 0 || setting > DAMPER_MAX_OPEN.clicks) return at(`The setting must be between 0 and ${DAMPER_MAX_OPEN.clicks}, out from fully closed.`);
      return [];
    });
    return errors.length === 0 ? true : new ValidationError(errors);
  });

function endChangeSchema(part: string) {
  return object({
    preloadPosition: optionalNumberField('Preload adjuster setting', { min: -1000, max: 1000 }, ''),
    dampers: damperSettingsSchema,
    spring: springSwapSchema,
  })
    .default(undefined)
    .typeError(`The ${part} change must be given as its new settings.`);
}

/** An empty list of damper settings changes nothing. */
const hasChange = (end: Record<string, unknown> | undefined) =>
  !!end && Object.entries(end).some(([key, v]) => v !== undefined && !(key === 'dampers' && isPlainObject(v) && Object.keys(v).length === 0));

export const setupChangeSchema = object({
  note: string().trim().max(500, 'Keep the note to 500 characters.').default(''),
  front: endChangeSchema('fork'),
  rear: endChangeSchema('shock'),
})
  .typeError('Send the change as { front, rear, note }.')
  .test('some-change', function (change) {
  if (!change || hasChange(change.front) || hasChange(change.rear)) return true;
  return this.createError({ path: '', message: 'Say what changed: a preload setting, a damping adjuster or a spring, at the front or the rear.' });
});

/** POST /api/bikes/:id/load-case: the case to set by its name, or null to ride solo. */
export const loadCaseSwitchSchema = object({
  name: string()
    .transform((value: unknown) => (typeof value === 'string' ? value.trim() : value))
    .typeError('Name the load case as text, or send null to ride solo.')
    .defined('Name the load case to set, or send null to ride solo.')
    .nullable()
    .min(1, 'Name the load case to set, or send null to ride solo.')
    .max(40, 'A load case name is at most 40 characters.'),
}).typeError('Send the load case as { name }.');
