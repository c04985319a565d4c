import { View } from 'react-native';

import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useApplyDamperPlan, useDamperPlans } from '@/hooks/use-damper-plans';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { DamperPlanCard } from './damper-plan-card';
import { END_WORDS } from './ride-words';

const ENDS: readonly EndKind[] = ['front', 'rear'];

/**
 * The way back, per end: to the maker's standard and to the baseline. `baselineTitle` names whose
 * baseline it is ("my" for the rider, "the rider's" at the desk).
 */
export function DamperPlansSection({ bikeId, baselineTitle }: { bikeId: number; baselineTitle: string }) {
  const { spacing } = useTheme();
  const { data, error, mutate } = useDamperPlans(bikeId);
  const apply = useApplyDamperPlan(bikeId);
  const body = error ? (
    <ErrorState title="The way back could not be worked out" message={error.message} onRetry={() => void mutate()} />
  ) : !data ? (
    <LoadingState label="Working out the way back…" />
  ) : !data.front && !data.rear ? (
    <ThemedText color="textMuted">No damping adjusters are recorded on this bike: add them to the bike’s values with their maker’s standard settings.</ThemedText>
  ) : (
    <>
      <ThemedText color="textMuted">{data.baselineText}</ThemedText>
      {ENDS.map((end) => {
        const plans = data[end];
        if (!plans) return null;
        return (
          <View key={end} style={{ gap: spacing.sm }} testID={`plans-${end}`}>
            <ThemedText type="label">{END_WORDS[end]}</ThemedText>
            <DamperPlanCard
              title="Back to the maker’s standard"
              targetWords="the maker’s standard"
              plan={plans.standard}
              onApply={() => apply('standard', end)}
              testID={`plan-${end}-standard`}
            />
            <DamperPlanCard
              title={baselineTitle}
              targetWords="the baseline"
              plan={plans.baseline}
              onApply={() => apply('baseline', end)}
              testID={`plan-${end}-baseline`}
            />
          </View>
        );
      })}
    </>
  );
  return (
    <View style={{ gap: spacing.sm }} testID="damper-plans">
      <ThemedText type="heading">The way back</ThemedText>
      {body}
    </View>
  );
}
