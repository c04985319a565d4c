/** Public face of the sizing engine: pure functions in SI units, shared by the server and the client. */

export { ENGINE_VERSION } from './version';
export { sizeBike } from './size-bike';
export {
  computeOvershoot,
  computePeakTime,
  sampleStepResponse,
  stepResponseAt,
  type StepKind,
} from './ride-preview';
export { averageReading, measureSags, READING_PITFALLS, type MeasuredSags } from './readings';
export { buildWarningThresholds, SETTING_KEYS, type EngineSettingValue } from './settings';
export { computeParallelRate, computeSeriesRate } from './spring-combination';
export type * from '../types/sizing';
export * from './helical-spring';
