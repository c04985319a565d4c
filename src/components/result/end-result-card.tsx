import { View } from 'react-native';

import { RidePreviewChart } from '@/components/charts/ride-preview-chart';
import { TravelBar } from '@/components/charts/travel-bar';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { formatNumber } from '@shared/sizing/format';
import type { EndResult } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { formatPreloadChange } from './preload-text';
import { SpringLine } from './spring-line';

const REBOUND_HINTS = {
  more: 'Add rebound damping (clicks in) to match the stiffer spring.',
  less: 'Take rebound damping out (clicks out) to match the softer spring.',
  same: 'Rebound damping can stay as it is.',
} as const;

function Figure({ label, children }: { label: string; children: React.ReactNode }) {
  const { spacing } = useTheme();
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm }}>
      <ThemedText>{label}</ThemedText>
      <View style={{ flexDirection: 'row', gap: spacing.xs, alignItems: 'baseline' }}>{children}</View>
    </View>
  );
}

function Percent({ value, testID }: { value: number | null; testID: string }) {
  return value === null ? null : (
    <ThemedText type="figure" color="textMuted" testID={testID}>
      {formatNumber(value, 1)} %
    </ThemedText>
  );
}

/** Signed: positive adds preload. */
export function preloadUnitsOf(result: EndResult): number {
  const preload = result.preload;
  if (!preload || preload.direction === 'none') return 0;
  return preload.direction === 'remove' ? -Math.abs(preload.roundedChangeUnits) : Math.abs(preload.roundedChangeUnits);
}

/** Everything the engine answered for one end, in reading order. */
export function EndResultCard({ result }: { result: EndResult }) {
  const { spacing } = useTheme();
  const id = (name: string) => `result-${result.end}-${name}`;
  const { preload, recommendation, rideFrequencyHz } = result;
  return (
    <View style={{ gap: spacing.lg, flex: 1 }} testID={`result-${result.end}`}>
      <Card>
        <ThemedText type="heading">{result.end === 'front' ? 'Front' : 'Rear'}</ThemedText>
        <ThemedText type="bodyStrong" testID={id('verdict')}>
          {result.verdictText}
        </ThemedText>
        <TravelBar result={result} testID={id('travel-bar')} />
        <Figure label="Static sag">
          <Quantity value={result.staticSagMm} kind="length" testID={id('static-sag')} />
          <Percent value={result.staticSagPct} testID={id('static-sag-pct')} />
        </Figure>
        <Figure label="Rider sag">
          <Quantity value={result.riderSagMm} kind="length" testID={id('rider-sag')} />
          <Percent value={result.riderSagPct} testID={id('rider-sag-pct')} />
        </Figure>
        <Figure label="Rider sag target">
          <Quantity value={result.target.riderSagMm.min} kind="length" />
          <ThemedText>to</ThemedText>
          <Quantity value={result.target.riderSagMm.max} kind="length" />
        </Figure>
        <Figure label="Travel">
          <Quantity value={result.travelMm} kind="length" testID={id('travel')} />
        </Figure>
      </Card>
      {preload && (
        <Card tone={preload.direction === 'none' ? 'success' : 'warning'}>
          <ThemedText type="label">Preload</ThemedText>
          <ThemedText type="heading" testID={id('preload')}>
            {formatPreloadChange(preloadUnitsOf(result), preload.unit)}
          </ThemedText>
          <ThemedText color="textMuted">{preload.instruction}</ThemedText>
          <Figure label="Rider sag after">
            <Quantity value={preload.riderSagAfterMm} kind="length" testID={id('rider-sag-after')} />
          </Figure>
          <Figure label="Static sag after">
            <Quantity value={preload.staticSagAfterMm} kind="length" testID={id('static-sag-after')} />
          </Figure>
        </Card>
      )}
      <Card>
        <ThemedText type="label">Springs</ThemedText>
        <Figure label="Fitted">
          <Quantity value={result.installedRateNmm} kind="rate" testID={id('installed-rate')} />
        </Figure>
        {result.idealRateNmm !== null && (
          <Figure label="Ideal rate">
            <Quantity value={result.idealRateNmm} kind="rate" testID={id('ideal-rate')} />
          </Figure>
        )}
        {recommendation.inStock && <SpringLine title="Best on the shelf" spring={recommendation.inStock} testID={id('spring-stock')} />}
        {recommendation.best && recommendation.best.sku !== recommendation.inStock?.sku && (
          <SpringLine title="Best to order" spring={recommendation.best} testID={id('spring-best')} />
        )}
        {!recommendation.inStock && !recommendation.best && <ThemedText color="textMuted">No spring in the catalogue fits better.</ThemedText>}
        <Figure label="Ride frequency now">
          <ThemedText type="figure" testID={id('freq-current')}>
            {rideFrequencyHz.current === null ? '–' : `${formatNumber(rideFrequencyHz.current, 2)} Hz`}
          </ThemedText>
        </Figure>
        <Figure label="With the recommended spring">
          <ThemedText type="figure" testID={id('freq-recommended')}>
            {rideFrequencyHz.recommended === null ? '–' : `${formatNumber(rideFrequencyHz.recommended, 2)} Hz`}
          </ThemedText>
        </Figure>
        {result.reboundHint && <ThemedText color="textMuted">{REBOUND_HINTS[result.reboundHint]}</ThemedText>}
      </Card>
      <Card>
        <ThemedText type="label">Ride preview</ThemedText>
        <RidePreviewChart preview={result.preview} testID={id('preview')} />
      </Card>
      {result.warnings.map((warning) => (
        <Card key={warning.code} tone={warning.level === 'warning' ? 'warning' : 'plain'} testID={id(`warning-${warning.code}`)}>
          <ThemedText type="bodyStrong">{warning.message}</ThemedText>
          <ThemedText>What to do: {warning.hint}</ThemedText>
        </Card>
      ))}
    </View>
  );
}
