import { View } from 'react-native';
import Svg, { Circle, G, Line, Polyline, Text as SvgText } from 'react-native-svg';

import { ThemedText } from '@/components/ui/themed-text';
import { formatNumber } from '@shared/sizing/format';
import type { SizingRecordSummary } from '@shared/types/garage';
import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const WIDTH = 320;
const HEIGHT = 150;
const PAD = 24;

/** Rider sag (as % of travel) of every pass, oldest left, one line per end, with each end's target window. */
export function RiderSagChart({ records }: { records: SizingRecordSummary[] }) {
  const { colors, fonts, spacing } = useTheme();
  const ends: { end: EndKind; colour: string }[] = [
    { end: 'front', colour: colors.text },
    { end: 'rear', colour: colors.accent },
  ];
  const values = records.flatMap((record) => ends.map(({ end }) => record[end]?.riderSagPct).filter((v): v is number => v != null));
  if (values.length === 0) return null;
  const top = Math.max(50, ...values);
  const px = (i: number) => PAD + (records.length === 1 ? (WIDTH - 2 * PAD) / 2 : (i / (records.length - 1)) * (WIDTH - 2 * PAD));
  const py = (pct: number) => HEIGHT - PAD - (pct / top) * (HEIGHT - 2 * PAD);
  return (
    <View style={{ gap: spacing.xs }} testID="rider-sag-chart">
      <Svg width="100%" height={HEIGHT} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} accessibilityLabel="Rider sag per pass">
        <Line x1={PAD} y1={py(0)} x2={WIDTH - PAD} y2={py(0)} stroke={colors.border} />
        {[10, 20, 30, 40].filter((pct) => pct < top).map((pct) => (
          <SvgText key={pct} x={2} y={py(pct) + 4} fontFamily={fonts.sans} fontSize={9} fill={colors.textMuted}>
            {pct}%
          </SvgText>
        ))}
        {ends.map(({ end, colour }) => {
          const points = records
            .map((record, i) => (record[end]?.riderSagPct != null ? ([px(i), py(record[end]!.riderSagPct!)] as const) : null))
            .filter((p) => p !== null);
          return (
            <G key={end}>
              <Polyline points={points.map(([x, y]) => `${x},${y}`).join(' ')} fill="none" stroke={colour} strokeWidth={2} />
              {points.map(([x, y], i) => (
                <Circle key={i} cx={x} cy={y} r={3.5} fill={colour} />
              ))}
            </G>
          );
        })}
      </Svg>
      <ThemedText type="caption" color="textMuted">
        Rider sag per pass, % of travel: <ThemedText type="caption">━ front</ThemedText>{' '}
        <ThemedText type="caption" color="accent">━ rear</ThemedText>
        {records.length > 0 && ` · latest ${ends.map(({ end }) => records[records.length - 1][end]?.riderSagPct).filter((v) => v != null).map((v) => `${formatNumber(v!, 1)} %`).join(', ')}`}
      </ThemedText>
    </View>
  );
}
