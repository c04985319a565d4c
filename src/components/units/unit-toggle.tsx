import { View } from 'react-native';

import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useUnits } from '@/hooks/use-units';
import { RATE_UNITS } from '@shared/garage/units';
import type { UnitSystem } from '@shared/types/garage';
import type { RateUnit } from '@shared/units';
import { useTheme } from '@/theme';

const SYSTEMS = [
  { value: 'metric', label: 'mm · kg' },
  { value: 'imperial', label: 'in · lb' },
] as const satisfies readonly { value: UnitSystem; label: string }[];

const RATES = RATE_UNITS.map((unit) => ({ value: unit, label: unit }));

/** Metric or imperial, and the spring-rate unit; kept on the profile for every screen. */
export function UnitToggle() {
  const { spacing } = useTheme();
  const { units, setUnits } = useUnits();
  return (
    <View style={{ gap: spacing.sm }} testID="unit-toggle">
      <ThemedText type="overline" color="textMuted">
        Units
      </ThemedText>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
        <SegmentedChoice
          label="Lengths and masses"
          options={SYSTEMS}
          value={units.system}
          onChange={(system) => void setUnits({ system })}
          testID="unit-system"
        />
        <SegmentedChoice<RateUnit>
          label="Spring rates"
          options={RATES}
          value={units.rateUnit}
          onChange={(rateUnit) => void setUnits({ rateUnit })}
          testID="unit-rate"
        />
      </View>
    </View>
  );
}
