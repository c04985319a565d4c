import { useState } from 'react';
import { View } from 'react-native';

import { ChoiceField } from '@/components/form/choice-field';
import { Form } from '@/components/form/form';
import { FormErrorBanner } from '@/components/form/form-error-banner';
import { SubmitButton } from '@/components/form/submit-button';
import { TextField } from '@/components/form/text-field';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useDamperKindCreate, useDamperKinds } from '@/hooks/use-damper-kinds';
import { damperKindCreateSchema } from '@shared/schemas/damper-kind.schema';
import type { DamperCircuit, DamperKind, DamperSpeed } from '@shared/types/damping';
import { useTheme } from '@/theme';

const CIRCUITS: readonly { value: DamperCircuit; label: string }[] = [
  { value: 'rebound', label: 'Rebound' },
  { value: 'compression', label: 'Compression' },
];

const SPEEDS: readonly { value: DamperSpeed; label: string }[] = [
  { value: 'all', label: 'All' },
  { value: 'high', label: 'High' },
  { value: 'low', label: 'Low' },
];

const SPEED_WORDS: Record<DamperSpeed, string> = { all: 'all shaft speeds', high: 'high shaft speeds', low: 'low shaft speeds' };

/** "rebound, all shaft speeds": what the adjuster works on, under its label. */
export function describeKind(kind: Pick<DamperKind, 'circuit' | 'speed'>): string {
  return `${kind.circuit}, ${SPEED_WORDS[kind.speed]}`;
}

/**
 * The shop's list of adjuster kinds, which bikes, models and rules name, and the admin's form to
 * add one (a shop's fork with an adjuster the six of the trade do not cover). Kinds are never
 * removed: bikes and rules refer to them by key.
 */
export function DamperKindsPanel() {
  const { spacing, colors } = useTheme();
  const kinds = useDamperKinds();
  const create = useDamperKindCreate();
  const [adding, setAdding] = useState(false);
  const [added, setAdded] = useState<string | null>(null);

  return (
    <Card testID="damper-kinds">
      <ThemedText type="heading">Adjuster kinds</ThemedText>
      <ThemedText color="textMuted">The damping adjusters a bike, a model and a rule can name.</ThemedText>
      {kinds.error ? (
        <ErrorState title="The adjuster kinds could not be loaded" message={kinds.error.message} onRetry={() => void kinds.mutate()} />
      ) : !kinds.data ? (
        <LoadingState label="Loading the adjuster kinds…" />
      ) : (
        <View role="list" aria-label="Adjuster kinds">
          {kinds.data.kinds.map((kind) => (
            <View key={kind.key} role="listitem" testID={`damper-kind-${kind.key}`} style={{ paddingVertical: spacing.xs, borderTopWidth: 1, borderColor: colors.border }}>
              <ThemedText type="bodyStrong">{kind.label}</ThemedText>
              <ThemedText type="caption" color="textMuted">
                {kind.key} · {describeKind(kind)}
              </ThemedText>
            </View>
          ))}
        </View>
      )}
      {added && (
        <ThemedText role="status" testID="damper-kind-added">
          {added}
        </ThemedText>
      )}
      {adding ? (
        <Form
          schema={damperKindCreateSchema}
          initialValues={{ key: '', label: '', circuit: '', speed: '' }}
          onSubmit={async (values, helpers) => {
            setAdded(null);
            const kind = await create(values);
            helpers.resetForm();
            setAdding(false);
            setAdded(`Added ${kind.label} (${kind.key}).`);
          }}
        >
          <TextField name="key" label="Key" hint="Lower-case words joined by “-”, as bikes name it: mid-valve-bleed." autoCapitalize="none" autoCorrect={false} testID="damper-kind-key" />
          <TextField name="label" label="Label" hint="As people read it: Mid-valve bleed." testID="damper-kind-label" />
          <ChoiceField name="circuit" label="Circuit" options={CIRCUITS} />
          <ChoiceField name="speed" label="Shaft speeds" options={SPEEDS} />
          <FormErrorBanner />
          <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm }}>
            <SubmitButton label="Add the kind" busyLabel="Adding…" />
            <Button variant="secondary" label="Cancel" onPress={() => setAdding(false)} />
          </View>
        </Form>
      ) : (
        <Button
          variant="secondary"
          label="Add an adjuster kind"
          onPress={() => {
            setAdded(null);
            setAdding(true);
          }}
          testID="damper-kind-add-open"
        />
      )}
    </Card>
  );
}
