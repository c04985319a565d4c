import { useState } from 'react';
import { View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ShopDataLinks } from '@/components/garage/shop-data-links';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useAudit } from '@/hooks/use-audit';
import { useTheme } from '@/theme';

const ENTITIES = [
  { value: 'all', label: 'All' },
  { value: 'bike-model', label: 'Bike models' },
  { value: 'target-profile', label: 'Profiles' },
  { value: 'engine-setting', label: 'Settings' },
] as const;

type EntityChoice = (typeof ENTITIES)[number]['value'];

const ACTIONS = { create: 'created', update: 'changed', delete: 'deleted' } as const;

/** Who changed which shop data, when. */
export default function AuditScreen() {
  const { spacing } = useTheme();
  const [entity, setEntity] = useState<EntityChoice>('all');
  const [page, setPage] = useState(1);
  const { data, error, mutate } = useAudit(entity === 'all' ? undefined : entity, page);
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  return (
    <Screen>
      <ThemedText type="title">Audit</ThemedText>
      <ShopDataLinks current="/admin/audit" />
      <SegmentedChoice
        label="What was edited"
        options={ENTITIES}
        value={entity}
        onChange={(value) => {
          setEntity(value);
          setPage(1);
        }}
      />
      {error ? (
        <ErrorState title="The audit could not be loaded" message={error.message} onRetry={() => void mutate()} />
      ) : !data ? (
        <LoadingState label="Loading the audit…" />
      ) : data.entries.length === 0 ? (
        <EmptyState title="Nothing edited yet">Edits to bike models, target profiles and engine settings are listed here.</EmptyState>
      ) : (
        <View style={{ gap: spacing.sm }}>
          {data.entries.map((entry) => (
            <Card key={entry.id}>
              <ThemedText type="bodyStrong">
                {entry.entity} {entry.entityKey} {ACTIONS[entry.action]}
              </ThemedText>
              <ThemedText color="textMuted">
                {entry.actorName} · {new Date(entry.at).toLocaleString()}
              </ThemedText>
            </Card>
          ))}
          <View style={{ flexDirection: 'row', alignItems: 'center', gap: spacing.sm }}>
            <Button variant="secondary" label="Newer" disabled={page <= 1} onPress={() => setPage(page - 1)} />
            <ThemedText>
              Page {page} of {pages}
            </ThemedText>
            <Button variant="secondary" label="Older" disabled={page >= pages} onPress={() => setPage(page + 1)} />
          </View>
        </View>
      )}
    </Screen>
  );
}
