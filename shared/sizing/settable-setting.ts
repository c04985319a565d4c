/**
 * The best setting a person can make for one spring (sections 5c, 5e, 5f): the adjuster's own
 * steps (quarter turns, whole steps, half millimetres of spacer), never below the preload that
 * keeps the spring captive, never past the adjuster's stops or into coil-bind. Every sag it
 * reports is the model's at that setting, never at an unrounded preload.
 *
 * Each sag falls as preload rises, so each window is one band of preloads and the best setting
 * of each kind of fit lies next to the point of its band nearest the aim: only the adjuster's
 * steps either side of those few points need trying.
 */

import type { Adjuster, LoadsN, RangeMm, SettingFit } from '../types/sizing';
import type { EndModel } from './end-model';
import type { SpringLaw } from './spring-law';
import { isInsideWindow, type SagWindows } from './targets';

export interface SettableGrid {
  adjuster: Adjuster;
  currentPreloadMm: number;
  /** Smallest change a person sets, in adjuster units. */
  resolution: number;
  /** Preloads that may be set: the adjuster's stops, the captive minimum and coil-bind narrow it. */
  rangeMm: RangeMm;
}

/** Preloads (mm) that keep each sag inside its window, and the two aims that order them. */
export interface PreloadBands {
  rider: RangeMm;
  static: RangeMm;
  /** Preload that holds rider sag in the middle of its window. */
  middle: number;
  /** Preload from which the end stays topped out without the rider. */
  topOut: number;
}

export interface SettableSetting {
  position: number;
  /** Signed, from the current setting, in adjuster units. */
  changeUnits: number;
  preloadMm: number;
  riderSagMm: number | null;
  staticSagMm: number | null;
  fit: SettingFit;
  /** The unrounded preload this setting was rounded from. */
  targetMm: number;
}

const FIT_ORDER: Record<SettingFit, number> = { both: 0, rider: 1, static: 2, off: 3, 'at-stop': 4 };

/** Float noise in a position counted in adjuster units. */
const POSITION_NOISE = 1e-9;

export function rankFit(fit: SettingFit): number {
  return FIT_ORDER[fit];
}

export function classifySags(riderSagMm: number | null, staticSagMm: number | null, windows: SagWindows): SettingFit {
  if (riderSagMm === null || staticSagMm === null || staticSagMm === 0) return 'at-stop';
  const riderIn = isInsideWindow(riderSagMm, windows.riderSagMm);
  const staticIn = isInsideWindow(staticSagMm, windows.staticSagMm);
  if (riderIn && staticIn) return 'both';
  if (riderIn && staticSagMm > windows.staticSagMm.max) return 'rider';
  if (staticIn) return 'static';
  return 'off';
}

/** The settable positions' lowest and highest: a stop is set exactly, any other limit from the first step inside it. */
export function findSettableBounds(grid: SettableGrid): [number, number] | null {
  const { adjuster, currentPreloadMm, resolution, rangeMm } = grid;
  const minPosition = adjuster.minPosition ?? 0;
  const positionOf = (preloadMm: number) => adjuster.position + (preloadMm - currentPreloadMm) / adjuster.mmPerUnit;
  const lowest = positionOf(rangeMm.min);
  const highest = positionOf(rangeMm.max);
  const low =
    lowest <= minPosition + POSITION_NOISE ? minPosition : adjuster.position + Math.ceil((lowest - adjuster.position) / resolution - POSITION_NOISE) * resolution;
  const high =
    highest >= adjuster.maxPosition - POSITION_NOISE
      ? adjuster.maxPosition
      : adjuster.position + Math.floor((highest - adjuster.position) / resolution + POSITION_NOISE) * resolution;
  const lowSet = roundToNano(Math.max(low, minPosition));
  const highSet = roundToNano(Math.min(high, adjuster.maxPosition));
  return lowSet <= highSet ? [lowSet, highSet] : null;
}

/**
 * The best setting: the best kind of fit first, then rider sag nearest its window and its middle,
 * then static sag nearest its window and its middle. Null when no setting can be made at all.
 */
export function chooseSettableSetting(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  grid: SettableGrid,
  bands: PreloadBands,
): SettableSetting | null {
  const bounds = findSettableBounds(grid);
  if (!bounds) return null;
  const middle = bands.middle;
  const both = intersect(bands.rider, bands.static);
  const riderStaticNotShallow = intersect(bands.rider, { min: -Infinity, max: bands.static.max });
  const targets = [
    clampTo(middle, both),
    clampTo(middle, riderStaticNotShallow),
    clampTo(middle, bands.static),
    clampTo(middle, { min: -Infinity, max: bands.topOut }),
    middle,
  ];
  const tried: number[] = [];
  let best: SettableSetting | null = null;
  for (const target of targets) {
    if (target === null || Number.isNaN(target)) continue;
    for (const position of gridNeighbours(grid, bounds, target)) {
      if (tried.includes(position)) continue;
      tried.push(position);
      const setting = settle(model, spring, loads, windows, grid, position, target);
      if (!best || isBetter(setting, best, windows)) best = setting;
    }
  }
  return best;
}

/** The sags at one position of the adjuster. */
export function settle(
  model: EndModel,
  spring: SpringLaw,
  loads: LoadsN,
  windows: SagWindows,
  grid: SettableGrid,
  position: number,
  targetMm: number,
): SettableSetting {
  const changeUnits = roundToNano(position - grid.adjuster.position);
  const preloadMm = grid.currentPreloadMm + changeUnits * grid.adjuster.mmPerUnit;
  const riderSagMm = model.sagAtLoad(spring, preloadMm, loads.staticN + loads.riderN);
  const staticSagMm = model.sagAtLoad(spring, preloadMm, loads.staticN);
  return { position, changeUnits, preloadMm, riderSagMm, staticSagMm, fit: classifySags(riderSagMm, staticSagMm, windows), targetMm };
}

/** The adjuster's steps either side of a target preload, inside the settable bounds. */
export function gridNeighbours(grid: SettableGrid, [low, high]: [number, number], targetMm: number): number[] {
  const { adjuster, currentPreloadMm, resolution } = grid;
  const raw = adjuster.position + (targetMm - currentPreloadMm) / adjuster.mmPerUnit;
  const at = Math.min(high, Math.max(low, raw));
  const steps = (at - adjuster.position) / resolution;
  const below = roundToNano(Math.min(high, Math.max(low, adjuster.position + Math.floor(steps + POSITION_NOISE) * resolution)));
  const above = roundToNano(Math.min(high, Math.max(low, adjuster.position + Math.ceil(steps - POSITION_NOISE) * resolution)));
  return below === above ? [below] : [below, above];
}

function isBetter(a: SettableSetting, b: SettableSetting, windows: SagWindows): boolean {
  const byFit = FIT_ORDER[a.fit] - FIT_ORDER[b.fit];
  if (byFit !== 0) return byFit < 0;
  const keys = [
    [windowMiss(a.riderSagMm, windows.riderSagMm), windowMiss(b.riderSagMm, windows.riderSagMm)],
    [middleMiss(a.riderSagMm, windows.riderMiddleMm), middleMiss(b.riderSagMm, windows.riderMiddleMm)],
    [windowMiss(a.staticSagMm, windows.staticSagMm), windowMiss(b.staticSagMm, windows.staticSagMm)],
    [middleMiss(a.staticSagMm, windows.staticMiddleMm), middleMiss(b.staticSagMm, windows.staticMiddleMm)],
  ];
  for (const [x, y] of keys) {
    if (Math.abs(x - y) > 1e-9) return x < y;
  }
  // Equal sags either way: the smaller change, so nothing is turned for nothing.
  return Math.abs(a.changeUnits) < Math.abs(b.changeUnits);
}

function windowMiss(sagMm: number | null, window: RangeMm): number {
  if (sagMm === null) return Number.MAX_VALUE;
  return sagMm < window.min ? window.min - sagMm : sagMm > window.max ? sagMm - window.max : 0;
}

function middleMiss(sagMm: number | null, middleMm: number): number {
  return sagMm === null ? Number.MAX_VALUE : Math.abs(sagMm - middleMm);
}

function intersect(a: RangeMm, b: RangeMm): RangeMm {
  return { min: Math.max(a.min, b.min), max: Math.min(a.max, b.max) };
}

/** The point of a band nearest the value; null for an empty band. */
function clampTo(value: number, band: RangeMm): number | null {
  if (!(band.min <= band.max)) return null;
  return Math.min(band.max, Math.max(band.min, value));
}

function roundToNano(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}
