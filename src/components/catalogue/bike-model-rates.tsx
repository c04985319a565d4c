import { useState } from 'react';
import { View } from 'react-native';

import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useBikeModels } from '@/hooks/use-bike-models';
import { useTheme } from '@/theme';
import type { BikeModel } from '@shared/types/bike';
import { fromSi, type RateUnit } from '@shared/units';

import { ChipChoice } from './chip-choice';
import { FitAnswer } from './fit-rates';
import { formatRate } from './rate-text';

/** One of the shop's bike models → for its fork and its shock, the stocked rates around the fitted one. */
export function BikeModelRates({ unit }: { unit: RateUnit }) {
  const { spacing } = useTheme();
  const models = useBikeModels();
  const [modelId, setModelId] = useState<string>();

  if (models.error && !models.data) {
    return <ErrorState title="The bike models could not be loaded" message={models.error.message} onRetry={() => void models.mutate()} />;
  }
  if (!models.data) return <LoadingState label="Loading the bike models…" />;
  if (models.data.models.length === 0) return <EmptyState title="The shop has no bike models yet." />;
  const model = models.data.models.find((m) => String(m.id) === modelId);

  return (
    <View style={{ gap: spacing.md }}>
      <ChipChoice label="Bike model" options={models.data.models.map((m) => ({ value: String(m.id), label: m.name }))} value={modelId} onChange={setModelId} />
      {model && <ModelEnds model={model} unit={unit} />}
    </View>
  );
}

function ModelEnds({ model, unit }: { model: BikeModel; unit: RateUnit }) {
  const ends = [
    { label: 'Fork', kind: 'fork' as const, spec: model.front },
    { label: 'Shock', kind: 'shock' as const, spec: model.rear },
  ];
  return (
    <>
      {ends.map(({ label, kind, spec }) =>
        spec ? (
          <Card key={kind}>
            <ThemedText type="heading">{`${label}: ${spec.family}, fitted ${formatRate(fromSi(spec.rateNmm, unit), unit)}`}</ThemedText>
            <FitAnswer question={{ kind, family: spec.family, rate: fromSi(spec.rateNmm, unit), unit }} />
          </Card>
        ) : (
          <Card key={kind}>
            <ThemedText color="textMuted">{`${label}: not recorded for this model.`}</ThemedText>
          </Card>
        ),
      )}
    </>
  );
}
