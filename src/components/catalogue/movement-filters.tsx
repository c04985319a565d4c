import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Labelled } from '@/components/ui/labelled';
import { ThemedText } from '@/components/ui/themed-text';
import { useImportBatches } from '@/hooks/use-imports';
import { useSprings } from '@/hooks/use-springs';
import { useTheme } from '@/theme';
import { MOVEMENT_KINDS, type MovementKind } from '@shared/types/catalogue';

import { ChipChoice } from './chip-choice';
import { KIND_LABELS } from './movement-list';
import { NO_MOVEMENT_FILTERS, parseDay, type MovementFilters } from './movement-query';

const ALL = 'all';

export type MovementFiltersBarProps = {
  filters: MovementFilters;
  /** A new filter starts again at page 1. */
  onChange: (filters: MovementFilters) => void;
};

/** The choices apply at once; the dates and the spring search on Enter or their button, each being a request. */
export function MovementFiltersBar({ filters, onChange }: MovementFiltersBarProps) {
  const { spacing } = useTheme();
  const batches = useImportBatches(1);
  const [days, setDays] = useState({ from: filters.from, to: filters.to });
  const [sku, setSku] = useState('');
  const [skuSearch, setSkuSearch] = useState('');
  const apply = (change: Partial<MovementFilters>) => onChange({ ...filters, ...days, ...change, page: 1 });
  const badDay = [days.from, days.to].some((day) => day.trim() !== '' && !parseDay(day));

  return (
    <View style={{ gap: spacing.md }} aria-label="Filter the movements">
      <Labelled label="Kind">
        <ChipChoice
          label="Kind"
          options={[{ value: ALL, label: 'All' }, ...MOVEMENT_KINDS.map((kind) => ({ value: kind, label: KIND_LABELS[kind] }))]}
          value={filters.kind ?? ALL}
          onChange={(kind) => apply({ kind: kind === ALL ? undefined : (kind as MovementKind) })}
        />
      </Labelled>
      <View style={[styles.row, { gap: spacing.sm }]}>
        <Labelled label="From day">
          <Input
            accessibilityLabel="From day"
            placeholder="YYYY-MM-DD"
            value={days.from}
            onChangeText={(from) => setDays({ ...days, from })}
            onSubmitEditing={() => apply({})}
            inputMode="numeric"
            style={styles.day}
          />
        </Labelled>
        <Labelled label="To day, included">
          <Input
            accessibilityLabel="To day"
            placeholder="YYYY-MM-DD"
            value={days.to}
            onChangeText={(to) => setDays({ ...days, to })}
            onSubmitEditing={() => apply({})}
            inputMode="numeric"
            style={styles.day}
          />
        </Labelled>
        <Button variant="secondary" label="Apply the days" onPress={() => apply({})} />
      </View>
      {badDay && (
        <ThemedText role="alert" color="danger" type="caption">
          A day is written YYYY-MM-DD, like 2025-01-31; a day that is not a date is left out.
        </ThemedText>
      )}
      {(batches.data?.batches.length ?? 0) > 0 && (
        <Labelled label="Import">
          <ChipChoice
            label="Import"
            options={[
              { value: ALL, label: 'Any' },
              ...(batches.data?.batches ?? []).map((batch) => ({ value: String(batch.id), label: `#${batch.id} ${batch.fileName}` })),
            ]}
            value={filters.importBatchId ? String(filters.importBatchId) : ALL}
            onChange={(id) => apply({ importBatchId: id === ALL ? undefined : Number(id) })}
          />
        </Labelled>
      )}
      <Labelled label="Spring">
        {filters.spring ? (
          <View style={[styles.row, styles.centred, { gap: spacing.sm }]}>
            <ThemedText type="bodyStrong">{filters.spring.sku}</ThemedText>
            <Button variant="secondary" label="Any spring" onPress={() => apply({ spring: undefined })} />
          </View>
        ) : (
          <>
            <View style={[styles.row, { gap: spacing.sm }]}>
              <Input
                accessibilityLabel="Spring SKU"
                placeholder="SKU"
                value={sku}
                onChangeText={setSku}
                onSubmitEditing={() => setSkuSearch(sku.trim())}
                autoCapitalize="characters"
                autoCorrect={false}
                style={styles.grow}
              />
              <Button variant="secondary" label="Find the spring" onPress={() => setSkuSearch(sku.trim())} />
            </View>
            {skuSearch !== '' && <SpringPick search={skuSearch} onPick={(spring) => apply({ spring })} />}
          </>
        )}
      </Labelled>
      <Button
        variant="secondary"
        label="Clear filters"
        onPress={() => {
          setDays({ from: '', to: '' });
          setSku('');
          setSkuSearch('');
          onChange(NO_MOVEMENT_FILTERS);
        }}
      />
    </View>
  );
}

/** The springs whose SKU matches, inactive ones too, since their history stays in the ledger. */
function SpringPick({ search, onPick }: { search: string; onPick: (spring: { id: number; sku: string }) => void }) {
  const { data, error } = useSprings(new URLSearchParams({ q: search, status: 'all', pageSize: '8' }).toString());
  if (error) return <ThemedText role="alert" color="danger">{error.message}</ThemedText>;
  if (!data) return <ThemedText color="textMuted">Looking…</ThemedText>;
  if (data.springs.length === 0) return <ThemedText color="textMuted">{`No spring matches “${search}”.`}</ThemedText>;
  return (
    <ChipChoice
      label="Matching springs"
      options={data.springs.map((spring) => ({ value: String(spring.id), label: spring.sku }))}
      value={undefined}
      onChange={(id) => onPick({ id: Number(id), sku: data.springs.find((spring) => String(spring.id) === id)?.sku ?? id })}
    />
  );
}


const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap' },
  centred: { alignItems: 'center' },
  grow: { flex: 1, minWidth: 160 },
  day: { width: 140 },
});
