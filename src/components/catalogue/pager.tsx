import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';

export type PagerProps = {
  page: number;
  pageSize: number;
  total: number;
  /** "spring", "movement": what is counted, singular. */
  noun: string;
  busy?: boolean;
  onPage: (page: number) => void;
};

export function Pager({ page, pageSize, total, noun, busy = false, onPage }: PagerProps) {
  const { spacing } = useTheme();
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <View style={[styles.pager, { gap: spacing.md }]}>
      <Button variant="secondary" label="Previous" disabled={page <= 1 || busy} onPress={() => onPage(page - 1)} />
      <ThemedText color="textMuted" aria-live="polite">
        {`Page ${page} of ${pages} · ${total} ${total === 1 ? noun : `${noun}s`}`}
      </ThemedText>
      <Button variant="secondary" label="Next" disabled={page >= pages || busy} onPress={() => onPage(page + 1)} />
    </View>
  );
}

const styles = StyleSheet.create({
  pager: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap' },
});
