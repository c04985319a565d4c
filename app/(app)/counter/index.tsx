import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { counterKeys } from '@/api/keys';
import { CounterLinks } from '@/components/catalogue/counter-links';
import { DownloadButton } from '@/components/catalogue/download-button';
import { Pager } from '@/components/catalogue/pager';
import { SpringFiltersBar } from '@/components/catalogue/spring-filters-bar';
import { SpringCards, SpringTable } from '@/components/catalogue/spring-list';
import { buildSpringQuery, NO_FILTERS, type SpringFilters } from '@/components/catalogue/spring-query';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { ThemedText } from '@/components/ui/themed-text';
import { useSprings } from '@/hooks/use-springs';
import { useUnits } from '@/hooks/use-units';
import { useLayout, useTheme } from '@/theme';

export default function SpringCatalogueScreen() {
  const { spacing } = useTheme();
  const { units } = useUnits();
  const [filters, setFilters] = useState<SpringFilters>(NO_FILTERS);
  return (
    <Screen width="table">
      <ThemedText type="title">Spring catalogue</ThemedText>
      <ThemedText color="textMuted">
        The shop&apos;s springs with their rates and stock; every recommendation draws its springs from here.
      </ThemedText>
      <CounterLinks />
      <View style={[styles.row, { gap: spacing.sm }]}>
        <DownloadButton label="Export the catalogue" path={counterKeys.springsCsv} fileName="catalogue.csv" />
      </View>
      <SpringFiltersBar filters={filters} unit={units.rateUnit} onChange={setFilters} />
      <SpringResults query={buildSpringQuery(filters, units.rateUnit)} onPage={(page) => setFilters({ ...filters, page })} />
    </Screen>
  );
}

function SpringResults({ query, onPage }: { query: string; onPage: (page: number) => void }) {
  const { isWide } = useLayout();
  const { data, error, isValidating, mutate } = useSprings(query);

  if (error && !data) {
    return <ErrorState title="The catalogue could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />;
  }
  if (!data) return <LoadingState label="Loading the catalogue…" />;
  if (data.springs.length === 0) {
    return <EmptyState title="No spring matches these filters.">Widen the rate range or clear the filters.</EmptyState>;
  }
  return (
    <>
      {error && <ErrorState title="The list could not be brought up to date" message={error.message} />}
      {isWide ? <SpringTable springs={data.springs} unit={data.unit} /> : <SpringCards springs={data.springs} unit={data.unit} />}
      <Pager page={data.page} pageSize={data.pageSize} total={data.total} noun="spring" busy={isValidating} onPage={onPage} />
    </>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start' } });
