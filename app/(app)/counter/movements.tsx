import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';

import { counterKeys } from '@/api/keys';
import { DownloadButton } from '@/components/catalogue/download-button';
import { MovementFiltersBar } from '@/components/catalogue/movement-filters';
import { MovementList } from '@/components/catalogue/movement-list';
import {
  buildMovementFilterQuery,
  buildMovementQuery,
  NO_MOVEMENT_FILTERS,
  type MovementFilters,
} from '@/components/catalogue/movement-query';
import { Pager } from '@/components/catalogue/pager';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useStockMovements } from '@/hooks/use-stock-movements';

/** The whole stock ledger; a spring's page links here with `springId` and `sku` to open it on that spring. */
export default function StockMovementsScreen() {
  const params = useLocalSearchParams<{ springId?: string; sku?: string }>();
  const springId = Number(params.springId);
  const [filters, setFilters] = useState<MovementFilters>(
    Number.isInteger(springId) && springId > 0 ? { ...NO_MOVEMENT_FILTERS, spring: { id: springId, sku: params.sku ?? `#${springId}` } } : NO_MOVEMENT_FILTERS,
  );
  const exportQuery = buildMovementFilterQuery(filters).toString();
  const { data, error, isValidating, mutate } = useStockMovements(buildMovementQuery(filters));

  return (
    <Screen width="table">
      <TextLink href="/counter">← Spring catalogue</TextLink>
      <ThemedText type="title">Stock movements</ThemedText>
      <MovementFiltersBar filters={filters} onChange={setFilters} />
      <DownloadButton
        label="Export these movements"
        path={exportQuery ? `${counterKeys.movementsCsv}?${exportQuery}` : counterKeys.movementsCsv}
        fileName="stock-movements.csv"
      />
      {error && !data ? (
        <ErrorState title="The movements could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />
      ) : !data ? (
        <LoadingState label="Loading the movements…" />
      ) : data.movements.length === 0 ? (
        <EmptyState title="No movement matches these filters." />
      ) : (
        <>
          {error && <ErrorState title="The list could not be brought up to date" message={error.message} />}
          <MovementList movements={data.movements} showSku label="Stock movements" />
          <Pager
            page={data.page}
            pageSize={data.pageSize}
            total={data.total}
            noun="movement"
            busy={isValidating}
            onPage={(page) => setFilters({ ...filters, page })}
          />
        </>
      )}
    </Screen>
  );
}
