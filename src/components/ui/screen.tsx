import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { useLayout, useTheme } from '@/theme';

export type ScreenProps = {
  children: ReactNode;
  /** `text` keeps lines readable; `table` makes room for the columns of a table. */
  width?: 'text' | 'table';
};

/** A scrolling page whose content sits in one centred column. */
export function Screen({ children, width = 'text' }: ScreenProps) {
  const { colors, spacing, sizes } = useTheme();
  const { isWide } = useLayout();
  return (
    <ScrollView
      style={[styles.scroll, { backgroundColor: colors.background }]}
      // A tap on a button while the keyboard is up presses the button, not just closes the keyboard.
      keyboardShouldPersistTaps="handled"
      contentContainerStyle={{
        paddingHorizontal: isWide ? spacing.xxl : spacing.lg,
        paddingVertical: isWide ? spacing.xxxl : spacing.xl,
      }}
    >
      <View
        style={[
          styles.column,
          {
            maxWidth: width === 'table' ? sizes.wideContentMaxWidth : sizes.contentMaxWidth,
            gap: isWide ? spacing.xl : spacing.lg,
          },
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
