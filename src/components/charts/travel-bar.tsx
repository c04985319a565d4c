import Svg, { Line, Rect, Text as SvgText } from 'react-native-svg';

import type { EndResult } from '@shared/types/sizing';
import { useTheme } from '@/theme';

const WIDTH = 320;
const HEIGHT = 92;
const LEFT = 8;
const RIGHT = WIDTH - 8;

/**
 * An end's travel from topped out (left) to bottomed (right), with the static and rider sag
 * windows as bands and the measured sags as marks on them.
 */
export function TravelBar({ result, testID }: { result: EndResult; testID?: string }) {
  const { colors, fonts } = useTheme();
  const x = (mm: number) => LEFT + (Math.min(Math.max(mm, 0), result.travelMm) / result.travelMm) * (RIGHT - LEFT);
  const band = (range: { min: number; max: number }, y: number, fill: string) => (
    <Rect x={x(range.min)} y={y} width={Math.max(2, x(range.max) - x(range.min))} height={14} fill={fill} opacity={0.45} />
  );
  const mark = (mm: number | null, y: number, label: string, colour: string) =>
    mm === null ? null : (
      <>
        <Line x1={x(mm)} y1={y - 4} x2={x(mm)} y2={y + 18} stroke={colour} strokeWidth={3} />
        <SvgText x={Math.min(x(mm) + 4, RIGHT - 40)} y={y - 6} fill={colour} fontFamily={fonts.sans} fontSize={11}>
          {label}
        </SvgText>
      </>
    );
  return (
    <Svg width="100%" height={HEIGHT} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} testID={testID} accessibilityLabel="Travel with the sag windows">
      <Rect x={LEFT} y={22} width={RIGHT - LEFT} height={14} fill={colors.surface} stroke={colors.border} />
      <Rect x={LEFT} y={60} width={RIGHT - LEFT} height={14} fill={colors.surface} stroke={colors.border} />
      {band(result.target.staticSagMm, 22, colors.success)}
      {band(result.target.riderSagMm, 60, colors.success)}
      {mark(result.staticSagMm, 22, 'static', colors.text)}
      {mark(result.riderSagMm, 60, 'rider', colors.accent)}
      <SvgText x={LEFT} y={90} fill={colors.textMuted} fontFamily={fonts.sans} fontSize={10}>
        0
      </SvgText>
      <SvgText x={RIGHT - 40} y={90} fill={colors.textMuted} fontFamily={fonts.sans} fontSize={10}>
        full travel
      </SvgText>
    </Svg>
  );
}
