import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';

import { bookableDays, dayKeyOf, slotLabel, slotsOn, type DayKey } from './fitting-slots';

export type FittingPickerProps = {
  /** The chosen slot as an ISO 8601 instant, or null before one is chosen. */
  value: string | null;
  onChange: (iso: string) => void;
  /** Taken once per render; tests pass a fixed clock. */
  now?: Date;
  /** How many bookable days the strip offers. */
  days?: number;
  disabled?: boolean;
};

function dayParts(key: DayKey): { weekday: string; date: string } {
  const [year, month, day] = key.split('-').map(Number);
  const at = new Date(year, month - 1, day);
  return {
    weekday: at.toLocaleDateString(undefined, { weekday: 'short' }),
    date: at.toLocaleDateString(undefined, { day: 'numeric', month: 'short' }),
  };
}

/**
 * A fitting's day and time as two rows of choices, the same on a phone and in a browser: a strip
 * of the next bookable days, then that day's 30-minute slots. No typed date to get wrong.
 */
export function FittingPicker({ value, onChange, now = new Date(), days = 14, disabled = false }: FittingPickerProps) {
  const { spacing } = useTheme();
  const offered = bookableDays(now, days);
  const chosenDay = value ? dayKeyOf(new Date(value)) : null;
  const [day, setDay] = useState<DayKey>(chosenDay && offered.includes(chosenDay) ? chosenDay : offered[0]);
  const slots = slotsOn(day, now);
  return (
    <View style={{ gap: spacing.sm }} testID="fitting-picker">
      <ThemedText type="label">Day</ThemedText>
      <ScrollView horizontal showsHorizontalScrollIndicator contentContainerStyle={{ gap: spacing.xs, paddingBottom: spacing.xs }}>
        <View role="radiogroup" aria-label="Fitting day" style={[styles.row, { gap: spacing.xs }]}>
          {offered.map((key) => {
            const { weekday, date } = dayParts(key);
            return (
              <Chip key={key} label={`${weekday} ${date}`} selected={key === day} disabled={disabled} onPress={() => setDay(key)} testID={`fitting-day-${key}`}>
                <ThemedText type="caption" color={key === day ? 'surface' : 'textMuted'} selectable={false}>
                  {weekday}
                </ThemedText>
                <ThemedText type="label" color={key === day ? 'surface' : 'text'} selectable={false}>
                  {date}
                </ThemedText>
              </Chip>
            );
          })}
        </View>
      </ScrollView>
      <ThemedText type="label">Time</ThemedText>
      <View role="radiogroup" aria-label="Fitting time" style={[styles.row, styles.wrap, { gap: spacing.xs }]}>
        {slots.map((slot) => {
          const iso = slot.toISOString();
          const label = slotLabel(slot);
          return (
            <Chip key={iso} label={label} selected={iso === value} disabled={disabled} onPress={() => onChange(iso)} testID={`fitting-slot-${label}`}>
              <ThemedText type="label" color={iso === value ? 'surface' : 'text'} selectable={false}>
                {label}
              </ThemedText>
            </Chip>
          );
        })}
      </View>
    </View>
  );
}

type ChipProps = {
  label: string;
  selected: boolean;
  disabled: boolean;
  onPress: () => void;
  testID: string;
  children: React.ReactNode;
};

function Chip({ label, selected, disabled, onPress, testID, children }: ChipProps) {
  const { colors, radii, sizes, spacing } = useTheme();
  return (
    <Pressable
      role="radio"
      aria-checked={selected}
      aria-label={label}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      style={({ pressed }) => [
        styles.chip,
        {
          minHeight: sizes.touchTarget,
          minWidth: sizes.touchTarget + spacing.lg,
          paddingHorizontal: spacing.sm,
          paddingVertical: spacing.xxs,
          borderRadius: radii.sm,
          borderColor: selected ? colors.text : colors.border,
          backgroundColor: selected ? colors.text : pressed ? colors.accentSoft : colors.surface,
          opacity: disabled ? 0.6 : 1,
        },
      ]}
    >
      {children}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  wrap: { flexWrap: 'wrap' },
  chip: { alignItems: 'center', justifyContent: 'center', borderWidth: 2 },
});
