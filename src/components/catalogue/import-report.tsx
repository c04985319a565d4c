import { StyleSheet, View } from 'react-native';

import { Card, type CardTone } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { ImportDryRun, ImportOutcome, ImportRowReport } from '@shared/types/catalogue';

const OUTCOMES: Record<ImportOutcome, { label: string; tone: CardTone }> = {
  new: { label: 'New', tone: 'success' },
  updated: { label: 'Updated', tone: 'plain' },
  unchanged: { label: 'Unchanged', tone: 'plain' },
  error: { label: 'Error', tone: 'danger' },
};

function rowDetail(row: ImportRowReport): string[] {
  const lines: string[] = [];
  if (row.changes?.length) lines.push(`Changes ${row.changes.join(', ')}.`);
  if (row.stock) lines.push(`Count correction: on hand ${row.stock.from} → ${row.stock.to}.`);
  for (const error of row.errors ?? []) lines.push(`${error.column}: ${error.message}`);
  return lines;
}

/** What a dry run found: the counts, the columns read and ignored, and every row's outcome. */
export function ImportReport({ report }: { report: ImportDryRun }) {
  const { spacing } = useTheme();
  const { counts } = report;
  return (
    <View style={{ gap: spacing.md }} testID="import-report">
      <ThemedText type="heading">{`Dry run of ${report.fileName}`}</ThemedText>
      <ThemedText testID="import-counts">
        {`${counts.rows} rows: ${counts.new} new, ${counts.updated} updated, ${counts.unchanged} unchanged, ${counts.errors} with errors; ${counts.stockCorrections} ${counts.stockCorrections === 1 ? 'count correction' : 'count corrections'}.`}
      </ThemedText>
      {report.ignoredColumns.length > 0 && (
        <Card tone="warning">
          <ThemedText>{`Columns not recognised, so not read: ${report.ignoredColumns.join(', ')}.`}</ThemedText>
        </Card>
      )}
      <View role="list" aria-label="Rows of the file" style={{ gap: spacing.sm }}>
        {report.rows.map((row) => (
          <View key={row.line} role="listitem" testID={`import-row-${row.line}`}>
            <Card tone={OUTCOMES[row.outcome].tone}>
              <View style={[styles.head, { gap: spacing.sm }]}>
                <ThemedText type="bodyStrong">{`Line ${row.line} · ${row.sku || 'no SKU'}`}</ThemedText>
                <ThemedText type="label">{OUTCOMES[row.outcome].label}</ThemedText>
              </View>
              {rowDetail(row).map((text) => (
                <ThemedText key={text} type="caption">
                  {text}
                </ThemedText>
              ))}
            </Card>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({ head: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap' } });
