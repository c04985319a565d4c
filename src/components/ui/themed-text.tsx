import { Text, type TextProps } from 'react-native';

import { useTheme, type ColorName, type TextType } from '@/theme';

export type ThemedTextProps = TextProps & {
  type?: TextType;
  color?: ColorName;
};

/** Titles and headings announce themselves as headers unless the caller says otherwise. */
const HEADER_TYPES: readonly TextType[] = ['title', 'heading'];

export function ThemedText({
  type = 'body',
  color = 'text',
  style,
  accessibilityRole,
  ...rest
}: ThemedTextProps) {
  const { colors, typography } = useTheme();
  return (
    <Text
      accessibilityRole={accessibilityRole ?? (HEADER_TYPES.includes(type) ? 'header' : undefined)}
      style={[typography[type], { color: colors[color] }, style]}
      {...rest}
    />
  );
}
