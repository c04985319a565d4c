/** The fitted spring's preload change, rounded to the adjuster, and the sags the setting gives (section 5f). */

import type { AdjusterKind, PreloadAdvice, RangeMm, Verdict } from '../types/sizing';
import { adjusterUnit, describeAdjustment } from './adjuster';
import type { EndModel } from './end-model';
import type { SettableSetting } from './settable-setting';
import type { SpringAssessment } from './spring-assessment';
import type { SpringLaw } from './spring-law';

export interface PreloadAdviceInput {
  model: EndModel;
  spring: SpringLaw;
  adjuster: { kind: AdjusterKind; mmPerUnit: number };
  currentPreloadMm: number;
  rangeMm: RangeMm;
  assessment: SpringAssessment & { setting: SettableSetting };
  verdict: Verdict;
  /** The most the static load can be, when a topped-out static reading bounds it. */
  staticMaxN: number | null;
  /** The fitted spring's deflection at coil-bind, when known. */
  maxDeflectionMm: number | null;
}

export function advisePreload(input: PreloadAdviceInput): PreloadAdvice {
  const { model, spring, adjuster, currentPreloadMm, rangeMm, assessment, verdict } = input;
  const setting = assessment.setting;
  // A rate that suits aims where the windows say, even past the adjuster; a misfit aims at the compromise it is set to.
  const neededMm = verdict === 'too-soft' || verdict === 'too-stiff' ? setting.targetMm : (assessment.windowsAimMm ?? setting.targetMm);
  const changeMm = neededMm - currentPreloadMm;
  const roundedChangeMm = setting.changeUnits * adjuster.mmPerUnit;
  const direction = setting.changeUnits > 0 ? 'add' : setting.changeUnits < 0 ? 'remove' : 'none';
  const phrase = describeAdjustment(adjusterUnit(adjuster.kind), { roundedChangeUnits: setting.changeUnits, position: setting.position, direction });
  return {
    currentMm: currentPreloadMm,
    neededMm,
    changeMm,
    changeUnits: changeMm / adjuster.mmPerUnit,
    unit: adjusterUnit(adjuster.kind),
    direction,
    roundedChangeUnits: setting.changeUnits,
    roundedChangeMm,
    position: setting.position,
    limitedByRange: neededMm < rangeMm.min - 1e-9 || neededMm > rangeMm.max + 1e-9,
    rangeMm,
    riderSagAfterMm: setting.riderSagMm,
    staticSagAfterMm: setting.staticSagMm,
    staticSagAfterMaxMm: input.staticMaxN === null ? null : model.sagAtLoad(spring, setting.preloadMm, input.staticMaxN),
    fit: setting.fit,
    interim: setting.fit !== 'both',
    coilBindMarginMm: input.maxDeflectionMm === null ? null : input.maxDeflectionMm - (setting.preloadMm + model.springStrokeMm),
    instruction: phrase.charAt(0).toUpperCase() + phrase.slice(1) + '.',
  };
}
