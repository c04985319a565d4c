import { useState } from 'react';
import { View } from 'react-native';
import Svg, { Line, Polyline, Text as SvgText } from 'react-native-svg';

import { Button } from '@/components/ui/button';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { ThemedText } from '@/components/ui/themed-text';
import { sampleStepResponse, type StepKind } from '@shared/sizing';
import { formatNumber } from '@shared/sizing/format';
import type { RidePreview } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const WIDTH = 320;
const HEIGHT = 160;
const PAD = 20;
const SAMPLES = 120;

const KINDS = [
  { value: 'road', label: 'Road step' },
  { value: 'load', label: 'Load step' },
] as const;

const DAMPING_STEP = 0.05;

/**
 * How the end settles after a step in the road (or a sudden load), old spring against new. The
 * damping ratio is the engine's assumption; the rider may try others, scaling both curves alike.
 */
export function RidePreviewChart({ preview, testID }: { preview: RidePreview; testID?: string }) {
  const { colors, fonts, spacing } = useTheme();
  const [kind, setKind] = useState<StepKind>('road');
  const [damping, setDamping] = useState(preview.assumedDampingRatio);
  if (!preview.durationS || (!preview.old && !preview.new)) return null;
  const scale = damping / preview.assumedDampingRatio;
  const duration = preview.durationS;
  const curves = [
    { curve: preview.old, colour: colors.textMuted, label: 'fitted spring' },
    { curve: preview.new, colour: colors.accent, label: 'recommended' },
  ].filter((item) => item.curve);
  const sampled = curves.map((item) => ({ ...item, ...sampleStepResponse(kind, item.curve!.wnRadS, item.curve!.zeta * scale, duration, SAMPLES) }));
  const peak = Math.max(1.2, ...sampled.flatMap((item) => item.x));
  const low = Math.min(0, ...sampled.flatMap((item) => item.x));
  const px = (t: number) => PAD + (t / duration) * (WIDTH - 2 * PAD);
  const py = (x: number) => HEIGHT - PAD - ((x - low) / (peak - low)) * (HEIGHT - 2 * PAD);
  return (
    <View style={{ gap: spacing.sm }} testID={testID}>
      <SegmentedChoice label="Kind of step" options={KINDS} value={kind} onChange={setKind} />
      <Svg width="100%" height={HEIGHT} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} accessibilityLabel="Ride preview">
        <Line x1={PAD} y1={py(1)} x2={WIDTH - PAD} y2={py(1)} stroke={colors.border} strokeDasharray="4 4" />
        <Line x1={PAD} y1={py(0)} x2={WIDTH - PAD} y2={py(0)} stroke={colors.border} />
        {sampled.map((item) => (
          <Polyline
            key={item.label}
            points={item.t.map((t, i) => `${px(t)},${py(item.x[i])}`).join(' ')}
            fill="none"
            stroke={item.colour}
            strokeWidth={2.5}
          />
        ))}
        <SvgText x={WIDTH - PAD - 30} y={HEIGHT - 4} fill={colors.textMuted} fontFamily={fonts.sans} fontSize={10}>
          {formatNumber(duration, 2)} s
        </SvgText>
      </Svg>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md }}>
        {sampled.map((item) => (
          <ThemedText key={item.label} type="caption" style={{ color: item.colour }}>
            ━ {item.label}
          </ThemedText>
        ))}
      </View>
      <View style={{ flexDirection: 'row', alignItems: 'center', gap: spacing.sm }}>
        <Button variant="secondary" label="−" aria-label="Less damping" onPress={() => setDamping((d) => Math.max(0.05, d - DAMPING_STEP))} />
        <ThemedText type="figure" testID={testID && `${testID}-damping`}>
          damping ratio {formatNumber(damping, 2)}
        </ThemedText>
        <Button variant="secondary" label="+" aria-label="More damping" onPress={() => setDamping((d) => Math.min(1.5, d + DAMPING_STEP))} />
      </View>
      <ThemedText type="caption" color="textMuted">
        {preview.note}
      </ThemedText>
    </View>
  );
}
