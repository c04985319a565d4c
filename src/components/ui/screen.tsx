import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { useLayout, useTheme } from '@/theme';

export type ScreenProps = {
  children: ReactNode;
};

/** A scrolling page whose content sits in one centred column of readable width. */
export function Screen({ children }: ScreenProps) {
  const { colors, spacing, sizes } = useTheme();
  const { isWide } = useLayout();
  return (
    <ScrollView
      style={[styles.scroll, { backgroundColor: colors.background }]}
      contentContainerStyle={{
        paddingHorizontal: isWide ? spacing.xxl : spacing.lg,
        paddingVertical: isWide ? spacing.xxxl : spacing.xl,
      }}
    >
      <View
        style={[
          styles.column,
          { maxWidth: sizes.contentMaxWidth, gap: isWide ? spacing.xl : spacing.lg },
        ]}
      >
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1 },
  column: { width: '100%', alignSelf: 'center' },
});
