import { Platform, StyleSheet, View } from 'react-native';

import { counterKeys } from '@/api/keys';
import { DownloadButton } from '@/components/catalogue/download-button';
import { rateText } from '@/components/catalogue/spring-list';
import { usePrintSheet } from '@/components/catalogue/use-print-sheet';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { TextLink } from '@/components/ui/text-link';
import { ThemedText } from '@/components/ui/themed-text';
import { useLowStock } from '@/hooks/use-low-stock';
import { useUnits } from '@/hooks/use-units';
import { useLayout, useTheme } from '@/theme';

/**
 * The re-order sheet: springs below their reorder point with the shortfall. It is plain rows on
 * the page surface so window.print gives a usable sheet; the CSV goes to the supplier.
 */
export default function LowStockScreen() {
  const { colors, spacing } = useTheme();
  const { isWide } = useLayout();
  // A phone has room for the numbers only when their columns stay narrow.
  const cell = { width: isWide ? 100 : 64 };
  const { units } = useUnits();
  usePrintSheet();
  const { data, error, isValidating, mutate } = useLowStock(units.rateUnit);

  return (
    <Screen width="table">
      <TextLink href="/counter">← Spring catalogue</TextLink>
      <ThemedText type="title">Low stock</ThemedText>
      <View style={[styles.row, { gap: spacing.sm }]}>
        {Platform.OS === 'web' && <Button variant="secondary" label="Print the sheet" onPress={() => window.print()} />}
        <DownloadButton label="Export the re-order sheet" path={counterKeys.lowStockCsv} fileName="re-order-sheet.csv" />
      </View>
      {error && !data ? (
        <ErrorState title="The low-stock list could not be loaded" message={error.message} onRetry={() => void mutate()} retrying={isValidating} />
      ) : !data ? (
        <LoadingState label="Loading the low-stock list…" />
      ) : data.lines.length === 0 ? (
        <EmptyState title="Nothing is below its reorder point." />
      ) : (
        <View role="table" aria-label="Re-order sheet">
          <View role="row" style={[styles.line, { gap: spacing.sm, paddingVertical: spacing.sm, borderBottomColor: colors.text }]}>
            {['Spring', 'Available', 'Reorder at', 'Order'].map((title, index) => (
              <ThemedText key={title} role="columnheader" type="caption" color="textMuted" style={index === 0 ? styles.grow : cell}>
                {title}
              </ThemedText>
            ))}
          </View>
          {data.lines.map(({ spring, shortfall }) => (
            <View key={spring.id} role="row" style={[styles.line, { gap: spacing.sm, paddingVertical: spacing.sm, borderBottomColor: colors.border }]}>
              <View role="cell" style={styles.grow}>
                <ThemedText type="bodyStrong">{spring.sku}</ThemedText>
                <ThemedText type="caption">
                  {`${spring.kind} · ${spring.family} · ${rateText(spring, data.unit)}${spring.supplier ? ` · ${spring.supplier} ${spring.supplierCode ?? ''}` : ''}`}
                </ThemedText>
              </View>
              {[spring.available, spring.reorderPoint, shortfall].map((figure, index) => (
                <ThemedText key={index} role="cell" type="figure" style={cell}>
                  {String(figure)}
                </ThemedText>
              ))}
            </View>
          ))}
        </View>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap' },
  line: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1 },
  grow: { flex: 1, minWidth: 0 },
});
