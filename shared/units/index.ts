/** Units at the edges of the engine: conversions, and numbers as typed. */

export {
  convertUnit,
  fromSi,
  toSi,
  type DisplayUnit,
  type ForceUnit,
  type LengthUnit,
  type MassUnit,
  type RateUnit,
} from './convert';
export { parseUserNumber } from './parse-number';
