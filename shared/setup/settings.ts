/**
 * The settings a person changes on a bike (springs, preload adjuster, damping adjusters): read from
 * the bike, compared between two moments, and changed as the rider reports it in the setup log.
 */

import { checkDamperSetting, isWholeStep } from '../damping/adjuster-range';
import type { BikeSpec, FrontSpec, RearSpec } from '../types/bike';
import type { DamperUnit } from '../types/damping';
import type { EndKind } from '../types/sizing';
import type { EndChangeInput, EndSettings, SettingChange, SetupChangeInput, SetupSettings, SpringSetting } from '../types/setup-log';
import { formatNumber } from '../sizing/format';
import { damperName } from './damper-words';

const ENDS: readonly EndKind[] = ['front', 'rear'];

/** Positions are set by hand in quarter turns or whole clicks; float noise from pitch x turns is not a change. */
function tidy(value: number): number {
  return Math.round(value * 1e9) / 1e9;
}

export function endSettingsOf(spec: FrontSpec | RearSpec): EndSettings {
  return {
    rateNmm: spec.rateNmm,
    secondRateNmm: spec.secondRateNmm,
    breakMm: spec.breakMm,
    family: spec.family,
    preloadMm: spec.preloadMm,
    preloadPosition: spec.adjuster.position,
    dampers: Object.fromEntries(spec.dampers.map((damper) => [damper.kind, damper.position])),
  };
}

export function settingsOf(bike: Pick<BikeSpec, 'front' | 'rear'>): SetupSettings {
  return { front: bike.front ? endSettingsOf(bike.front) : null, rear: bike.rear ? endSettingsOf(bike.rear) : null };
}

export function springOf(settings: SpringSetting): SpringSetting {
  return { rateNmm: settings.rateNmm, secondRateNmm: settings.secondRateNmm, breakMm: settings.breakMm, family: settings.family };
}

export function isSameSpring(a: SpringSetting, b: SpringSetting): boolean {
  return a.rateNmm === b.rateNmm && a.secondRateNmm === b.secondRateNmm && a.breakMm === b.breakMm && a.family === b.family;
}

/** Per end, each damping adjuster's unit by its kind: the settings hold positions only. */
export type DamperUnits = Partial<Record<EndKind, Readonly<Record<string, DamperUnit>>>>;

export function damperUnitsOf(bike: Pick<BikeSpec, 'front' | 'rear'>): DamperUnits {
  const units: DamperUnits = {};
  for (const end of ENDS) {
    const spec = bike[end];
    if (spec) units[end] = Object.fromEntries(spec.dampers.map((damper) => [damper.kind, damper.unit]));
  }
  return units;
}

/** An adjuster no longer on the bike has no unit to look up: a part turn says turns, whole numbers are read as clicks. */
export function damperUnitFor(units: DamperUnits, end: EndKind, kind: string, values: (number | null)[]): DamperUnit {
  const known = units[end]?.[kind];
  if (known) return known;
  return values.every((value) => value === null || isWholeStep('clicks', value)) ? 'clicks' : 'turns';
}

function diffDampers(end: EndKind, from: EndSettings, to: EndSettings, units: DamperUnits): SettingChange[] {
  const kinds = [...new Set([...Object.keys(from.dampers), ...Object.keys(to.dampers)])];
  return kinds.flatMap((kind): SettingChange[] => {
    const was = from.dampers[kind] ?? null;
    const is = to.dampers[kind] ?? null;
    if (was === is) return [];
    return [{ end, setting: 'damper', adjuster: kind, unit: damperUnitFor(units, end, kind, [was, is]), from: was, to: is }];
  });
}

/**
 * One change per setting that differs, front before rear; damping adjusters in the order the bike
 * lists them. `units` names each adjuster's unit (the bike's as it is now, `damperUnitsOf`).
 */
export function diffSettings(before: SetupSettings, after: SetupSettings, units: DamperUnits = {}): SettingChange[] {
  const changes: SettingChange[] = [];
  for (const end of ENDS) {
    const from = before[end];
    const to = after[end];
    if (!from || !to) continue;
    if (!isSameSpring(from, to)) changes.push({ end, setting: 'spring', from: springOf(from), to: springOf(to) });
    if (from.preloadPosition !== to.preloadPosition || from.preloadMm !== to.preloadMm) {
      changes.push({ end, setting: 'preload', from: from.preloadPosition, to: to.preloadPosition, fromMm: from.preloadMm, toMm: to.preloadMm });
    }
    changes.push(...diffDampers(end, from, to, units));
  }
  return changes;
}

export type ChangeOutcome = { ok: true; bike: BikeSpec } | { ok: false; fields: Record<string, string> };

const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

function applyEndChange<S extends FrontSpec | RearSpec>(end: EndKind, spec: S, change: EndChangeInput, fields: Record<string, string>): S {
  const next: S = { ...spec, adjuster: { ...spec.adjuster }, dampers: spec.dampers.map((damper) => ({ ...damper })) };
  if (change.spring) {
    next.rateNmm = change.spring.rateNmm;
    next.family = change.spring.family ?? spec.family;
    next.secondRateNmm = change.spring.secondRateNmm ?? null;
    next.breakMm = change.spring.breakMm ?? null;
  }
  if (change.preloadPosition !== undefined) {
    const min = spec.adjuster.minPosition ?? 0;
    const max = spec.adjuster.maxPosition;
    if (change.preloadPosition < min || change.preloadPosition > max) {
      fields[`${end}.preloadPosition`] = `The ${PART[end]}'s preload adjuster goes from ${formatNumber(min, 2)} to ${formatNumber(max, 2)}: count the setting from its zero again.`;
    }
    next.adjuster.position = change.preloadPosition;
  }
  // The spring's preload follows the adjuster; a new spring's own preload, when given, is at the new setting.
  const moved = (next.adjuster.position - spec.adjuster.position) * spec.adjuster.mmPerUnit;
  next.preloadMm = tidy(change.spring?.preloadMm ?? spec.preloadMm + moved);
  if (next.preloadMm < 0) {
    fields[`${end}.preloadPosition`] ??= `That setting leaves the ${PART[end]} spring with less than no preload: check the setting and the spring's preload.`;
  }
  for (const [kind, position] of Object.entries(change.dampers ?? {})) {
    const damper = next.dampers.find((d) => d.kind === kind);
    const problem = damper
      ? checkDamperSetting(damper, position)
      : `The ${PART[end]} has no ${damperName(kind)} adjuster recorded: add it to the bike first.`;
    if (problem) fields[`${end}.dampers.${kind}`] = problem;
    else if (damper) damper.position = position;
  }
  return next;
}

/**
 * The bike after the change, or a message per field the bike cannot take: a setting beyond an
 * adjuster's range or between its steps, an adjuster the end does not have.
 */
export function applySetupChange(bike: BikeSpec, change: SetupChangeInput): ChangeOutcome {
  const fields: Record<string, string> = {};
  const next: BikeSpec = { ...bike };
  for (const end of ENDS) {
    const endChange = change[end];
    if (!endChange) continue;
    const spec = bike[end];
    if (!spec) {
      fields[end] = `This bike has no ${PART[end]} recorded: add it to the bike first.`;
      continue;
    }
    if (end === 'front') next.front = applyEndChange(end, spec as FrontSpec, endChange, fields);
    else next.rear = applyEndChange(end, spec as RearSpec, endChange, fields);
  }
  if (Object.keys(fields).length > 0) return { ok: false, fields };
  if (diffSettings(settingsOf(bike), settingsOf(next)).length === 0) {
    return { ok: false, fields: { '': 'Nothing changed: every setting given is what the bike has now.' } };
  }
  return { ok: true, bike: next };
}
