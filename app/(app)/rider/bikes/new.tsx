import { router } from 'expo-router';
import { useState } from 'react';
import { Pressable, View } from 'react-native';

import { BikeForm } from '@/components/garage/bike-form';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useBikeChanges } from '@/hooks/use-bikes';
import { useBikeModels } from '@/hooks/use-bike-models';
import type { BikeModel } from '@shared/types/bike';
import { useTheme } from '@/theme';

const SOURCES = [
  { value: 'model', label: 'From a shop model' },
  { value: 'hand', label: 'By hand' },
] as const;

/** Adds a bike: copied from one of the shop's models with the rider's changes, or typed in. */
export default function NewBikeScreen() {
  const { colors, spacing, radii } = useTheme();
  const [source, setSource] = useState<'model' | 'hand'>('model');
  const [model, setModel] = useState<BikeModel | null>(null);
  const models = useBikeModels();
  const { create } = useBikeChanges();

  return (
    <Screen>
      <ThemedText type="title">Add a bike</ThemedText>
      <SegmentedChoice label="Where the values come from" options={SOURCES} value={source} onChange={setSource} testID="bike-source" />
      {source === 'model' && !model && (
        <>
          {models.error ? (
            <ErrorState title="The shop’s models could not be loaded" message={models.error.message} onRetry={() => void models.mutate()} />
          ) : !models.data ? (
            <LoadingState label="Loading the shop’s models…" />
          ) : models.data.models.length === 0 ? (
            <EmptyState title="The shop has no bike models yet">Enter your bike by hand instead.</EmptyState>
          ) : (
            <View style={{ gap: spacing.sm }} role="list">
              {models.data.models.map((item) => (
                <Pressable
                  key={item.id}
                  role="button"
                  aria-label={item.name}
                  testID={`model-${item.id}`}
                  onPress={() => setModel(item)}
                  style={({ pressed }) => ({ borderRadius: radii.md, backgroundColor: pressed ? colors.accentSoft : undefined })}
                >
                  <Card>
                    <ThemedText type="bodyStrong">{item.name}</ThemedText>
                    {item.description ? <ThemedText color="textMuted">{item.description}</ThemedText> : null}
                  </Card>
                </Pressable>
              ))}
            </View>
          )}
        </>
      )}
      {source === 'model' && model && (
        <>
          <Card tone="success">
            <ThemedText>
              From <ThemedText type="bodyStrong">{model.name}</ThemedText>. <ThemedText color="accent" onPress={() => setModel(null)}>Choose another</ThemedText>
            </ThemedText>
          </Card>
          <BikeForm
            key={model.id}
            spec={model}
            nickname={model.name}
            fromModel
            submitLabel="Add to garage"
            onSubmit={async (values) => {
              await create({ ...values, modelId: model.id });
              router.navigate('/rider');
            }}
          />
        </>
      )}
      {source === 'hand' && (
        <BikeForm
          spec={{}}
          nickname=""
          submitLabel="Add to garage"
          onSubmit={async (values) => {
            await create(values);
            router.navigate('/rider');
          }}
        />
      )}
    </Screen>
  );
}
