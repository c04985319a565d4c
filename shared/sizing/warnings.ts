/** The engine's warnings and notes, each with what to re-check or re-measure in plain words. */

import type { EndKind, RangeMm, SizingWarning, Window } from '../types/sizing';
import { formatNumber } from './format';
import { READING_PITFALLS } from './readings';

const END_NAME: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

function warning(code: SizingWarning['code'], message: string, hint: string): SizingWarning {
  return { code, level: 'warning', message, hint };
}

function note(code: SizingWarning['code'], message: string, hint: string): SizingWarning {
  return { code, level: 'note', message, hint };
}

export function warnFrictionBand(which: 'static' | 'rider', spreadMm: number, limitMm: number): SizingWarning {
  return warning(
    'friction-band-large',
    `The pushed and lifted ${which} readings are ${formatNumber(spreadMm, 1)} mm apart (more than ${formatNumber(limitMm, 1)} mm).`,
    'So wide a band suggests worn seals, tight bushings or a binding linkage; the sags and the implied rate carry that uncertainty. Have the end checked, then re-measure.',
  );
}

export function warnSwappedPair(which: 'static' | 'rider'): SizingWarning {
  return warning(
    'reading-order',
    `The ${which} pair has the pushed-down reading longer than the lifted one.`,
    'Friction holds a pushed end low, so its reading should be the shorter: check that the two were not swapped, then re-measure.',
  );
}

export function warnNoRiderSag(): SizingWarning {
  return warning(
    'reading-order',
    'The rider reading shows no more sag than the static one, so the readings cannot calibrate the loads.',
    `Re-measure with the rider in riding position; watch for ${READING_PITFALLS.join(', ')}. Figures use the intake weights.`,
  );
}

export function warnStaticReadingToppedOut(end: EndKind): SizingWarning {
  return warning(
    'topped-out',
    `The static reading shows no sag: preload${end === 'rear' ? ' and gas force hold' : ' holds'} the ${END_NAME[end]} topped out, so that reading gives only a bound.`,
    'The preload change comes from the rider reading, which is still good; static sag after it is given as a bound. Measure the static sag again after the change.',
  );
}

export function warnRiderReadingBottomed(end: EndKind): SizingWarning {
  return warning(
    'bottomed-out',
    `The rider reading shows the ${END_NAME[end]} at the end of its travel, so the reading gives only a bound on the load.`,
    'Figures use the intake weights. Check the travel, then measure again with more preload or a stiffer spring fitted.',
  );
}

export function warnToppedOut(which: string): SizingWarning {
  return warning(
    'topped-out',
    `${which} is 0: the spring's preload holds the end fully extended under that load.`,
    'Less preload or a softer spring lets it settle; top-out springs make very small sags unreliable anyway.',
  );
}

export function warnBottomedOut(which: string): SizingWarning {
  return warning(
    'bottomed-out',
    `${which} cannot be given: the load would compress the end through all its travel.`,
    'Check the weights, the spring rate and the travel; a much stiffer spring is needed.',
  );
}

export function warnSmallStaticSag(sagMm: number, measured: boolean): SizingWarning {
  return note(
    'small-static-sag',
    `${measured ? 'Measured' : 'Predicted'} static sag is only ${formatNumber(sagMm, 1)} mm.`,
    measured
      ? 'A top-out spring lets the end move before the load reaches the preload force, so so small a static sag says little about the spring: rely on the rider reading, and measure again after the change.'
      : 'A top-out spring lets the end move before the load reaches the preload force, so so small a figure is unreliable: measure it.',
  );
}

export function warnStaticLoadMismatch(end: EndKind, calibratedN: number, weighedN: number, limitPct: number): SizingWarning {
  const pct = ((calibratedN - weighedN) / weighedN) * 100;
  const causes =
    end === 'front'
      ? "the stated preload, the fork's air gap (the air pushes too), a top-out spring, the bike's front share and the unsprung front mass"
      : "the stated preload, the shock's gas force, a top-out spring, the bike's front share, the unsprung rear mass and the leverage ratio";
  return warning(
    'static-load-mismatch',
    `The readings put ${formatNumber(calibratedN, 0)} N of the bike on the ${END_NAME[end]}, against ${formatNumber(weighedN, 0)} N from the weights (${pct > 0 ? '+' : ''}${formatNumber(pct, 0)} %, more than ${formatNumber(limitPct, 0)} %).`,
    `Check ${causes}.`,
  );
}

export function warnStaticLoadOverBound(end: EndKind, maxN: number, weighedN: number): SizingWarning {
  return warning(
    'static-load-mismatch',
    `The static reading shows the ${END_NAME[end]} topped out, so at most ${formatNumber(maxN, 0)} N of the bike rests on it, against ${formatNumber(weighedN, 0)} N from the weights.`,
    `Check the stated preload${end === 'rear' ? ' and gas force' : ''} (a topped-out end means the spring holds more than the bike weighs on it), the bike's front share and the unsprung mass.`,
  );
}

export function warnRiderLoadMismatch(end: EndKind, readingN: number, weighedN: number): SizingWarning {
  return warning(
    'implied-rate-mismatch',
    `On the stated spring and preload, the rider reading puts ${formatNumber(readingN, 0)} N on the ${END_NAME[end]}, against ${formatNumber(weighedN, 0)} N from the weights.`,
    "Re-check the rate on the spring's label, the stated preload, the rider and gear weights and the rider's rear share, then measure again.",
  );
}

export function warnFittedCoilBindAim(neededMm: number, limitMm: number): SizingWarning {
  return warning(
    'coil-bind',
    `The fitted spring would need ${formatNumber(neededMm, 1)} mm of preload, but it coil-binds at full travel beyond ${formatNumber(limitMm, 1)} mm.`,
    'The setting shown stops short of coil-bind; a longer spring of the same rate, or one of another rate, would reach the target.',
  );
}

export function warnFittedCoilBind(marginMm: number, requiredMm: number): SizingWarning {
  return warning(
    'coil-bind',
    `The fitted spring is left ${formatNumber(marginMm, 1)} mm short of coil-bind at full travel at its present preload; ${formatNumber(requiredMm, 1)} mm is to be kept clear.`,
    'Take preload off, or fit a longer spring of the same rate: a spring that coil-binds stops the suspension hard and can break.',
  );
}

export function warnImpliedRate(
  end: EndKind,
  impliedNmm: number,
  installedNmm: number,
  frictionSuspect: boolean,
): SizingWarning {
  const geometry = end === 'front' ? 'the number of sprung legs and the rake' : 'the leverage ratio or linkage points';
  const friction = frictionSuspect ? 'friction first (the pushed and lifted readings are far apart), then ' : 'friction (take pushed and lifted readings), ';
  return warning(
    'implied-rate-mismatch',
    `The readings imply a ${formatNumber(impliedNmm, 1)} N/mm spring, but ${formatNumber(installedNmm, 1)} N/mm is stated.`,
    `Re-check ${friction}the rider and gear weights and the rider's rear share, ${geometry}, and the rate on the spring's label.`,
  );
}

export function warnCoilBind(count: number, marginMm: number): SizingWarning {
  return warning(
    'coil-bind',
    `${count} catalogue spring${count === 1 ? '' : 's'} would come within ${formatNumber(marginMm, 1)} mm of coil-bind at full travel with the preload needed.`,
    'They are judged at the most preload that keeps them clear; a longer spring of the same family would reach the aim.',
  );
}

export function warnAdjusterRange(neededMm: number | null, range: RangeMm): SizingWarning {
  const needed = neededMm === null ? 'The preload needed' : `The ${formatNumber(neededMm, 1)} mm of preload needed`;
  return warning(
    'adjuster-range',
    `${needed} is outside what the adjuster gives (${formatNumber(range.min, 1)} to ${formatNumber(range.max, 1)} mm, keeping the spring captive).`,
    'The setting shown stops at the adjuster\'s end; a preload spacer, or a spring of another rate or length, would reach the target.',
  );
}

export function noteAdjusterStop(middleSagMm: number, middlePreloadMm: number, stopMm: number, aimSagMm: number): SizingWarning {
  return note(
    'adjuster-range',
    `Rider sag in the middle of its window (${formatNumber(middleSagMm, 1)} mm) needs ${formatNumber(middlePreloadMm, 1)} mm of preload, but the adjuster stops at ${formatNumber(stopMm, 1)} mm: the preload is aimed at ${formatNumber(aimSagMm, 1)} mm of rider sag instead.`,
    'Both sags stay inside their windows. A spring nearer the ideal rate, or a spacer, would reach the middle.',
  );
}

export function warnRoundingOutsideWindow(
  setting: string,
  riderSagMm: number | null,
  staticSagMm: number | null,
  windows: { riderSagMm: RangeMm; staticSagMm: RangeMm },
): SizingWarning {
  const sag = (which: string, value: number | null, window: RangeMm) =>
    `${value === null ? `a bottomed-out ${which} sag` : `${formatNumber(value, 1)} mm of ${which} sag`} (window ${formatNumber(window.min, 1)} to ${formatNumber(window.max, 1)} mm)`;
  return warning(
    'rounding-outside-window',
    `No setting the adjuster can make keeps both sags inside their windows: the nearest, ${setting}, gives ${sag('rider', riderSagMm, windows.riderSagMm)} and ${sag('static', staticSagMm, windows.staticSagMm)}.`,
    'One step of this adjuster moves the sags further than the windows allow; a thin spacer under the spring, a finer adjuster, or a spring of another rate would fit.',
  );
}

export function warnWindowUnreachable(which: 'rider' | 'static', window: RangeMm): SizingWarning {
  return warning(
    'window-unreachable',
    `No preload holds the ${which} sag inside its window (${formatNumber(window.min, 1)} to ${formatNumber(window.max, 1)} mm): on this linkage it jumps past the window as preload changes.`,
    'The curve loses slope there; re-measure those points. A spring of another rate comes to rest elsewhere on the curve.',
  );
}

export function warnImplausible(what: string, value: number, unit: string, window: Window): SizingWarning {
  return warning(
    'weights-implausible',
    `${what} of ${formatNumber(value, 2)}${unit} is outside the usual ${window[0]} to ${window[1]}${unit}.`,
    'Check it was weighed or entered correctly; every load follows from it.',
  );
}

export function warnNoRiderLoad(end: EndKind): SizingWarning {
  return warning(
    'weights-implausible',
    `The intake weights put no rider load on the ${END_NAME[end]}.`,
    "Check the rider's and the luggage's rear shares.",
  );
}

export function warnRegressiveLinkage(): SizingWarning {
  return warning(
    'regressive-linkage',
    'The linkage curve gets less progressive somewhere: the shock moves less per mm of wheel travel deeper in the stroke.',
    'That is rare; re-measure the points around the dip before trusting the sag.',
  );
}

export function noteForkAir(): SizingWarning {
  return note(
    'fork-air-ignored',
    'The air in the fork and its oil level are ignored for sag.',
    'They add a progressive force near the end of travel and about 5 to 15 % extra force at sag.',
  );
}

export function noteGasForceUnknown(): SizingWarning {
  return note(
    'gas-force-unknown',
    'No gas force was given for the shock, so none is counted.',
    'A gas-charged shock pushes out with about 150 to 300 N, worth 2 to 3 mm of preload.',
  );
}

export function noteSingleRateEquivalent(): SizingWarning {
  return note(
    'single-rate-equivalent',
    'The installed spring is dual-rate: the implied and ideal rates are those of a single-rate spring doing the same job.',
    'Compare them with the rate over the sag range, not the label rate.',
  );
}

export function noteWeightsMode(): SizingWarning {
  return note(
    'weights-mode',
    'These sags are predicted from the weights; no readings were taken.',
    'Measure the bike (extended, static and rider lengths) to check them and to find the installed rate it really has.',
  );
}

export function warnNoCandidate(catalogueSize: number): SizingWarning {
  return warning(
    'no-candidate',
    catalogueSize === 0
      ? 'The catalogue holds no spring of this family.'
      : 'No catalogue spring of this family keeps both sags in their windows at a setting the adjuster can make.',
    'Order a spring near the ideal rate, or check the spring family.',
  );
}

export function warnTargetInvalid(): SizingWarning {
  return warning(
    'target-invalid',
    'The sag targets for this end cannot be aimed at: the rider-sag middle is not above the static one.',
    'Check the target profile, or the targets given for this end.',
  );
}
