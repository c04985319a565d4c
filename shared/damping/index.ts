/** Public face of the test-ride loop's engine: pure functions over the damping types, shared by the server and the client. */

export {
  checkDamperSetting,
  describeDamperAmount,
  describeTurnWay,
  END_STOP_STEPS,
  endStopWarning,
  isWholeStep,
  roomToStop,
  tidyPosition,
  unitWord,
} from './adjuster-range';
export { DAMPER_KIND_LABELS, damperLabel, describeAdjuster, describeAdjusterAt, SYMPTOMS, symptomOf } from './symptoms';
export { SEEDED_DAMPING_RULES } from './seeded-rules';
export { firstStep, STEP_RULE_TEXT } from './step-size';
export { nextChange, type NextChangeInput } from './next-change';
export { applyPlan, planToBaseline, planToStandard, planUndo } from './plans';
export { dampingChangeEffect, type DampingChangeEffect, type DampingChangeInput } from './preview-effect';
export type * from '../types/damping';
