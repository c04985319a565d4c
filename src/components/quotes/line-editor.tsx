import { StyleSheet, View } from 'react-native';

import { formatMoney } from '@/components/catalogue/money';
import { Button } from '@/components/ui/button';
import { ThemedText } from '@/components/ui/themed-text';
import type { QuoteLineInput } from '@/hooks/use-quote';
import { useTheme } from '@/theme';
import type { LabourOperation, QuoteView, SpringOption } from '@shared/types/quote';

/** The draft's lines as the server would take them back. */
export function linesOf(quote: QuoteView): QuoteLineInput[] {
  return quote.lines.flatMap((line): QuoteLineInput[] => {
    if (line.kind === 'spring' && line.springId !== null && line.end) {
      return [{ kind: 'spring', springId: line.springId, end: line.end, quantity: line.quantity }];
    }
    if (line.kind === 'labour' && line.operationCode) {
      return [{ kind: 'labour', operationCode: line.operationCode, quantity: line.quantity }];
    }
    return [];
  });
}

export type LineEditorProps = {
  quote: QuoteView;
  options: { front: SpringOption[]; rear: SpringOption[] } | undefined;
  operations: LabourOperation[];
  saving: boolean;
  onSave: (lines: QuoteLineInput[]) => void;
};

const ENDS = [
  { end: 'front', label: 'Fork springs' },
  { end: 'rear', label: 'Shock springs' },
] as const;

/** A draft's lines: change a quantity, take a line off, add a spring or a labour operation. */
export function LineEditor({ quote, options, operations, saving, onSave }: LineEditorProps) {
  const { spacing, colors } = useTheme();
  const lines = linesOf(quote);
  const change = (index: number, quantity: number) =>
    onSave(quantity <= 0 ? lines.filter((_, i) => i !== index) : lines.map((l, i) => (i === index ? { ...l, quantity } : l)));
  const addSpring = (option: SpringOption, end: 'front' | 'rear') => {
    const index = lines.findIndex((l) => l.kind === 'spring' && l.springId === option.springId && l.end === end);
    if (index >= 0) change(index, lines[index].quantity + 1);
    else onSave([...lines, { kind: 'spring', springId: option.springId, end, quantity: end === 'front' ? 2 : 1 }]);
  };
  const addLabour = (operation: LabourOperation) => {
    const index = lines.findIndex((l) => l.kind === 'labour' && l.operationCode === operation.code);
    if (index >= 0) change(index, lines[index].quantity + 1);
    else onSave([...lines, { kind: 'labour', operationCode: operation.code, quantity: 1 }]);
  };

  return (
    <View style={{ gap: spacing.lg }}>
      <View role="list" style={{ gap: spacing.sm }}>
        {quote.lines.map((line, index) => (
          <View
            key={line.id}
            role="listitem"
            style={[styles.row, { gap: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border, paddingBottom: spacing.sm }]}
          >
            <View style={styles.grow}>
              <ThemedText>{line.description}</ThemedText>
              <ThemedText type="caption" color="textMuted">
                {line.kind === 'labour'
                  ? `${line.quantity} × ${line.minutes ?? 0} min at ${formatMoney(line.unitPriceCents, quote.currency)} an hour`
                  : `${line.quantity} × ${formatMoney(line.unitPriceCents, quote.currency)}`}
              </ThemedText>
            </View>
            <ThemedText type="figure">{formatMoney(line.lineCents, quote.currency)}</ThemedText>
            <Button
              variant="secondary"
              label="−"
              accessibilityLabel={`One fewer: ${line.description}`}
              disabled={saving}
              onPress={() => change(index, line.quantity - 1)}
            />
            <Button
              variant="secondary"
              label="+"
              accessibilityLabel={`One more: ${line.description}`}
              disabled={saving}
              onPress={() => change(index, line.quantity + 1)}
            />
          </View>
        ))}
      </View>

      {ENDS.map(({ end, label }) =>
        options && options[end].length > 0 ? (
          <View key={end} style={{ gap: spacing.sm }}>
            <ThemedText type="label">{label}</ThemedText>
            {options[end].map((option) => (
              <View key={option.springId} style={[styles.row, { gap: spacing.sm }]} testID={`spring-option-${option.sku}`}>
                <View style={styles.grow}>
                  <ThemedText>
                    {option.sku} · {option.rateNmm} N/mm{option.recommended ? ' · recommended' : ''}
                  </ThemedText>
                  <ThemedText type="caption" color={option.available > 0 ? 'textMuted' : 'danger'}>
                    {option.available > 0 ? `${option.available} in stock` : 'Out of stock'} ·{' '}
                    {formatMoney(option.priceCents, quote.currency)}
                  </ThemedText>
                </View>
                <Button
                  variant="secondary"
                  label="Add"
                  accessibilityLabel={`Add ${option.sku}`}
                  disabled={saving || option.available <= 0 || option.priceCents === null}
                  onPress={() => addSpring(option, end)}
                />
              </View>
            ))}
          </View>
        ) : null,
      )}

      {operations.length > 0 && (
        <View style={{ gap: spacing.sm }}>
          <ThemedText type="label">Labour</ThemedText>
          {operations.map((operation) => (
            <View key={operation.code} style={[styles.row, { gap: spacing.sm }]}>
              <ThemedText style={styles.grow}>
                {operation.label} · {operation.minutes} min
              </ThemedText>
              <Button
                variant="secondary"
                label="Add"
                accessibilityLabel={`Add ${operation.label}`}
                disabled={saving}
                onPress={() => addLabour(operation)}
              />
            </View>
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center' },
  grow: { flex: 1 },
});
