/** Intake masses outside the shop's usual bounds: valid input, but worth a second look. */

import type { SizingRequest, SizingWarning, Window, WarningThresholds } from '../types/sizing';
import { warnImplausible } from './warnings';

export function checkIntakePlausibility(request: Pick<SizingRequest, 'bike' | 'rider' | 'loadCases'>, thresholds: WarningThresholds): SizingWarning[] {
  const { bike, rider } = request;
  const bounds = thresholds.plausible;
  const warnings: SizingWarning[] = [];
  checkWithin(warnings, 'A bike wet mass', bike.massKg, ' kg', bounds.bikeKg);
  checkWithin(warnings, 'A front weight share', bike.frontShare, '', bounds.frontShare);
  checkWithin(warnings, 'An unsprung front mass', bike.unsprungFrontKg, ' kg', bounds.unsprungKg);
  checkWithin(warnings, 'An unsprung rear mass', bike.unsprungRearKg, ' kg', bounds.unsprungKg);
  checkWithin(warnings, 'A rider body mass', rider.bodyKg, ' kg', bounds.riderBodyKg);
  checkWithin(warnings, 'A gear mass', rider.gearKg, ' kg', bounds.gearKg);
  checkWithin(warnings, "A rider's rear share", rider.rearShare, '', bounds.riderRearShare);
  for (const loadCase of request.loadCases ?? []) {
    checkWithin(warnings, `A load case (${loadCase.name})`, loadCase.massKg, ' kg', bounds.luggageKg);
  }
  return warnings;
}

// Module-level rather than a closure in the check: this runs for every sizing.
function checkWithin(warnings: SizingWarning[], what: string, value: number, unit: string, window: Window): void {
  if (value < window[0] || value > window[1]) warnings.push(warnImplausible(what, value, unit, window));
}
