/** The catalogue's springs: a table on a wide window, cards on a phone. */
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';

import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { useTheme } from '@/theme';
import type { SpringDetail, SpringView } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

import { formatMoney } from './money';
import { formatRate } from './rate-text';

export type SpringListProps = { springs: readonly SpringView[]; unit: RateUnit };

const isDetail = (spring: SpringView): spring is SpringDetail => 'onHand' in spring;

export function rateText(spring: SpringView, unit: RateUnit): string {
  const first = formatRate(spring.rateInUnit, unit);
  return spring.secondRateInUnit === null ? first : `${first} → ${formatRate(spring.secondRateInUnit, unit)}`;
}

export function springHref(id: number) {
  return { pathname: '/counter/springs/[id]', params: { id: String(id) } } as const;
}

export function SpringTable({ springs, unit }: SpringListProps) {
  const { colors, radii, spacing } = useTheme();
  return (
    <View role="table" aria-label="Springs" style={[styles.table, { borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surface }]}>
      <View role="row" style={[styles.row, { padding: spacing.md, gap: spacing.md, borderBottomColor: colors.border }]}>
        <HeaderCell style={styles.sku}>SKU</HeaderCell>
        <HeaderCell style={styles.grow}>Fit</HeaderCell>
        <HeaderCell style={styles.rate}>{`Rate (${unit})`}</HeaderCell>
        <HeaderCell style={styles.num}>On hand</HeaderCell>
        <HeaderCell style={styles.num}>Available</HeaderCell>
        <HeaderCell style={styles.num}>Bin</HeaderCell>
        <HeaderCell style={styles.money}>Price</HeaderCell>
      </View>
      {springs.map((spring) => (
        <Link key={spring.id} href={springHref(spring.id)} asChild>
          <Pressable
            role="row"
            aria-label={`${spring.sku}, ${rateText(spring, unit)}`}
            testID={`spring-row-${spring.sku}`}
            // One flat style object: Link's asChild hands the child's style to the DOM as it is, and
            // neither a style function nor an array survives that.
            style={StyleSheet.flatten([styles.row, { padding: spacing.md, gap: spacing.md, borderBottomColor: colors.border }])}
          >
            <Cell style={styles.sku} strong>
              {spring.sku}
            </Cell>
            <Cell style={styles.grow}>{`${spring.kind} · ${spring.family}${spring.active ? '' : ' · inactive'}`}</Cell>
            <Cell style={styles.rate} figure>
              {rateText(spring, unit)}
            </Cell>
            <Cell style={styles.num} figure>
              {isDetail(spring) ? String(spring.onHand) : '–'}
            </Cell>
            <Cell style={styles.num} figure warn={isDetail(spring) && spring.belowReorderPoint}>
              {String(spring.available)}
            </Cell>
            <Cell style={styles.num}>{isDetail(spring) ? (spring.bin ?? '–') : '–'}</Cell>
            <Cell style={styles.money} figure>
              {formatMoney(spring.priceCents)}
            </Cell>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

export function SpringCards({ springs, unit }: SpringListProps) {
  const { spacing } = useTheme();
  return (
    <View role="list" aria-label="Springs" style={{ gap: spacing.md }}>
      {springs.map((spring) => (
        <Link key={spring.id} href={springHref(spring.id)} asChild>
          <Pressable role="listitem" aria-label={`${spring.sku}, ${rateText(spring, unit)}`} testID={`spring-card-${spring.sku}`}>
            <Card tone={isDetail(spring) && spring.belowReorderPoint ? 'warning' : 'plain'}>
              <View style={[styles.cardTop, { gap: spacing.sm }]}>
                <ThemedText type="bodyStrong">{spring.sku}</ThemedText>
                <ThemedText type="figure">{rateText(spring, unit)}</ThemedText>
              </View>
              <ThemedText color="textMuted">{`${spring.kind} · ${spring.family}${spring.active ? '' : ' · inactive'}`}</ThemedText>
              <ThemedText type="caption">
                {isDetail(spring)
                  ? `On hand ${spring.onHand} · available ${spring.available}${spring.bin ? ` · bin ${spring.bin}` : ''} · ${formatMoney(spring.priceCents)}`
                  : `Available ${spring.available} · ${formatMoney(spring.priceCents)}`}
              </ThemedText>
              {isDetail(spring) && spring.belowReorderPoint && (
                <ThemedText type="caption">{`Below its reorder point of ${spring.reorderPoint}.`}</ThemedText>
              )}
            </Card>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

function HeaderCell({ children, style }: { children: string; style: StyleProp<ViewStyle> }) {
  return (
    <View role="columnheader" style={style}>
      <ThemedText type="overline" color="textMuted">
        {children}
      </ThemedText>
    </View>
  );
}

type CellProps = { children: string; style: StyleProp<ViewStyle>; strong?: boolean; figure?: boolean; warn?: boolean };

function Cell({ children, style, strong, figure, warn }: CellProps) {
  return (
    <View role="cell" style={style}>
      <ThemedText type={strong ? 'bodyStrong' : figure ? 'figure' : 'body'} color={warn ? 'danger' : 'text'} numberOfLines={1}>
        {children}
      </ThemedText>
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1 },
  sku: { width: 150 },
  grow: { flex: 1, minWidth: 0 },
  rate: { width: 170 },
  num: { width: 80 },
  money: { width: 100 },
  cardTop: { flexDirection: 'row', justifyContent: 'space-between', flexWrap: 'wrap' },
});
