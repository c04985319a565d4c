/**
 * The shop's list of damping adjuster kinds: the key a bike names an adjuster by, its label, and
 * the circuit and shaft speeds it works on. POST /api/damper-kinds (admin) adds one.
 */

import { mixed, object, string } from 'yup';
import { DAMPER_CIRCUITS, DAMPER_SPEEDS, type DamperCircuit, type DamperSpeed } from '../types/damping';

/** Lower-case words joined by '-', at most 40 characters: 'rebound', 'hs-compression'. */
export const DAMPER_KIND_KEY = /^[a-z][a-z0-9-]{0,39}$/;

export const DAMPER_KIND_KEY_MESSAGE = 'An adjuster kind is lower-case letters, digits and "-", starting with a letter, at most 40 characters (e.g. hs-compression).';

export const damperKindCreateSchema = object({
  key: string().trim().required('Give the kind a key, e.g. mid-valve-bleed.').matches(DAMPER_KIND_KEY, DAMPER_KIND_KEY_MESSAGE),
  label: string().trim().required('Give the kind a label, e.g. Mid-valve bleed.').max(60, 'Keep the label to 60 characters.'),
  circuit: mixed<DamperCircuit>()
    .required('Say which circuit it adjusts: rebound or compression.')
    .oneOf(DAMPER_CIRCUITS, 'The circuit must be rebound or compression.'),
  speed: mixed<DamperSpeed>()
    .required('Say which shaft speeds it works on: all, high or low.')
    .oneOf(DAMPER_SPEEDS, 'The speeds must be all, high or low.'),
}).typeError('Send the adjuster kind as { key, label, circuit, speed }.');
