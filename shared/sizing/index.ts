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
export { computeIntakeLoads, STANDARD_GRAVITY } from './loads';
export { averageReading, measureSags, READING_PITFALLS } from './readings';
export { computeRideFrequencyHz } from './ride-frequency';
export type * from '../types/sizing';
export { buildWarningThresholds, SETTING_KEYS, type EngineSettingValue } from './settings';
