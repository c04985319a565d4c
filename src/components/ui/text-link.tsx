import { Link, type Href } from 'expo-router';

import { useTheme, type TextType } from '@/theme';

export type TextLinkProps = {
  href: Href;
  children: string;
  type?: TextType;
  /** Opens another page in a new tab, as a link in a mail would; links within the app stay in it. */
  external?: boolean;
};

/** A link in running text: accent coloured and underlined, so it reads as a link without colour too. */
export function TextLink({ href, children, type = 'body', external = false }: TextLinkProps) {
  const { colors, typography } = useTheme();
  return (
    <Link
      href={href}
      {...(external && { target: '_blank', rel: 'noopener noreferrer' })}
      style={[typography[type], { color: colors.accent, textDecorationLine: 'underline' }]}
    >
      {children}
    </Link>
  );
}
