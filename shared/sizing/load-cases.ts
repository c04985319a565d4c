/**
 * Load cases (section 6): a passenger or luggage does not choose the spring, the solo sizing does.
 * Each case adds its wheel load on that spring, and the preload is raised until rider sag is back
 * where the solo setting put it: with a fork, dp = dW*cos(theta)/(n*k); with a constant leverage
 * ratio, dp = dW*LR/k; through the curve otherwise. Rounded to the adjuster like any setting, and
 * said plainly when the spring cannot carry it: the adjuster or coil-bind stops short and rider
 * sag is left past its window.
 */

import type { LoadCaseResult, LoadsN, SpringName } from '../types/sizing';
import { adjusterUnit } from './adjuster';
import type { EndModel } from './end-model';
import { findSettableBounds, gridNeighbours, settle, type SettableGrid } from './settable-setting';
import { findHoldingPreload } from './spring-assessment';
import type { SpringLaw } from './spring-law';
import { isInsideWindow, type SagWindows } from './targets';

export interface LoadCaseInput {
  name: string;
  massKg: number;
  /** Wheel load it adds on this end. */
  addedN: number;
}

export interface SoloSetting {
  spring: SpringLaw;
  name: SpringName;
  position: number;
  preloadMm: number;
  riderSagMm: number;
  /** The settings the adjuster allows for this spring. */
  grid: SettableGrid;
  /** The grid's top is coil-bind, not the adjuster's stop. */
  coilLimited: boolean;
}

export function adviseLoadCases(
  model: EndModel,
  soloLoads: LoadsN,
  solo: SoloSetting,
  cases: readonly LoadCaseInput[],
  windows: SagWindows,
): LoadCaseResult[] {
  const bounds = findSettableBounds(solo.grid);
  if (!bounds) return [];
  return cases.map((loadCase) => {
    const loads = { staticN: soloLoads.staticN, riderN: soloLoads.riderN + loadCase.addedN };
    const totalN = loads.staticN + loads.riderN;
    const neededMm = findHoldingPreload(model, solo.spring, totalN, solo.riderSagMm);
    let chosen = null;
    for (const position of gridNeighbours(solo.grid, bounds, neededMm)) {
      const setting = settle(model, solo.spring, loads, windows, solo.grid, position, neededMm);
      if (!chosen || sagMiss(setting.riderSagMm, solo.riderSagMm) < sagMiss(chosen.riderSagMm, solo.riderSagMm)) chosen = setting;
    }
    const set = chosen!;
    const stopped = neededMm > solo.grid.rangeMm.max + 1e-9;
    return {
      name: loadCase.name,
      massKg: loadCase.massKg,
      addedLoadN: loadCase.addedN,
      spring: solo.name,
      unit: adjusterUnit(solo.grid.adjuster.kind),
      changeUnits: roundToNano(set.position - solo.position),
      position: set.position,
      preloadMm: set.preloadMm,
      riderSagMm: set.riderSagMm,
      // Back at the solo rider sag the load is carried, wherever solo sits; stopped short, only inside the window.
      carries: set.riderSagMm !== null && (!stopped || isInsideWindow(set.riderSagMm, windows.riderSagMm)),
      limit: stopped ? (solo.coilLimited ? 'coil-bind' : 'range') : null,
    };
  });
}

function sagMiss(sagMm: number | null, targetMm: number): number {
  return sagMm === null ? Number.MAX_VALUE : Math.abs(sagMm - targetMm);
}

function roundToNano(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}
