import { Pressable, StyleSheet, View } from 'react-native';

import type { Choice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';

export type ChipChoiceProps<T extends string> = {
  label: string;
  options: readonly Choice<T>[];
  value: T | undefined;
  onChange: (value: T) => void;
};

/**
 * One of many options as separate chips that wrap onto more lines: the segmented row does not
 * fit a phone once there are more than three or four options (sort keys, families, bike models).
 */
export function ChipChoice<T extends string>({ label, options, value, onChange }: ChipChoiceProps<T>) {
  const { colors, radii, sizes, spacing } = useTheme();
  return (
    <View role="radiogroup" aria-label={label} style={[styles.row, { gap: spacing.xs }]}>
      {options.map((option) => {
        const selected = option.value === value;
        return (
          <Pressable
            key={option.value}
            role="radio"
            aria-checked={selected}
            aria-label={option.label}
            onPress={() => {
              if (!selected) onChange(option.value);
            }}
            style={({ pressed }) => [
              styles.chip,
              {
                minHeight: sizes.touchTarget,
                paddingHorizontal: spacing.md,
                borderRadius: radii.sm,
                borderColor: selected ? colors.text : colors.border,
                backgroundColor: selected ? colors.text : pressed ? colors.accentSoft : colors.surface,
              },
            ]}
          >
            <ThemedText type="label" color={selected ? 'surface' : 'text'} selectable={false}>
              {option.label}
            </ThemedText>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap' },
  // A label longer than the row wraps inside its chip instead of running past the container.
  chip: { alignItems: 'center', justifyContent: 'center', borderWidth: 2, maxWidth: '100%' },
});
