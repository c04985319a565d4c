import { View } from 'react-native';

import { ADJUSTER_CAUTION, END_WORDS } from '@/components/test-ride/ride-words';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useBike } from '@/hooks/use-bikes';
import { useDamperKinds } from '@/hooks/use-damper-kinds';
import { useDamperPlans } from '@/hooks/use-damper-plans';
import { useSetupLog } from '@/hooks/use-setup-log';
import type { DamperPlan } from '@shared/types/damping';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { fittingDampers } from './fitting-dampers';

type Stage = 'standard' | 'baseline';

const STAGE_TITLES: Record<Stage, string> = {
  standard: '1. Set to the maker’s standard',
  baseline: '2. Then to the rider’s baseline',
};

/** "Nothing to turn; already there: …" when the stage has no step, else the adjusters it leaves. */
function alreadyLine(plan: DamperPlan, already: readonly string[]): string | null {
  if (already.length === 0) return null;
  return `${plan.steps.length === 0 ? 'Nothing to turn; already there' : 'Already there'}: ${already.join(', ')}.`;
}

function StagePlan({ end, stage, plan, already }: { end: EndKind; stage: Stage; plan: DamperPlan; already: readonly string[] }) {
  const { spacing } = useTheme();
  const id = `fitting-${end}-${stage}`;
  const there = alreadyLine(plan, already);
  return (
    <View style={{ gap: spacing.xxs }} testID={id}>
      <ThemedText type="bodyStrong">{STAGE_TITLES[stage]}</ThemedText>
      {plan.steps.map((step, index) => (
        <ThemedText key={step.adjuster} testID={`${id}-step-${index}`}>
          {step.instruction}
        </ThemedText>
      ))}
      {there && (
        <ThemedText color="textMuted" testID={`${id}-already`}>
          {there}
        </ThemedText>
      )}
      {plan.missing.map((line) => (
        <ThemedText key={line} color="textMuted">
          {line}
        </ThemedText>
      ))}
    </View>
  );
}

/**
 * The fitting sheet's damping part for the quote's bike: per end, the turns to the maker's
 * standard and then back to the rider's baseline, with the caution to follow the maker's manual.
 * Nothing shows for a bike without damping adjusters.
 */
export function FittingDampersSection({ bikeId }: { bikeId: number }) {
  const { spacing } = useTheme();
  const plans = useDamperPlans(bikeId);
  const bike = useBike(bikeId);
  const log = useSetupLog(bikeId);
  const kinds = useDamperKinds().data?.kinds;
  const error = plans.error ?? bike.error ?? log.error;
  if (error) {
    return (
      <ErrorState
        title="The damper settings could not be loaded"
        message={error.message}
        onRetry={() => void Promise.all([plans.mutate(), bike.mutate(), log.mutate()])}
      />
    );
  }
  if (!plans.data || !bike.data || !log.data) return <LoadingState label="Loading the damper settings…" />;
  const ends = fittingDampers(bike.data.bike, plans.data, log.data.baseline, kinds);
  if (ends.length === 0) return null;
  return (
    <View testID="fitting-dampers" style={{ gap: spacing.md }}>
      <ThemedText type="heading">Dampers at fitting</ThemedText>
      {ends.map(({ end, toStandard, toBaseline, atStandard, atBaseline }) => (
        <View key={end} style={{ gap: spacing.sm }}>
          <ThemedText type="label">{END_WORDS[end]}</ThemedText>
          <StagePlan end={end} stage="standard" plan={toStandard} already={atStandard} />
          <StagePlan end={end} stage="baseline" plan={toBaseline} already={atBaseline} />
        </View>
      ))}
      <ThemedText color="textMuted">{plans.data.baselineText}</ThemedText>
      <ThemedText testID="fitting-dampers-caution">{ADJUSTER_CAUTION}</ThemedText>
    </View>
  );
}
