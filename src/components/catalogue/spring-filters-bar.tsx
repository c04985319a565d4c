import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Labelled } from '@/components/ui/labelled';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { useFamilies } from '@/hooks/use-families';
import { useLayout, useTheme } from '@/theme';
import { SPRING_SORTS, type SpringKind, type SpringSort } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

import { ChipChoice } from './chip-choice';
import { NO_FILTERS, type SpringFilters } from './spring-query';

const ALL = 'all';
const KIND_CHOICES = [
  { value: ALL, label: 'All' },
  { value: 'fork', label: 'Fork' },
  { value: 'shock', label: 'Shock' },
] as const;
const SORT_LABELS: Record<SpringSort, string> = { sku: 'SKU', rate: 'Rate', family: 'Family', onHand: 'On hand', available: 'Available' };
const YES_NO = [
  { value: 'no', label: 'Any' },
  { value: 'yes', label: 'Yes' },
] as const;

export type SpringFiltersBarProps = {
  filters: SpringFilters;
  unit: RateUnit;
  /** A new search starts again at page 1. */
  onChange: (filters: SpringFilters) => void;
};

/**
 * Text boxes (search and the rate range) apply on Enter or the Search button, each being a
 * request; the choices apply at once.
 */
export function SpringFiltersBar({ filters, unit, onChange }: SpringFiltersBarProps) {
  const { spacing } = useTheme();
  const { isWide } = useLayout();
  // On a phone the choices fold away so the springs stay in view.
  const [showChoices, setShowChoices] = useState(isWide);
  const families = useFamilies();
  const [text, setText] = useState({ q: filters.q, rateMin: filters.rateMin, rateMax: filters.rateMax });
  const apply = (change: Partial<SpringFilters>) => onChange({ ...filters, ...text, ...change, page: 1 });
  const familyChoices = (families.data?.families ?? []).filter((f) => !filters.kind || f.kind === filters.kind);

  return (
    <View style={{ gap: spacing.md }} aria-label="Search the catalogue">
      <View style={[styles.row, { gap: spacing.sm }]}>
        <Input
          accessibilityLabel="Search springs"
          placeholder="SKU, family, supplier or bin"
          value={text.q}
          onChangeText={(q) => setText({ ...text, q })}
          onSubmitEditing={() => apply({})}
          autoCapitalize="none"
          autoCorrect={false}
          inputMode="search"
          style={styles.grow}
        />
        <Button label="Search" onPress={() => apply({})} />
      </View>
      <View style={[styles.row, styles.centred, { gap: spacing.sm }]}>
        <ThemedText type="label">{`Rate (${unit})`}</ThemedText>
        <Input
          accessibilityLabel={`Lowest rate, ${unit}`}
          placeholder="from"
          value={text.rateMin}
          onChangeText={(rateMin) => setText({ ...text, rateMin })}
          onSubmitEditing={() => apply({})}
          inputMode="decimal"
          style={styles.rate}
        />
        <Input
          accessibilityLabel={`Highest rate, ${unit}`}
          placeholder="to"
          value={text.rateMax}
          onChangeText={(rateMax) => setText({ ...text, rateMax })}
          onSubmitEditing={() => apply({})}
          inputMode="decimal"
          style={styles.rate}
        />
        {!isWide && (
          <Button
            variant="secondary"
            label={showChoices ? 'Fewer filters' : 'More filters'}
            aria-expanded={showChoices}
            onPress={() => setShowChoices(!showChoices)}
          />
        )}
      </View>
      {showChoices && (
      <>
      <View style={[styles.row, { gap: spacing.md }]}>
        <Labelled label="Kind">
          <SegmentedChoice
            label="Kind"
            options={KIND_CHOICES}
            value={filters.kind ?? ALL}
            onChange={(kind) => apply({ kind: kind === ALL ? undefined : (kind as SpringKind), family: undefined })}
          />
        </Labelled>
        <Labelled label="In stock only">
          <SegmentedChoice
            label="In stock only"
            options={YES_NO}
            value={filters.inStock ? 'yes' : 'no'}
            onChange={(value) => apply({ inStock: value === 'yes' })}
          />
        </Labelled>
        <Labelled label="Below reorder point">
          <SegmentedChoice
            label="Below reorder point"
            options={YES_NO}
            value={filters.belowReorder ? 'yes' : 'no'}
            onChange={(value) => apply({ belowReorder: value === 'yes' })}
          />
        </Labelled>
      </View>
      {familyChoices.length > 0 && (
        <Labelled label="Family">
          <ChipChoice
            label="Family"
            options={[{ value: ALL, label: 'All' }, ...familyChoices.map((f) => ({ value: f.family, label: f.family }))]}
            value={filters.family ?? ALL}
            onChange={(family) => apply({ family: family === ALL ? undefined : family })}
          />
        </Labelled>
      )}
      <View style={[styles.row, { gap: spacing.md }]}>
        <Labelled label="Sort by">
          <ChipChoice
            label="Sort by"
            options={SPRING_SORTS.map((value) => ({ value, label: SORT_LABELS[value] }))}
            value={filters.sort}
            onChange={(sort) => apply({ sort })}
          />
        </Labelled>
        <Labelled label="Order">
          <SegmentedChoice
            label="Order"
            options={[
              { value: 'asc', label: 'Ascending' },
              { value: 'desc', label: 'Descending' },
            ]}
            value={filters.order}
            onChange={(order) => apply({ order })}
          />
        </Labelled>
        <Button
          variant="secondary"
          label="Clear filters"
          onPress={() => {
            setText({ q: '', rateMin: '', rateMax: '' });
            onChange(NO_FILTERS);
          }}
        />
      </View>
      </>
      )}
    </View>
  );
}


const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-end', flexWrap: 'wrap' },
  grow: { flex: 1, minWidth: 180 },
  centred: { alignItems: 'center' },
  rate: { width: 96 },
});
