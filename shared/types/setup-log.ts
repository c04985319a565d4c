/**
 * The setup log of one bike: every saved pass and every change to its springs, preload and
 * damping adjusters, with the settings before and after; and the plan that undoes everything back
 * to the baseline (the settings before the first entry).
 */

import type { PreloadDirection } from './bike';
import type { DamperUnit } from './damping';
import type { SizingRecordSummary } from './garage';
import type { AdjusterUnit, EndKind } from './sizing';

export interface SpringSetting {
  rateNmm: number;
  secondRateNmm: number | null;
  breakMm: number | null;
  family: string;
}

/** What a person changes on one end with a spanner: the spring, the preload adjuster, the damping adjusters. */
export interface EndSettings extends SpringSetting {
  preloadMm: number;
  /** The preload adjuster's setting, in its units (turns, steps, spacer mm) from its zero. */
  preloadPosition: number;
  /** Each damping adjuster's setting by its kind, out from fully closed in its own unit; an adjuster the end lacks is absent. */
  dampers: Record<string, number>;
}

export interface SetupSettings {
  front: EndSettings | null;
  rear: EndSettings | null;
}

export type SettingChange =
  | { end: EndKind; setting: 'spring'; from: SpringSetting; to: SpringSetting }
  | { end: EndKind; setting: 'preload'; from: number; to: number; fromMm: number; toMm: number }
  /**
   * A null side: the adjuster was not on the bike then. `unit` is the adjuster's unit on the bike
   * now; for one gone from it, turns when a setting is a part turn, else clicks.
   */
  | { end: EndKind; setting: 'damper'; adjuster: string; unit: DamperUnit; from: number | null; to: number | null };

export const SETUP_ENTRY_KINDS = ['pass', 'change'] as const;

export type SetupEntryKind = (typeof SETUP_ENTRY_KINDS)[number];

export interface SetupLogEntry {
  id: number;
  bikeId: number;
  /** 'pass': a saved sizing (before equals after); 'change': the rider turned, clicked or swapped something. */
  kind: SetupEntryKind;
  note: string;
  createdAt: string;
  createdById: number | null;
  before: SetupSettings;
  after: SetupSettings;
  /** The differences between before and after, one per setting. */
  changes: SettingChange[];
  /** The pass this entry saved, for kind 'pass'. */
  sizing: SizingRecordSummary | null;
}

/** GET /api/bikes/:id/setup-log. */
export interface SetupLog {
  /** Oldest first. */
  entries: SetupLogEntry[];
  /** The settings before the first entry; null while the log is empty. */
  baseline: SetupSettings | null;
  current: SetupSettings;
}

/** A new spring in place of the fitted one. Preload defaults to what the adjuster gave the old spring. */
export interface SpringSwapInput {
  rateNmm: number;
  family?: string;
  secondRateNmm?: number | null;
  breakMm?: number | null;
  /** The new spring's preload at the adjuster's setting after this change. */
  preloadMm?: number;
}

export interface EndChangeInput {
  preloadPosition?: number;
  /** Kind -> new setting, out from fully closed in the adjuster's unit. */
  dampers?: Record<string, number>;
  spring?: SpringSwapInput;
}

/** POST /api/bikes/:id/setup-log. */
export interface SetupChangeInput {
  note?: string;
  front?: EndChangeInput;
  rear?: EndChangeInput;
}

/** How a preload adjuster is worked: a turning direction, or a spacer made longer or shorter. */
export type PreloadWay = PreloadDirection | 'shorter spacer';

export interface PreloadUndo {
  fromPosition: number;
  toPosition: number;
  /** Signed, in the adjuster's units: positive adds preload. */
  changeUnits: number;
  amount: number;
  unit: AdjusterUnit;
  direction: 'add' | 'remove';
  way: PreloadWay;
  instruction: string;
}

export interface DamperUndo {
  /** The adjuster's kind. */
  adjuster: string;
  unit: DamperUnit;
  from: number;
  to: number;
  /** How far to turn, in `unit`. */
  amount: number;
  /** Out is less damping. */
  direction: 'in' | 'out';
  instruction: string;
}

export interface SpringUndo {
  from: SpringSetting;
  to: SpringSetting;
  instruction: string;
}

export interface EndUndo {
  end: EndKind;
  atBaseline: boolean;
  spring: SpringUndo | null;
  preload: PreloadUndo | null;
  dampers: DamperUndo[];
}

/** GET /api/bikes/:id/setup-log/back-to-baseline. */
export interface BackToBaseline {
  atBaseline: boolean;
  front: EndUndo | null;
  rear: EndUndo | null;
  /** The instructions in working order: springs first (preload backed off), then preload, then damping adjusters. */
  steps: string[];
  /** What the plan cannot undo, e.g. an end added to the bike since the baseline. */
  notes: string[];
}
