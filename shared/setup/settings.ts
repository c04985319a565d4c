/**
 * The settings a person changes on a bike (springs, preload adjuster, clickers): read from the bike,
 * compared between two moments, and changed as the rider reports it in the setup log.
 */

import type { BikeSpec, FrontSpec, RearSpec } from '../types/bike';
import type { EndKind } from '../types/sizing';
import type { EndChangeInput, EndSettings, SettingChange, SetupChangeInput, SetupSettings, SpringSetting } from '../types/setup-log';
import { formatNumber } from '../sizing/format';

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
    rebound: spec.clickers.rebound?.position ?? null,
    compression: spec.clickers.compression?.position ?? null,
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

/** One change per setting that differs, front before rear. */
export function diffSettings(before: SetupSettings, after: SetupSettings): SettingChange[] {
  const changes: SettingChange[] = [];
  for (const end of ENDS) {
    const from = before[end];
    const to = after[end];
    if (!from || !to) continue;
    if (!isSameSpring(from, to)) changes.push({ end, setting: 'spring', from: springOf(from), to: springOf(to) });
    if (from.preloadPosition !== to.preloadPosition || from.preloadMm !== to.preloadMm) {
      changes.push({ end, setting: 'preload', from: from.preloadPosition, to: to.preloadPosition, fromMm: from.preloadMm, toMm: to.preloadMm });
    }
    if (from.rebound !== to.rebound) changes.push({ end, setting: 'rebound', from: from.rebound, to: to.rebound });
    if (from.compression !== to.compression) changes.push({ end, setting: 'compression', from: from.compression, to: to.compression });
  }
  return changes;
}

export type ChangeOutcome = { ok: true; bike: BikeSpec } | { ok: false; fields: Record<string, string> };

const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

function applyEndChange<S extends FrontSpec | RearSpec>(end: EndKind, spec: S, change: EndChangeInput, fields: Record<string, string>): S {
  const next: S = { ...spec, adjuster: { ...spec.adjuster }, clickers: { ...spec.clickers } };
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
  for (const kind of ['rebound', 'compression'] as const) {
    const position = change[kind];
    if (position === undefined) continue;
    const clicker = spec.clickers[kind];
    if (!clicker) {
      fields[`${end}.${kind}`] = `The ${PART[end]} has no ${kind} clicker recorded: add it to the bike first.`;
    } else if (position > clicker.maxPosition) {
      fields[`${end}.${kind}`] = `The ${kind} clicker has ${clicker.maxPosition} clicks: count again from fully closed.`;
    } else {
      next.clickers[kind] = { ...clicker, position };
    }
  }
  return next;
}

/** The bike after the change, or a message per field the bike cannot take (a setting beyond the adjuster's range). */
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
