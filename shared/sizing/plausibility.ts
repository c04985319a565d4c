/** Intake masses outside the shop's usual bounds: valid input, but worth a second look. */

import type { BikeMasses, RiderMasses, SizingWarning, Window, WarningThresholds } from '../types/sizing';
import { warnImplausible } from './warnings';

export function checkIntakePlausibility(
  bike: BikeMasses,
  rider: RiderMasses,
  thresholds: WarningThresholds,
): SizingWarning[] {
  const bounds = thresholds.plausible;
  const warnings: SizingWarning[] = [];
  const check = (what: string, value: number, unit: string, window: Window): void => {
    if (value < window[0] || value > window[1]) warnings.push(warnImplausible(what, value, unit, window));
  };
  check('A bike wet mass', bike.massKg, ' kg', bounds.bikeKg);
  check('A front weight share', bike.frontShare, '', bounds.frontShare);
  check('An unsprung front mass', bike.unsprungFrontKg, ' kg', bounds.unsprungKg);
  check('An unsprung rear mass', bike.unsprungRearKg, ' kg', bounds.unsprungKg);
  check('A rider body mass', rider.bodyKg, ' kg', bounds.riderBodyKg);
  check('A gear mass', rider.gearKg, ' kg', bounds.gearKg);
  check('A luggage or passenger mass', rider.luggageKg, ' kg', bounds.luggageKg);
  check("A rider's rear share", rider.rearShare, '', bounds.riderRearShare);
  return warnings;
}
