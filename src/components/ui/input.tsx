import { useState, type Ref } from 'react';
import { StyleSheet, TextInput, type TextInputProps } from 'react-native';

import { useTheme } from '@/theme';

export type InputProps = TextInputProps & {
  /** Draws the danger border; the message itself is the caller's to show. */
  invalid?: boolean;
  /** Ids of the texts that describe the input (hint, error), for screen readers on the web. */
  describedBy?: string;
  ref?: Ref<TextInput>;
};

/**
 * A single text box in the theme. React Native's types do not list `aria-invalid` and
 * `aria-describedby`; react-native-web passes them through to the input element.
 */
export function Input({ invalid = false, describedBy, style, onFocus, onBlur, ref, ...rest }: InputProps) {
  const { colors, fonts, radii, sizes, spacing, typography } = useTheme();
  const [focused, setFocused] = useState(false);
  const webAria = { 'aria-invalid': invalid, 'aria-describedby': describedBy } as TextInputProps;
  return (
    <TextInput
      ref={ref}
      placeholderTextColor={colors.textMuted}
      {...webAria}
      {...rest}
      onFocus={(event) => {
        setFocused(true);
        onFocus?.(event);
      }}
      onBlur={(event) => {
        setFocused(false);
        onBlur?.(event);
      }}
      style={[
        styles.base,
        typography.body,
        {
          fontFamily: fonts.sans,
          minHeight: sizes.touchTarget,
          paddingHorizontal: spacing.md,
          paddingVertical: spacing.sm,
          borderRadius: radii.sm,
          color: colors.text,
          backgroundColor: colors.surface,
          borderColor: invalid ? colors.danger : focused ? colors.text : colors.border,
        },
        style,
      ]}
    />
  );
}

const styles = StyleSheet.create({
  base: { borderWidth: 2 },
});
