/**
 * The test-ride loop's input: a report of what the bike did (POST /api/bikes/:id/test-rides), how
 * the change rode (POST /api/test-rides/:id/outcome), a plan to apply (POST
 * /api/bikes/:id/damper-plans/:target), and rows of the symptom-to-change table (POST and PATCH
 * /api/damping-rules). Whether an adjuster kind is on the shop's list is checked by the server.
 */

import { boolean, mixed, number, object, string, type InferType, type TestContext } from 'yup';
import { symptomOf } from '../damping/symptoms';
import { DAMPING_CLAIMS, RIDE_OUTCOMES, SYMPTOM_KEYS, SYMPTOM_STRENGTHS, type DampingClaim, type DampingDirection, type RideOutcome, type SymptomKey, type SymptomStrength } from '../types/damping';
import type { EndKind } from '../types/sizing';
import { DAMPER_KIND_KEY, DAMPER_KIND_KEY_MESSAGE } from './damper-kind.schema';

const ENDS: readonly EndKind[] = ['front', 'rear'];
const DIRECTIONS: readonly DampingDirection[] = ['more', 'less'];

/** Rules of a symptom and end are tried lowest first; the seeded rows use 1 to 4. */
export const RULE_PRIORITY = { min: 1, max: 99 } as const;

export const RULE_TEXT_MAX = 500;

const NOTE_MAX = 500;

const symptomField = mixed<SymptomKey>().oneOf(SYMPTOM_KEYS, 'Choose a symptom from the list.');
const endField = mixed<EndKind>().oneOf(ENDS, 'The end must be front or rear.');
const directionField = mixed<DampingDirection>().oneOf(DIRECTIONS, 'The direction must be more (turn in) or less (turn out).');
const adjusterField = string().trim().matches(DAMPER_KIND_KEY, DAMPER_KIND_KEY_MESSAGE);
const priorityField = number()
  .typeError('The priority must be a whole number.')
  .integer('The priority must be a whole number.')
  .min(RULE_PRIORITY.min, `The priority must be between ${RULE_PRIORITY.min} and ${RULE_PRIORITY.max}.`)
  .max(RULE_PRIORITY.max, `The priority must be between ${RULE_PRIORITY.min} and ${RULE_PRIORITY.max}.`);
const claimField = mixed<DampingClaim>()
  .nullable()
  .oneOf([...DAMPING_CLAIMS, null], `The claim must be one of ${DAMPING_CLAIMS.join(', ')}, or null for none.`);

/** `missing` answers both a field left out of a new row and one emptied by an edit. */
function ruleText(label: string, missing: string) {
  return string().trim().min(1, missing).max(RULE_TEXT_MAX, `Keep ${label} to ${RULE_TEXT_MAX} characters.`);
}

const WHY_MISSING = 'Say why this change helps, in a sentence.';
const FEEL_FOR_MISSING = 'Say what to feel for on the next ride.';

function noteField() {
  return string().trim().max(NOTE_MAX, `Keep the note to ${NOTE_MAX} characters.`).default('');
}

/** Why the symptom cannot be reported at that end ("Dives hard under braking" is the fork's alone), or undefined when it can. */
export function symptomEndProblem(symptom: SymptomKey, end: EndKind): string | undefined {
  const { words, ends } = symptomOf(symptom);
  if (ends.includes(end)) return undefined;
  return `“${words}” is reported at the ${ends.join(' or ')} only, not the ${end}.`;
}

/** The test shared by every body naming a symptom and an end: only once both are known values. */
function symptomFitsEnd(context: TestContext, value: { symptom?: unknown; end?: unknown } | undefined) {
  const symptom = value?.symptom as SymptomKey | undefined;
  const end = value?.end as EndKind | undefined;
  if (!symptom || !end || !SYMPTOM_KEYS.includes(symptom) || !ENDS.includes(end)) return true;
  const problem = symptomEndProblem(symptom, end);
  return problem ? context.createError({ path: 'symptom', message: problem }) : true;
}

export const testRideReportSchema = object({
  end: endField.required('Say which end did it: front or rear.'),
  symptom: symptomField.required('Say what the bike did: choose a symptom from the list.'),
  strength: mixed<SymptomStrength>()
    .oneOf(SYMPTOM_STRENGTHS, 'The strength must be slight, clear or strong.')
    .required('Say how strongly you felt it: slight, clear or strong.'),
  note: noteField(),
})
  .typeError('Send the report as { end, symptom, strength, note }.')
  .test('symptom-end', function (value) {
    return symptomFitsEnd(this, value);
  });

export const testRideOutcomeSchema = object({
  outcome: mixed<RideOutcome>().oneOf(RIDE_OUTCOMES, 'The outcome must be better, worse or same.').required('Say how it rode: better, worse or same.'),
  note: noteField(),
}).typeError('Send the outcome as { outcome, note }.');

export const damperPlanApplySchema = object({
  end: endField.required('Say which end to set: front or rear.'),
}).typeError('Send the end to set as { end }.');

export const dampingRuleCreateSchema = object({
  symptom: symptomField.required('Choose the symptom the rule answers.'),
  end: endField.required('Say which end the rule is for: front or rear.'),
  adjuster: adjusterField.required('Name the adjuster to turn, as its kind on the shop’s list (e.g. rebound).'),
  direction: directionField.required('Say which way: more (turn in) or less (turn out).'),
  priority: priorityField.required(`Give the priority, ${RULE_PRIORITY.min} to ${RULE_PRIORITY.max}: rules are tried lowest first.`),
  why: ruleText('why', WHY_MISSING).required(WHY_MISSING),
  feelFor: ruleText('what to feel for', FEEL_FOR_MISSING).required(FEEL_FOR_MISSING),
  claim: claimField.default(null),
})
  .typeError('Send the rule as { symptom, end, adjuster, direction, priority, why, feelFor, claim }.')
  .test('symptom-end', function (value) {
    return symptomFitsEnd(this, value);
  });

/** Any of the rule's fields, and whether it is in use; a body naming none changes nothing. */
export const dampingRulePatchSchema = object({
  symptom: symptomField.optional(),
  end: endField.optional(),
  adjuster: adjusterField.optional(),
  direction: directionField.optional(),
  priority: priorityField.optional(),
  why: ruleText('why', WHY_MISSING).optional(),
  feelFor: ruleText('what to feel for', FEEL_FOR_MISSING).optional(),
  claim: claimField.optional(),
  active: boolean().strict().typeError('Active must be true or false.').optional(),
})
  .typeError('Send the changes as an object of the rule’s fields, e.g. { "active": false }.')
  .test('symptom-end', function (value) {
    return symptomFitsEnd(this, value);
  });

export type TestRideReportInput = InferType<typeof testRideReportSchema>;
export type TestRideOutcomeInput = InferType<typeof testRideOutcomeSchema>;
export type DamperPlanApplyInput = InferType<typeof damperPlanApplySchema>;
export type DampingRuleCreateInput = InferType<typeof dampingRuleCreateSchema>;
export type DampingRulePatchInput = InferType<typeof dampingRulePatchSchema>;
