/**
 * A change the rider reports in the setup log (POST /api/bikes/:id/setup-log): per end a new preload
 * setting, new clicker positions, a spring swap. Whether the bike can take it (the adjuster's range,
 * the clickers it has) is checked against the bike by `applySetupChange` (shared/setup/settings.ts).
 */

import { object, string } from 'yup';
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

function endChangeSchema(part: string) {
  return object({
    preloadPosition: optionalNumberField('Preload adjuster setting', { min: -1000, max: 1000 }, ''),
    rebound: optionalNumberField('Rebound clicker', { min: 0, max: 100, integer: true }, 'clicks'),
    compression: optionalNumberField('Compression clicker', { min: 0, max: 100, integer: true }, 'clicks'),
    spring: springSwapSchema,
  })
    .default(undefined)
    .typeError(`The ${part} change must be given as its new settings.`);
}

const hasChange = (end: Record<string, unknown> | undefined) => !!end && Object.values(end).some((v) => v !== undefined);

export const setupChangeSchema = object({
  note: string().trim().max(500, 'Keep the note to 500 characters.').default(''),
  front: endChangeSchema('fork'),
  rear: endChangeSchema('shock'),
})
  .typeError('Send the change as { front, rear, note }.')
  .test('some-change', function (change) {
  if (!change || hasChange(change.front) || hasChange(change.rear)) return true;
  return this.createError({ path: '', message: 'Say what changed: a preload setting, a clicker or a spring, at the front or the rear.' });
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
