import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useQuantityFormat } from '@/components/units/quantity-format';
import { useBusyAction } from '@/hooks/use-busy-action';
import { useLoadCases, useLoadCaseSwitch } from '@/hooks/use-load-cases';
import { adjusterUnit, describePosition } from '@shared/sizing/adjuster';
import { describeLoadCaseSetting } from '@shared/sizing/decision-text';
import type { Bike } from '@shared/types/bike';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const ENDS: readonly EndKind[] = ['front', 'rear'];
const PART: Record<EndKind, string> = { front: 'Fork', rear: 'Shock' };

/**
 * Solo, or set for a passenger or luggage: each case's preload on the springs fitted now, from the
 * bike's latest pass, and the switch between them (which goes in the setup log).
 */
export function LoadCasePanel({ bike }: { bike: Bike }) {
  const { spacing } = useTheme();
  const format = useQuantityFormat();
  const { data, error } = useLoadCases(bike.id);
  const switchTo = useLoadCaseSwitch(bike.id);
  const { busy, error: failed, run } = useBusyAction();
  const [done, setDone] = useState<string | null>(null);
  if (error || !data) return null;

  const choose = (name: string | null) =>
    run(async () => {
      const entry = await switchTo(name);
      setDone(`${entry.note}: in the setup log.`);
    });

  const soloLine = ENDS.filter((end) => bike[end] && data.solo[end] !== undefined)
    .map((end) => `${PART[end]} ${describePosition(adjusterUnit(bike[end]!.adjuster.kind), data.solo[end]!)}`)
    .join(', ');
  return (
    <Card testID="load-cases">
      <ThemedText type="heading">Load</ThemedText>
      {data.cases.length === 0 ? (
        <ThemedText color="textMuted" testID="load-cases-none">
          {data.recordId === null
            ? 'Measure the bike first. A passenger or luggage in the weigh-in then gets the preload it needs here.'
            : 'Add a passenger or luggage to the weigh-in and measure again: each load then gets the preload it needs here.'}
        </ThemedText>
      ) : (
        <ThemedText color="textMuted">The springs are chosen for you alone; a passenger or luggage only adds preload. Each switch goes in the setup log.</ThemedText>
      )}
      {done && (
        <ThemedText color="success" testID="load-case-done">
          {done}
        </ThemedText>
      )}
      {failed && (
        <ThemedText color="danger" role="alert">
          {failed}
        </ThemedText>
      )}
      <View style={{ gap: spacing.md }}>
        <CaseRow name="Solo" active={data.active === null} lines={[{ text: soloLine, warn: false }]} busy={busy} onChoose={() => void choose(null)} testID="load-case-solo" />
        {data.cases.map((loadCase, i) => (
          <CaseRow
            key={loadCase.name}
            name={loadCase.name}
            active={data.active === loadCase.name}
            lines={ENDS.flatMap((end) => {
              const result = loadCase.ends[end];
              return result ? [{ text: `${PART[end]}: ${describeLoadCaseSetting(result, format)}`, warn: !result.carries }] : [];
            })}
            busy={busy}
            onChoose={() => void choose(loadCase.name)}
            testID={`load-case-${i}`}
          />
        ))}
      </View>
    </Card>
  );
}

type CaseRowProps = {
  name: string;
  active: boolean;
  /** A line the spring cannot carry is marked. */
  lines: { text: string; warn: boolean }[];
  busy: boolean;
  onChoose: () => void;
  testID: string;
};

function CaseRow({ name, active, lines, busy, onChoose, testID }: CaseRowProps) {
  const { spacing, colors, radii } = useTheme();
  return (
    <View
      testID={testID}
      style={{ gap: spacing.xs, padding: spacing.md, borderWidth: 1, borderRadius: radii.sm, borderColor: active ? colors.success : colors.border }}
    >
      <ThemedText type="bodyStrong">
        {name}
        {active ? ' · set now' : ''}
      </ThemedText>
      {lines.map((line) => (
        <ThemedText key={line.text} color={line.warn ? 'danger' : 'text'}>
          {line.text}
        </ThemedText>
      ))}
      {!active && <Button variant="secondary" label={`Switch to: ${name}`} disabled={busy} onPress={onChoose} testID={`${testID}-set`} />}
    </View>
  );
}
