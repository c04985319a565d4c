import { Link, router, useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';

import { BikeForm } from '@/components/garage/bike-form';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { UnitToggle } from '@/components/units/unit-toggle';
import { useBikeModelChanges, useBikeModels } from '@/hooks/use-bike-models';
import { useTheme } from '@/theme';

/**
 * The shop's bike models, which riders copy into their garage. `?edit=new` or `?edit=<id>` opens
 * the editor in place of the list.
 */
export default function BikeModelsScreen() {
  const { spacing } = useTheme();
  const { edit } = useLocalSearchParams<{ edit?: string }>();
  const { data, error, mutate } = useBikeModels();
  const { create, update, remove } = useBikeModelChanges();
  const editing = edit === 'new' ? null : data?.models.find((model) => String(model.id) === edit);
  const back = () => router.setParams({ edit: undefined });

  let body;
  if (error) body = <ErrorState title="The bike models could not be loaded" message={error.message} onRetry={() => void mutate()} />;
  else if (!data) body = <LoadingState label="Loading the bike models…" />;
  else if (edit === 'new' || editing) {
    body = (
      <>
        <Button variant="secondary" label="Back to the list" onPress={back} />
        <BikeForm
          key={edit}
          spec={editing ?? {}}
          nickname={editing?.name ?? ''}
          model={{ description: editing?.description ?? '' }}
          submitLabel={editing ? 'Save model' : 'Add model'}
          onSubmit={async ({ nickname, ...values }) => {
            const input = { ...values, name: nickname };
            await (editing ? update(editing.id, input) : create(input));
            back();
          }}
        />
        {editing && (
          <Button variant="secondary" label="Delete this model" onPress={() => void remove(editing.id).then(back)} />
        )}
      </>
    );
  } else if (data.models.length === 0) {
    body = <EmptyState title="No bike models yet">Add the bikes your customers ride, so they can start from their values.</EmptyState>;
  } else {
    body = (
      <View style={{ gap: spacing.sm }}>
        {data.models.map((model) => (
          <Card key={model.id} testID={`model-${model.id}`}>
            <ThemedText type="bodyStrong">{model.name}</ThemedText>
            {model.description ? <ThemedText color="textMuted">{model.description}</ThemedText> : null}
            <ThemedText type="caption" color="textMuted">
              {[model.front && 'front', model.rear && 'rear'].filter(Boolean).join(' and ')} sized · changed {new Date(model.updatedAt).toLocaleDateString()}
            </ThemedText>
            <Link href={`/admin/bike-models?edit=${model.id}`} asChild>
              <Button variant="secondary" label="Edit" />
            </Link>
          </Card>
        ))}
      </View>
    );
  }

  return (
    <Screen>
      <ThemedText type="title">Bike models</ThemedText>
      <ShopDataLinks current="/admin/bike-models" />
      {/* Values are typed in these units and stored in SI. */}
      <UnitToggle />
      {!edit && (
        <Link href="/admin/bike-models?edit=new" asChild>
          <Button label="New model" />
        </Link>
      )}
      {body}
    </Screen>
  );
}
