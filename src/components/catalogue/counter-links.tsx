import { StyleSheet, View } from 'react-native';

import { TextLink } from '@/components/ui/text-link';
import { useTheme } from '@/theme';

/** The catalogue's own actions; the navigation reaches the counter's other screens. */
export function CounterLinks() {
  const { spacing } = useTheme();
  return (
    <View style={[styles.row, { gap: spacing.lg }]}>
      <TextLink href="/counter/springs/new">New spring</TextLink>
      <TextLink href="/counter/movements">Stock movements</TextLink>
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap' } });
