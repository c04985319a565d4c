import type { ReactNode } from 'react';
import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';

/** A small caption above a control that carries no label of its own (a chip row, a pair of boxes). */
export function Labelled({ label, children }: { label: string; children: ReactNode }) {
  const { spacing } = useTheme();
  return (
    <View style={{ gap: spacing.xs }}>
      <ThemedText type="caption" color="textMuted">
        {label}
      </ThemedText>
      {children}
    </View>
  );
}
