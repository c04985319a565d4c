import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { useTheme } from '@/theme';

import { ThemedText } from './themed-text';

/** A spinner with a word on what is on its way. */
export function LoadingState({ label }: { label: string }) {
  const { colors, spacing } = useTheme();
  return (
    <View role="status" aria-live="polite" style={[styles.row, { gap: spacing.sm, padding: spacing.lg }]}>
      <ActivityIndicator color={colors.accent} />
      <ThemedText color="textMuted">{label}</ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center' },
});
