import { useLocalSearchParams } from 'expo-router';
import { Platform, View } from 'react-native';

import { useDecisionText } from '@/components/result/decision-view';
import { DamperSettingRow } from '@/components/test-ride/dampers-summary';
import { END_WORDS } from '@/components/test-ride/ride-words';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { SAFETY_CAUTIONS } from '@/components/ui/safety-notice';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { useQuantityFormat } from '@/components/units/quantity-format';
import { useBike } from '@/hooks/use-bikes';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useDamperPlans } from '@/hooks/use-damper-plans';
import { useSizingRecord } from '@/hooks/use-sizing-records';
import { describeLoadCase, nameSpring } from '@shared/sizing/decision-text';
import type { Bike } from '@shared/types/bike';
import type { DamperKind, DamperPlan } from '@shared/types/damping';
import type { EndKind, EndResult } from '@shared/types/sizing';
import type { DamperPlans } from '@shared/types/test-ride';
import { useTheme } from '@/theme';

/** A label and its figure; on a phone a long label (with its window) pushes the figure to a line of its own. */
function Line({ label, children }: { label: string; children: React.ReactNode }) {
  const { spacing, colors } = useTheme();
  return (
    <View
      style={{ flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', columnGap: spacing.md, borderBottomWidth: 1, borderColor: colors.border, paddingVertical: spacing.xs }}
    >
      <ThemedText>{label}</ThemedText>
      <View style={{ marginLeft: 'auto' }}>{children}</View>
    </View>
  );
}

/** One end on paper: the decision's headline and steps, as on the result screen, and the sags with their windows. */
function EndSheet({ result }: { result: EndResult }) {
  const text = useDecisionText(result);
  const format = useQuantityFormat();
  const id = `sheet-${result.end}`;
  return (
    <View style={{ gap: 2 }} testID={id}>
      <ThemedText type="heading">{result.end === 'front' ? 'Front' : 'Rear'}</ThemedText>
      <ThemedText type="bodyStrong" testID={`${id}-headline`}>
        {text.headline}
      </ThemedText>
      {text.steps.map((step, i) => (
        <ThemedText key={step}>
          {i + 1}. {step}
        </ThemedText>
      ))}
      <Line label={`Static sag (window ${format.length(result.target.staticSagMm.min)} to ${format.length(result.target.staticSagMm.max)})`}>
        <Quantity value={result.staticSagMm} kind="length" />
      </Line>
      <Line label={`Rider sag (window ${format.length(result.target.riderSagMm.min)} to ${format.length(result.target.riderSagMm.max)})`}>
        <Quantity value={result.riderSagMm} kind="length" />
      </Line>
      <Line label="Spring fitted">
        <ThemedText type="figure">{nameSpring(result.installedSpring, format)}</ThemedText>
      </Line>
      {result.decision.kind !== 'check' &&
        result.loadCases.map((loadCase) => <ThemedText key={loadCase.name}>{describeLoadCase(loadCase, format)}</ThemedText>)}
    </View>
  );
}

/** A plan on paper: its numbered turns, what it leaves as it is, or that the end is there already. */
function PlanSheet({ title, plan, testID }: { title: string; plan: DamperPlan; testID: string }) {
  const { spacing } = useTheme();
  return (
    <View style={{ gap: spacing.xxs }} testID={testID}>
      <ThemedText type="label">{title}</ThemedText>
      {plan.atTarget && <ThemedText>Already there.</ThemedText>}
      {plan.steps.map((step, i) => (
        <ThemedText key={step.adjuster}>
          {i + 1}. {step.instruction}
        </ThemedText>
      ))}
      {plan.missing.map((line) => (
        <ThemedText key={line} type="caption">
          Left as it is: {line}
        </ThemedText>
      ))}
    </View>
  );
}

const ENDS: readonly EndKind[] = ['front', 'rear'];

/**
 * The damping adjusters as they are set now (which may be later than the pass), each with the
 * maker's standard, and per end both ways back, so the sheet at the bike is enough to undo a day
 * of test rides.
 */
function DampersSheet({ bike, plans, kinds }: { bike: Bike; plans: DamperPlans | undefined; kinds?: readonly DamperKind[] }) {
  const { spacing } = useTheme();
  const ends = ENDS.filter((end) => (bike[end]?.dampers.length ?? 0) > 0);
  if (ends.length === 0) return null;
  return (
    <View style={{ gap: spacing.sm }} testID="sheet-dampers">
      <ThemedText type="heading">Dampers</ThemedText>
      <ThemedText type="caption">As set on {new Date().toLocaleDateString()}, counted out from fully closed.</ThemedText>
      {ends.map((end) => (
        <View key={end} style={{ gap: spacing.xs }} testID={`sheet-dampers-${end}`}>
          <ThemedText type="bodyStrong">{END_WORDS[end]}</ThemedText>
          {bike[end]!.dampers.map((damper) => (
            <DamperSettingRow key={damper.kind} damper={damper} kinds={kinds} testID={`sheet-dampers-${end}-${damper.kind}`} />
          ))}
          {plans?.[end] && (
            <>
              <PlanSheet title="Back to the maker’s standard" plan={plans[end].standard} testID={`sheet-plan-${end}-standard`} />
              <PlanSheet title="Back to the baseline" plan={plans[end].baseline} testID={`sheet-plan-${end}-baseline`} />
            </>
          )}
        </View>
      ))}
      {plans && <ThemedText type="caption">{plans.baselineText}</ThemedText>}
    </View>
  );
}

/** One pass on one page, plain enough to print and take to the bike. */
export default function SetupSheetScreen() {
  const { spacing } = useTheme();
  const recordId = Number(useLocalSearchParams<{ recordId: string }>().recordId);
  const { data, error, mutate } = useSizingRecord(recordId);
  const bike = useBike(data?.record.bikeId ?? undefined);
  const plans = useDamperPlans(data?.record.bikeId ?? undefined);
  const kinds = useDamperKinds().data?.kinds;
  if (error) {
    return (
      <Screen>
        <ErrorState title="The setup sheet could not be loaded" message={error.message} onRetry={() => void mutate()} />
      </Screen>
    );
  }
  if (!data) {
    return (
      <Screen>
        <LoadingState label="Loading the setup sheet…" />
      </Screen>
    );
  }
  const { record } = data;
  return (
    <Screen>
      <ThemedText type="title">Setup sheet</ThemedText>
      <ThemedText>
        {bike.data?.bike.nickname ?? 'Bike'} · {record.profileLabel} · {new Date(record.createdAt).toLocaleDateString()} · engine {record.engineVersion}
      </ThemedText>
      {Platform.OS === 'web' && <Button label="Print" onPress={() => window.print()} testID="print-sheet" />}
      <View style={{ gap: spacing.lg }} testID="setup-sheet">
        {record.result.front && <EndSheet result={record.result.front} />}
        {record.result.rear && <EndSheet result={record.result.rear} />}
        {bike.data && <DampersSheet bike={bike.data.bike} plans={plans.data} kinds={kinds} />}
      </View>
      <View style={{ gap: 2 }}>
        {SAFETY_CAUTIONS.map((caution) => (
          <ThemedText key={caution} type="caption">
            · {caution}
          </ThemedText>
        ))}
      </View>
    </Screen>
  );
}
