import { View } from 'react-native';

import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { MovementKind, StockMovementView } from '@shared/types/catalogue';

export const KIND_LABELS: Record<MovementKind, string> = {
  receive: 'Received',
  correction: 'Count correction',
  reserve: 'Reserved',
  release: 'Released',
  fit: 'Fitted',
};

const signed = (delta: number) => (delta > 0 ? `+${delta}` : String(delta));

function describeChange(movement: StockMovementView): string {
  const parts: string[] = [];
  if (movement.onHandDelta !== 0) parts.push(`on hand ${signed(movement.onHandDelta)} → ${movement.onHandAfter}`);
  if (movement.reservedDelta !== 0) parts.push(`reserved ${signed(movement.reservedDelta)} → ${movement.reservedAfter}`);
  return parts.length ? parts.join(', ') : `no change (on hand ${movement.onHandAfter})`;
}

export type MovementListProps = {
  movements: readonly StockMovementView[];
  /** The ledger mixes springs, so each line names its own; a spring's page does not need to. */
  showSku?: boolean;
  label?: string;
};

/** Stock movements, newest first as the server sends them. */
export function MovementList({ movements, showSku = false, label = 'Stock history' }: MovementListProps) {
  const { colors, spacing } = useTheme();
  return (
    <View role="list" aria-label={label}>
      {movements.map((movement) => (
        <View
          key={movement.id}
          role="listitem"
          style={{ paddingVertical: spacing.sm, borderBottomWidth: 1, borderBottomColor: colors.border, gap: spacing.xxs }}
        >
          <ThemedText type="bodyStrong">{`${showSku ? `${movement.sku} · ` : ''}${KIND_LABELS[movement.kind]}: ${describeChange(movement)}`}</ThemedText>
          <ThemedText type="caption" color="textMuted">
            {`${new Date(movement.at).toLocaleString()} · ${movement.user?.name ?? 'System'} · ${movement.reason}${movement.holdId ? ` · hold #${movement.holdId}` : ''}${movement.importBatchId ? ` · import #${movement.importBatchId}` : ''}`}
          </ThemedText>
        </View>
      ))}
    </View>
  );
}
