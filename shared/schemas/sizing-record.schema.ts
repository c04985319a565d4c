/**
 * POST /api/bikes/:id/sizing-records: what to size and with which readings. The readings and a full
 * request are checked by the sizing request's own schema once the request is built, so their
 * messages are the engine's.
 */

import { array, boolean, mixed, object } from 'yup';
import type { EndKind } from '../types/sizing';
import { optionalNumberField } from './number-field';
import { weighInSchema } from './weigh-in.schema';

export const sizingRecordCreateSchema = object({
  /** Left out: the ends the draft chose, else every end the bike has. */
  ends: array()
    .of(mixed<EndKind>().required().oneOf(['front', 'rear'], 'Choose the front, the rear or both.'))
    .min(1, 'Choose the front, the rear or both.')
    .max(2, 'Choose the front, the rear or both.')
    .test('unique-ends', 'Choose each end once.', (ends) => !ends || new Set(ends).size === ends.length)
    .optional()
    .default(undefined)
    .typeError('Choose the front, the rear or both.'),
  /** Per end `{ extendedMm, staticMm, riderMm }`; an end without them is sized from the weights alone. */
  readings: object({ front: mixed().optional(), rear: mixed().optional() })
    .default(undefined)
    .typeError('Give the readings per end, as { front, rear }.'),
  /** Take the ends and readings from the bike's draft instead (its readings must be complete). */
  useDraft: boolean().default(false).typeError('Say whether to use the draft (true or false).'),
  /** Left out: the rider's current weigh-in. */
  weighIn: weighInSchema.optional().default(undefined),
  dampingRatio: optionalNumberField('Damping ratio', { min: 0, max: 3, aboveMin: true }, ''),
  /** A whole sizing request instead; then nothing else here is read. */
  request: mixed().optional(),
}).typeError('Send what to size as an object, or nothing.');
