import { Text, type TextProps } from 'react-native';

import { useTheme, type ColorName, type TextType } from '@/theme';

export type ThemedTextProps = TextProps & {
  type?: TextType;
  color?: ColorName;
};

/**
 * Titles and headings announce themselves as headers unless the caller says otherwise, at their
 * level of the outline. React Native's types do not list `aria-level`; react-native-web turns it
 * into the h1 or h2 element.
 */
const HEADING_LEVELS: Partial<Record<TextType, number>> = { title: 1, heading: 2 };

export function ThemedText({
  type = 'body',
  color = 'text',
  style,
  accessibilityRole,
  ...rest
}: ThemedTextProps) {
  const { colors, typography } = useTheme();
  const level = accessibilityRole ? undefined : HEADING_LEVELS[type];
  return (
    <Text
      accessibilityRole={level ? 'header' : accessibilityRole}
      {...(level && ({ 'aria-level': level } as TextProps))}
      style={[typography[type], { color: colors[color] }, style]}
      {...rest}
    />
  );
}
