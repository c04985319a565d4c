import { Pressable, StyleSheet, View } from 'react-native';

import { useTheme } from '@/theme';

import { ThemedText } from './themed-text';

export type Choice<T extends string> = { value: T; label: string };

export type SegmentedChoiceProps<T extends string> = {
  /** Names the group for screen readers. */
  label: string;
  options: readonly Choice<T>[];
  value: T | undefined;
  onChange: (value: T) => void;
  disabled?: boolean;
  invalid?: boolean;
  testID?: string;
};

/** One of a few options, all in view: a row of segments that acts as a radio group. */
export function SegmentedChoice<T extends string>({
  label,
  options,
  value,
  onChange,
  disabled = false,
  invalid = false,
  testID,
}: SegmentedChoiceProps<T>) {
  const { colors, radii, sizes, spacing } = useTheme();
  return (
    <View
      role="radiogroup"
      aria-label={label}
      testID={testID}
      style={[
        styles.row,
        {
          borderRadius: radii.sm,
          borderColor: invalid ? colors.danger : colors.border,
          backgroundColor: colors.surface,
          opacity: disabled ? 0.6 : 1,
        },
      ]}
    >
      {options.map((option, index) => {
        const selected = option.value === value;
        return (
          <Pressable
            key={option.value}
            role="radio"
            aria-checked={selected}
            aria-label={option.label}
            disabled={disabled}
            onPress={() => {
              if (!selected) onChange(option.value);
            }}
            style={({ pressed }) => [
              styles.segment,
              {
                minHeight: sizes.touchTarget,
                paddingHorizontal: spacing.md,
                borderLeftWidth: index === 0 ? 0 : 1,
                borderLeftColor: colors.border,
                backgroundColor: selected ? colors.text : pressed ? colors.accentSoft : 'transparent',
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
  row: { flexDirection: 'row', alignSelf: 'flex-start', borderWidth: 2, overflow: 'hidden' },
  segment: { alignItems: 'center', justifyContent: 'center', flexGrow: 1 },
});
