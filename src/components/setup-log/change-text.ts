import { damperName, type DamperLabels } from '@shared/setup/damper-words';
import { unitWord } from '@shared/damping/adjuster-range';
import { formatNumber } from '@shared/sizing/format';
import type { DisplayUnits } from '@shared/types/garage';
import type { SettingChange } from '@shared/types/setup-log';

import { formatQuantity } from '../units/format';

/**
 * "Front preload 2 → 3.5 (12.0 → 15.0 mm)", "Rear spring 95 → 105 N/mm", "Front rebound 10 → 12
 * clicks out", "Rear high-speed compression 1.25 → 1.5 turns out". `labels` name the damping
 * adjusters from the shop's list; a kind not on it reads as its key.
 */
export function describeChange(change: SettingChange, units: DisplayUnits, labels: DamperLabels = {}): string {
  const end = change.end === 'front' ? 'Front' : 'Rear';
  switch (change.setting) {
    case 'preload':
      return `${end} preload ${formatNumber(change.from, 2)} → ${formatNumber(change.to, 2)} (${formatQuantity(change.fromMm, 'length', units)} → ${formatQuantity(change.toMm, 'length', units)})`;
    case 'spring':
      return `${end} spring ${formatQuantity(change.from.rateNmm, 'rate', units)} → ${formatQuantity(change.to.rateNmm, 'rate', units)}`;
    case 'damper': {
      // An adjuster added or removed since has no setting on that side.
      const setting = (value: number | null) => (value === null ? 'none' : formatNumber(value, 2));
      const last = change.to ?? change.from ?? 0;
      return `${end} ${damperName(change.adjuster, labels)} ${setting(change.from)} → ${setting(change.to)} ${unitWord(change.unit, last)} out`;
    }
  }
}
