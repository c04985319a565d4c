import { View } from 'react-native';

import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';

const EDITORS = [
  { href: '/admin/bike-models', label: 'Bike models' },
  { href: '/admin/target-profiles', label: 'Target profiles' },
  { href: '/admin/engine-settings', label: 'Engine settings' },
  { href: '/admin/damping-rules', label: 'Damping rules' },
  { href: '/admin/shop-settings', label: 'Shop settings' },
  { href: '/admin/audit', label: 'Audit' },
] as const;

/**
 * The admin's shop data editors, linked from each of them: the frame's navigation holds one entry
 * for all of them, so the side column stays short enough for a laptop screen.
 */
export function ShopDataLinks({ current }: { current: (typeof EDITORS)[number]['href'] }) {
  const { spacing } = useTheme();
  return (
    <View aria-label="Shop data" testID="shop-data-links" style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md }}>
      {EDITORS.map((editor) =>
        editor.href === current ? (
          <ThemedText key={editor.href} type="bodyStrong" aria-current="page">
            {editor.label}
          </ThemedText>
        ) : (
          <TextLink key={editor.href} href={editor.href}>
            {editor.label}
          </TextLink>
        ),
      )}
    </View>
  );
}
