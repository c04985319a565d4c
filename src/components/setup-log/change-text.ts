import { formatNumber } from '@shared/sizing/format';
import type { DisplayUnits } from '@shared/types/garage';
import type { SettingChange } from '@shared/types/setup-log';

import { formatQuantity } from '../units/format';

/** "Front preload 2 → 3.5 (12.0 → 15.0 mm)", "Rear spring 95 → 105 N/mm", "Front rebound 10 → 8 clicks out". */
export function describeChange(change: SettingChange, units: DisplayUnits): string {
  const end = change.end === 'front' ? 'Front' : 'Rear';
  switch (change.setting) {
    case 'preload':
      return `${end} preload ${formatNumber(change.from, 2)} → ${formatNumber(change.to, 2)} (${formatQuantity(change.fromMm, 'length', units)} → ${formatQuantity(change.toMm, 'length', units)})`;
    case 'spring':
      return `${end} spring ${formatQuantity(change.from.rateNmm, 'rate', units)} → ${formatQuantity(change.to.rateNmm, 'rate', units)}`;
    default: {
      const clicks = (value: number | null) => (value === null ? 'none' : String(value));
      return `${end} ${change.setting} ${clicks(change.from)} → ${clicks(change.to)} clicks out`;
    }
  }
}
