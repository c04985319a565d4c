import type { Ref } from 'react';
import {
  Pressable,
  StyleSheet,
  type PressableProps,
  type PressableStateCallbackType,
  type StyleProp,
  type View,
  type ViewStyle,
} from 'react-native';

import { useTheme, type ColorName } from '@/theme';

import { ThemedText } from './themed-text';

export type ButtonVariant = 'primary' | 'secondary';

export type ButtonProps = Omit<PressableProps, 'children' | 'style'> & {
  label: string;
  variant?: ButtonVariant;
  style?: StyleProp<ViewStyle>;
  /** Passed through so expo-router's `<Link asChild>` can wrap a button. */
  ref?: Ref<View>;
};

/** react-native-web also reports hover and keyboard focus; native types only know `pressed`. */
type PressState = PressableStateCallbackType & { hovered?: boolean; focused?: boolean };

const VARIANTS: Record<
  ButtonVariant,
  { fill: ColorName; fillActive: ColorName; text: ColorName; border: ColorName }
> = {
  primary: { fill: 'accent', fillActive: 'text', text: 'onAccent', border: 'accent' },
  secondary: { fill: 'surface', fillActive: 'accentSoft', text: 'text', border: 'border' },
};

export function Button({
  label,
  variant = 'primary',
  disabled,
  style,
  ref,
  ...rest
}: ButtonProps) {
  const { colors, radii, spacing, sizes } = useTheme();
  const tokens = VARIANTS[variant];
  return (
    <Pressable
      ref={ref}
      accessibilityRole="button"
      disabled={disabled}
      style={(state) => {
        const { pressed, hovered, focused } = state as PressState;
        const active = pressed || hovered;
        return [
          styles.base,
          {
            minHeight: sizes.touchTarget,
            paddingHorizontal: spacing.lg,
            borderRadius: radii.sm,
            backgroundColor: colors[active ? tokens.fillActive : tokens.fill],
            borderColor: colors[focused ? 'text' : active ? tokens.fillActive : tokens.border],
            opacity: disabled ? 0.5 : 1,
          },
          style,
        ];
      }}
      {...rest}
    >
      <ThemedText type="label" color={tokens.text} selectable={false}>
        {label}
      </ThemedText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    alignItems: 'center',
    justifyContent: 'center',
    alignSelf: 'flex-start',
    borderWidth: 2,
  },
});
