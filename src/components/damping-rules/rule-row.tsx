import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ApiError } from '@/api/client';
import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';
import type { DampingRulePatchInput } from '@shared/schemas/damping.schema';
import type { DamperKind } from '@shared/types/damping';
import { useLayout, useTheme } from '@/theme';

import { RuleEditForm } from './rule-edit-form';
import { directionWords, sourceWords, type OrderedRule } from './rule-groups';

/** 1st, 2nd, 3rd, 4th … 11th, 12th, 13th, 21st. */
function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : ({ 1: 'st', 2: 'nd', 3: 'rd' } as Record<number, string>)[n % 10] ?? 'th';
  return `${n}${suffix}`;
}

export type RuleRowProps = {
  row: OrderedRule;
  kinds: readonly DamperKind[];
  /** Set for the admin: the row can be edited and switched off or on. */
  onSave?: (id: number, patch: DampingRulePatchInput) => Promise<unknown>;
  editing: boolean;
  setEditing: (editing: boolean) => void;
};

/** One row of the table: the adjuster and which way, why, what to feel for, where it comes from, whether it is tried. */
export function RuleRow({ row, kinds, onSave, editing, setEditing }: RuleRowProps) {
  const { colors, spacing } = useTheme();
  const { isWide } = useLayout();
  const { rule, tried } = row;
  const [switching, setSwitching] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const id = `rule-${rule.id}`;

  async function switchActive() {
    if (!onSave) return;
    setSwitching(true);
    setProblem(null);
    try {
      await onSave(rule.id, { active: !rule.active });
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The rule could not be changed.');
    } finally {
      setSwitching(false);
    }
  }

  return (
    <View role="listitem" testID={id} style={{ gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderColor: colors.border }}>
      <View style={[styles.wrapRow, { gap: spacing.sm }]}>
        <View style={styles.grow}>
          <ThemedText type="bodyStrong">
            <ThemedText type="bodyStrong" testID={`${id}-adjuster`}>
              {rule.adjusterLabel}
            </ThemedText>
            {': '}
            <ThemedText type="bodyStrong" testID={`${id}-direction`}>
              {directionWords(rule.direction)}
            </ThemedText>
          </ThemedText>
          <ThemedText type="caption" color="textMuted">
            <ThemedText type="caption" color={tried ? 'success' : 'textMuted'} testID={`${id}-state`}>
              {tried ? `Active, tried ${ordinal(tried)}` : 'Switched off, not tried'}
            </ThemedText>
            {` · priority ${rule.priority} · `}
            <ThemedText type="caption" color="textMuted" testID={`${id}-source`}>
              {sourceWords(rule.source)}
            </ThemedText>
          </ThemedText>
        </View>
        {onSave && !editing && (
          <View style={[styles.wrapRow, { gap: spacing.sm }]}>
            <Button variant="secondary" label="Edit" accessibilityLabel={`Edit rule ${rule.id}`} onPress={() => setEditing(true)} testID={`${id}-edit`} />
            <Button
              variant="secondary"
              label={switching ? 'Saving…' : rule.active ? 'Switch off' : 'Switch on'}
              accessibilityLabel={`${rule.active ? 'Switch off' : 'Switch on'} rule ${rule.id}`}
              disabled={switching}
              onPress={() => void switchActive()}
              testID={`${id}-active`}
            />
          </View>
        )}
      </View>
      {problem && (
        <ThemedText role="alert" color="danger">
          {problem}
        </ThemedText>
      )}
      {editing && onSave ? (
        <RuleEditForm rule={rule} kinds={kinds} onSave={onSave} onClose={() => setEditing(false)} />
      ) : (
        <View style={{ flexDirection: isWide ? 'row' : 'column', gap: isWide ? spacing.xl : spacing.sm }}>
          <View style={isWide && styles.half}>
            <ThemedText type="caption" color="textMuted">
              Why
            </ThemedText>
            <ThemedText testID={`${id}-why`}>{rule.why}</ThemedText>
          </View>
          <View style={isWide && styles.half}>
            <ThemedText type="caption" color="textMuted">
              What to feel for
            </ThemedText>
            <ThemedText testID={`${id}-feel-for`}>{rule.feelFor}</ThemedText>
          </View>
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center' },
  grow: { flexGrow: 1, flexShrink: 1, flexBasis: 220 },
  half: { flex: 1 },
});
