import { useState } from 'react';
import { View } from 'react-native';

import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { ThemedText } from '@/components/ui/themed-text';
import { useImportBatches } from '@/hooks/use-imports';
import { useTheme } from '@/theme';
import type { ImportBatchView } from '@shared/types/catalogue';

import { Pager } from './pager';

export function describeBatch(batch: ImportBatchView): string {
  return `${batch.rows} rows: ${batch.created} new, ${batch.updated} updated, ${batch.unchanged} unchanged, ${batch.stockCorrections} ${batch.stockCorrections === 1 ? 'count correction' : 'count corrections'}`;
}

/** The imports made so far, newest first. */
export function ImportBatches() {
  const { colors, spacing } = useTheme();
  const [page, setPage] = useState(1);
  const { data, error, isValidating, mutate } = useImportBatches(page);
  if (error && !data) return <ErrorState title="The past imports could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />;
  if (!data) return <LoadingState label="Loading the past imports…" />;
  if (data.batches.length === 0) return <EmptyState title="No imports yet." />;
  return (
    <>
      <View role="list" aria-label="Past imports">
        {data.batches.map((batch) => (
          <View key={batch.id} role="listitem" style={{ paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border }}>
            <ThemedText type="bodyStrong">{`#${batch.id} · ${batch.fileName}`}</ThemedText>
            <ThemedText type="caption" color="textMuted">
              {`${new Date(batch.at).toLocaleString()} · ${batch.user?.name ?? 'System'} · ${describeBatch(batch)}`}
            </ThemedText>
          </View>
        ))}
      </View>
      <Pager page={data.page} pageSize={data.pageSize} total={data.total} noun="import" busy={isValidating} onPage={setPage} />
    </>
  );
}
