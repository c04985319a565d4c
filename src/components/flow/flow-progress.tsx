import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import type { EndKind } from '@shared/types/sizing';
import type { MeasuringStep } from '@shared/types/garage';
import { useTheme } from '@/theme';

import { stepsFor } from './measure-state';

export const STEP_LABELS: Record<MeasuringStep, string> = {
  'weigh-in': 'Weigh-in',
  ends: 'Which ends',
  'front-extended': 'Front: extended',
  'front-static': 'Front: on its wheels',
  'front-rider': 'Front: rider aboard',
  'rear-extended': 'Rear: extended',
  'rear-static': 'Rear: on its wheels',
  'rear-rider': 'Rear: rider aboard',
  review: 'Check and work out',
};

/** "Step 3 of 9" with a bar filled that far. */
export function FlowProgress({ step, ends }: { step: MeasuringStep; ends: readonly EndKind[] | undefined }) {
  const { colors, radii, spacing } = useTheme();
  const list = stepsFor(ends);
  const index = Math.max(0, list.indexOf(step));
  return (
    <View style={{ gap: spacing.xs }} testID="flow-progress">
      <ThemedText type="overline" color="textMuted">
        Step {index + 1} of {list.length} · {STEP_LABELS[step]}
      </ThemedText>
      <View
        role="progressbar"
        aria-valuenow={index + 1}
        aria-valuemin={1}
        aria-valuemax={list.length}
        style={{ height: 6, borderRadius: radii.pill, backgroundColor: colors.border, overflow: 'hidden' }}
      >
        <View style={{ width: `${((index + 1) / list.length) * 100}%`, height: '100%', backgroundColor: colors.accent }} />
      </View>
    </View>
  );
}
