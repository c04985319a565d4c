import type { ReactNode } from 'react';
import { View } from 'react-native';

import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { damperLabel } from '@shared/damping';
import type { Bike } from '@shared/types/bike';
import type { DamperAdjuster, DamperKind } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { describeSetting, END_WORDS } from './ride-words';

const ENDS: readonly EndKind[] = ['front', 'rear'];

export type DampersSummaryProps = {
  bike: Bike;
  /** The shop's adjuster kinds, for their labels; the trade's names stand in until they load. */
  kinds?: readonly DamperKind[];
  /** What to do next with them, under the list (the bike page's way to the test ride). */
  children?: ReactNode;
};

/** Each damping adjuster as it is set now, with the maker's standard beside it. */
export function DampersSummary({ bike, kinds, children }: DampersSummaryProps) {
  const { spacing } = useTheme();
  const ends = ENDS.filter((end) => (bike[end]?.dampers.length ?? 0) > 0);
  return (
    <Card testID="dampers-summary">
      <ThemedText type="heading">Dampers</ThemedText>
      {ends.length === 0 ? (
        <ThemedText color="textMuted">No damping adjusters recorded. Add each one, with its maker’s standard setting, to the bike’s values.</ThemedText>
      ) : (
        ends.map((end) => (
          <View key={end} style={{ gap: spacing.xs }}>
            <ThemedText type="label">{END_WORDS[end]}</ThemedText>
            {bike[end]!.dampers.map((damper) => (
              <DamperSettingRow key={damper.kind} damper={damper} kinds={kinds} testID={`dampers-${end}-${damper.kind}`} />
            ))}
          </View>
        ))
      )}
      {children}
    </Card>
  );
}

type DamperSettingRowProps = { damper: DamperAdjuster; kinds?: readonly DamperKind[]; testID: string };

/**
 * One adjuster: its name on the left, the setting now and the maker's standard under it on the
 * right. The name gives way (wraps) so the figures keep their column on a phone.
 */
export function DamperSettingRow({ damper, kinds, testID }: DamperSettingRowProps) {
  const { spacing, colors } = useTheme();
  return (
    <View testID={testID} style={{ flexDirection: 'row', gap: spacing.md, borderTopWidth: 1, borderColor: colors.border, paddingTop: spacing.xs }}>
      <ThemedText style={{ flex: 1 }}>{damperLabel(damper.kind, kinds)}</ThemedText>
      <View style={{ alignItems: 'flex-end', flexShrink: 0 }}>
        <ThemedText type="figure" testID={`${testID}-now`}>
          {describeSetting(damper.unit, damper.position)}
        </ThemedText>
        <ThemedText type="caption" color="textMuted" testID={`${testID}-standard`}>
          {damper.standard === null ? 'maker’s standard not known' : `maker’s standard ${describeSetting(damper.unit, damper.standard)}`}
        </ThemedText>
      </View>
    </View>
  );
}
