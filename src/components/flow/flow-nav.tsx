import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { useTheme } from '@/theme';

export type FlowNavProps = {
  onBack?: () => void;
  onNext: () => void;
  nextLabel?: string;
  busy?: boolean;
};

/** Back and next, at the foot of every step. */
export function FlowNav({ onBack, onNext, nextLabel = 'Next', busy = false }: FlowNavProps) {
  const { spacing } = useTheme();
  return (
    <View style={{ flexDirection: 'row', justifyContent: 'space-between', gap: spacing.sm }}>
      {onBack ? <Button variant="secondary" label="Back" onPress={onBack} disabled={busy} testID="flow-back" /> : <View />}
      <Button label={busy ? 'Saving…' : nextLabel} onPress={onNext} disabled={busy} testID="flow-next" />
    </View>
  );
}
