import { useMemo, useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useDampingRules } from '@/hooks/use-damping-rules';
import { useTheme } from '@/theme';

import { RuleCreateForm } from './rule-create-form';
import { END_WORDS, groupRules } from './rule-groups';
import { RuleRow } from './rule-row';

/**
 * The symptom-to-change table, for the desk and the admin alike: every row grouped by symptom and
 * end in the order the loop tries them, and a form for a row of the shop's own. `canEdit` (the
 * admin's screen) adds editing a row and switching it off; the server refuses both to the desk.
 */
export function DampingRules({ canEdit }: { canEdit: boolean }) {
  const { spacing } = useTheme();
  const rules = useDampingRules();
  const kinds = useDamperKinds();
  const [adding, setAdding] = useState(false);
  const [editingId, setEditingId] = useState<number | null>(null);
  const groups = useMemo(() => groupRules(rules.data?.rules ?? []), [rules.data]);
  const error = rules.error ?? kinds.error;

  if (error) {
    return (
      <ErrorState title="The rules could not be loaded" message={error.message} onRetry={() => void Promise.all([rules.mutate(), kinds.mutate()])} />
    );
  }
  if (!rules.data || !kinds.data) return <LoadingState label="Loading the rules…" />;
  const kindList = kinds.data.kinds;

  return (
    <>
      <Card testID="rule-add">
        <ThemedText type="heading">Add a rule</ThemedText>
        <ThemedText color="textMuted">A row of your own is tried among the symptom’s rows by its priority, from the next report on.</ThemedText>
        {adding ? (
          <>
            <RuleCreateForm kinds={kindList} onCreate={rules.create} />
            <Button variant="secondary" label="Close the form" onPress={() => setAdding(false)} />
          </>
        ) : (
          <Button label="Add a rule" onPress={() => setAdding(true)} testID="rule-add-open" />
        )}
      </Card>
      <View style={{ gap: spacing.lg }} testID="rule-groups">
        {groups.map((group) => (
          <Card key={group.key} testID={`rule-group-${group.symptom}-${group.end}`}>
            <ThemedText type="heading">{group.symptomWords}</ThemedText>
            <ThemedText type="overline" color="textMuted">
              {END_WORDS[group.end]}
            </ThemedText>
            <View role="list" aria-label={`${group.symptomWords}, ${END_WORDS[group.end].toLowerCase()}`} style={{ gap: spacing.md }}>
              {group.rows.map((row) => (
                <RuleRow
                  key={row.rule.id}
                  row={row}
                  kinds={kindList}
                  onSave={canEdit ? rules.update : undefined}
                  editing={editingId === row.rule.id}
                  setEditing={(editing) => setEditingId(editing ? row.rule.id : null)}
                />
              ))}
            </View>
          </Card>
        ))}
      </View>
    </>
  );
}
