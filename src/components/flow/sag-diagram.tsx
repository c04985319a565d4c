import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import type { EndKind } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import type { Stage } from './step-texts';

const WIDTH = 320;
const HEIGHT = 200;
const GROUND = 180;
const WHEEL_R = 42;

/**
 * One end of a bike, side on, for a measuring step: the wheel on the ground or lifted off it, the
 * two marks, the length being read between them, and the rider when aboard.
 */
export function SagDiagram({ end, stage }: { end: EndKind; stage: Stage }) {
  const { colors, fonts } = useTheme();
  const lifted = stage === 'extended';
  // Extended hangs the wheel lower from the frame; loaded, the frame sinks towards the wheel.
  const sink = stage === 'extended' ? 0 : stage === 'static' ? 8 : 20;
  const axleY = lifted ? GROUND - WHEEL_R - 14 : GROUND - WHEEL_R;
  const frameY = axleY - 70 + sink;
  const axleX = end === 'rear' ? 90 : 230;
  const stroke = { stroke: colors.text, strokeWidth: 3, strokeLinecap: 'round' as const };
  const mark = { fill: colors.accent };
  const measure = { stroke: colors.accent, strokeWidth: 2.5 };

  return (
    <Svg width="100%" height={HEIGHT} viewBox={`0 0 ${WIDTH} ${HEIGHT}`} accessibilityLabel={`Diagram: ${end} ${stage}`}>
      <Line x1={0} y1={GROUND} x2={WIDTH} y2={GROUND} stroke={colors.textMuted} strokeWidth={2} />
      {lifted && <Rect x={end === 'rear' ? 150 : 130} y={GROUND - 40} width={40} height={40} fill={colors.border} stroke={colors.textMuted} />}
      <Circle cx={axleX} cy={axleY} r={WHEEL_R} fill="none" {...stroke} strokeWidth={7} stroke={colors.textMuted} />
      <Circle cx={axleX} cy={axleY} r={4} fill={colors.text} />
      {end === 'rear' ? (
        <G>
          {/* swingarm to the pivot, subframe and tail above the axle */}
          <Line x1={axleX} y1={axleY} x2={190} y2={frameY + 40} {...stroke} />
          <Path d={`M 40 ${frameY} L 260 ${frameY} L 300 ${frameY + 30}`} fill="none" {...stroke} />
          <Circle cx={axleX} cy={frameY} r={5} {...mark} />
          <Line x1={axleX} y1={axleY} x2={axleX} y2={frameY} {...measure} />
          <SvgText x={axleX - 30} y={frameY - 8} fill={colors.accent} fontFamily={fonts.sans} fontSize={14} fontWeight="bold">
            {'L ↕'}
          </SvgText>
        </G>
      ) : (
        <G>
          {/* fork leg along its axis: slider with the dust seal, stanchion up to the yoke */}
          <Line x1={axleX} y1={axleY} x2={axleX - 40} y2={frameY - 20} {...stroke} strokeWidth={6} />
          <Line x1={axleX - 40} y1={frameY - 20} x2={20} y2={frameY - 20} {...stroke} />
          <Circle cx={axleX - 18} cy={(axleY + frameY) / 2 - 4 - sink / 2} r={5} {...mark} />
          <Circle cx={axleX} cy={axleY} r={6} {...mark} />
          <Line x1={axleX + 10} y1={axleY + 2} x2={axleX - 8} y2={(axleY + frameY) / 2 - 2 - sink / 2} {...measure} />
          <SvgText x={axleX + 14} y={(axleY + frameY) / 2 - 8} fill={colors.accent} fontFamily={fonts.sans} fontSize={14} fontWeight="bold">
            {'L'}
          </SvgText>
        </G>
      )}
      {stage === 'rider' && (
        <G>
          <Circle cx={160} cy={frameY - 60} r={12} fill="none" {...stroke} />
          <Path d={`M 160 ${frameY - 48} L 150 ${frameY - 4} L 185 ${frameY + 30}`} fill="none" {...stroke} />
          <Line x1={158} y1={frameY - 36} x2={210} y2={frameY - 24} {...stroke} />
        </G>
      )}
    </Svg>
  );
}
