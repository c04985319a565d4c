import { StyleSheet, View } from 'react-native';
import Svg, { Path } from 'react-native-svg';

import { useTheme } from '@/theme';

import { Card } from './card';
import { ThemedText } from './themed-text';

/** Shown wherever the app leads someone towards taking a spring off or changing a setting. */
export const SAFETY_CAUTIONS = [
  'A loaded spring stores dangerous energy. Never release one that is still compressed.',
  'Use proper spring compressors to take a spring off or fit one.',
  'Record every change you make (spring, preload, clicks) so it can be undone.',
  "Follow the motorcycle maker's service manual for procedures and torque values.",
  'When in doubt, stop and ask a qualified mechanic.',
  'Local rules may apply to changes made to a road vehicle.',
] as const;

export type SafetyNoticeProps = {
  title?: string;
};

export function SafetyNotice({ title = 'Work safely' }: SafetyNoticeProps) {
  const { colors, spacing } = useTheme();
  return (
    <Card tone="warning" testID="safety-notice">
      <View style={[styles.header, { gap: spacing.sm }]}>
        <WarningIcon color={colors.warning} knockout={colors.warningSoft} />
        <ThemedText type="heading">{title}</ThemedText>
      </View>
      <View role="list" style={{ gap: spacing.sm }}>
        {SAFETY_CAUTIONS.map((caution) => (
          // `accessible` makes each caution one element for a native screen reader; the web
          // ignores it and reads the list item.
          <View key={caution} role="listitem" accessible style={[styles.item, { gap: spacing.sm }]}>
            <View style={[styles.bullet, { backgroundColor: colors.warning }]} />
            <ThemedText style={styles.itemText}>{caution}</ThemedText>
          </View>
        ))}
      </View>
    </Card>
  );
}

/** A filled triangle whose mark is cut out in the card's own background. */
function WarningIcon({ color, knockout }: { color: string; knockout: string }) {
  return (
    <Svg width={22} height={22} viewBox="0 0 24 24" accessibilityElementsHidden>
      <Path d="M12 2.5 22.5 21h-21L12 2.5Z" fill={color} />
      <Path d="M12 9v5.5" stroke={knockout} strokeWidth={2.2} strokeLinecap="round" />
      <Path d="M12 17.6v.1" stroke={knockout} strokeWidth={2.6} strokeLinecap="round" />
    </Svg>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', alignItems: 'center' },
  item: { flexDirection: 'row', alignItems: 'flex-start' },
  // Centred on the first line of body text (24px line height).
  bullet: { width: 6, height: 6, marginTop: 9, borderRadius: 1 },
  itemText: { flex: 1 },
});
