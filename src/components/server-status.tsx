import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useHealth } from '@/hooks/use-health';
import { useTheme, type ColorName } from '@/theme';

/** One line on whether the server answers, with a way to ask again when it does not. */
export function ServerStatus() {
  const { data, error, isValidating, mutate } = useHealth();
  const { spacing } = useTheme();

  let tone: ColorName;
  let headline: string;
  let detail: string | undefined;
  if (error) {
    tone = 'danger';
    // Status 0: no answer at all; anything else: an answer that was not a healthy report.
    headline = error.status === 0 ? 'Server unreachable' : 'Server check failed';
    detail = error.message;
  } else if (!data) {
    tone = 'textMuted';
    headline = 'Checking the server…';
  } else if (data.ok) {
    tone = 'success';
    headline = 'Server up';
  } else {
    tone = 'warning';
    headline = 'Server up, reporting a problem';
  }

  return (
    <Card testID="server-status">
      <View aria-live="polite" style={{ gap: spacing.xs }}>
        <ThemedText type="overline" color="textMuted">
          Server status
        </ThemedText>
        <View style={[styles.row, { gap: spacing.sm }]}>
          <StatusDot color={tone} />
          <ThemedText type="bodyStrong" color={tone === 'textMuted' ? 'textMuted' : 'text'}>
            {headline}
          </ThemedText>
        </View>
        {data && !error && (
          <View style={[styles.facts, { gap: spacing.lg }]}>
            <Fact label="Version" value={data.version} />
            <Fact label="Database" value={data.database.ok ? `SQLite ${data.database.sqlite ?? ''}`.trim() : 'not answering'} />
          </View>
        )}
        {detail && <ThemedText color="textMuted">{detail}</ThemedText>}
      </View>
      {error && (
        <Button
          variant="secondary"
          label={isValidating ? 'Checking…' : 'Try again'}
          disabled={isValidating}
          onPress={() => mutate()}
          style={{ marginTop: spacing.xs }}
        />
      )}
    </Card>
  );
}

function StatusDot({ color }: { color: ColorName }) {
  const { colors, radii } = useTheme();
  return (
    <View style={[styles.dot, { backgroundColor: colors[color], borderRadius: radii.pill }]} />
  );
}

function Fact({ label, value }: { label: string; value: string }) {
  const { spacing } = useTheme();
  return (
    <View style={[styles.fact, { gap: spacing.xs }]}>
      <ThemedText type="caption" color="textMuted">
        {label}
      </ThemedText>
      <ThemedText type="figure">{value}</ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center' },
  facts: { flexDirection: 'row', flexWrap: 'wrap' },
  fact: { flexDirection: 'row', alignItems: 'baseline' },
  dot: { width: 10, height: 10 },
});
