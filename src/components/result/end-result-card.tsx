import type { ReactNode } from 'react';
import { View } from 'react-native';

import { RidePreviewChart } from '@/components/charts/ride-preview-chart';
import { TravelBar } from '@/components/charts/travel-bar';
import { Card } from '@/components/ui/card';
import { ThemedText } from '@/components/ui/themed-text';
import { Quantity } from '@/components/units/quantity';
import { useQuantityFormat } from '@/components/units/quantity-format';
import { describeChange } from '@shared/sizing/adjuster';
import { describeLoadCase, nameSpring } from '@shared/sizing/decision-text';
import { formatNumber } from '@shared/sizing/format';
import type { EndResult, RangeMm } from '@shared/types/sizing';
import { useTheme } from '@/theme';

import { DecisionView } from './decision-view';
import { SpringLine } from './spring-line';

function Figure({ label, children }: { label: string; children: ReactNode }) {
  const { spacing } = useTheme();
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: spacing.sm }}>
      <ThemedText>{label}</ThemedText>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs, alignItems: 'baseline' }}>{children}</View>
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

function PlusMinus({ value, kind, testID }: { value: number | null; kind: 'length' | 'rate'; testID: string }) {
  if (value === null) return null;
  return (
    <View style={{ flexDirection: 'row', alignItems: 'baseline' }} testID={testID}>
      <ThemedText type="figure" color="textMuted">
        ±{' '}
      </ThemedText>
      <Quantity value={value} kind={kind} />
    </View>
  );
}

/** "window 18 to 26.4 mm", beside each sag, so a reader never has to open anything to compare. */
function Window({ range, testID }: { range: RangeMm; testID: string }) {
  const format = useQuantityFormat();
  return (
    <ThemedText type="caption" color="textMuted" testID={testID}>
      window {format.length(range.min)} to {format.length(range.max)}
    </ThemedText>
  );
}

/** Signed, in the adjuster's units: positive adds preload. */
export function preloadUnitsOf(result: EndResult): number {
  const preload = result.preload;
  if (!preload || preload.direction === 'none') return 0;
  return preload.roundedChangeUnits;
}

/** Everything the engine answered for one end, the decision first, then the figures it rests on. */
export function EndResultCard({ result }: { result: EndResult }) {
  const { spacing } = useTheme();
  const format = useQuantityFormat();
  const id = (name: string) => `result-${result.end}-${name}`;
  const { preload, rideFrequencyHz, decision, sagDifference, frictionBandMm } = result;
  const hasPreloadStep = decision.legacy ? preload !== null : decision.steps.some((s) => s.kind === 'preload');
  const pickIsChange = decision.kind === 'change' && decision.pick !== null;
  const best = result.recommendation.best;
  const dual = result.installedSpring.secondRateNmm !== null;
  return (
    <View style={{ gap: spacing.lg, flex: 1 }} testID={`result-${result.end}`}>
      <ThemedText type="heading">{result.end === 'front' ? 'Front' : 'Rear'}</ThemedText>
      <DecisionView result={result} testID={id('decision')} />
      <Card>
        <ThemedText type="label">Sags</ThemedText>
        <TravelBar result={result} testID={id('travel-bar')} />
        <Figure label="Static sag">
          <Quantity value={result.staticSagMm} kind="length" testID={id('static-sag')} />
          <PlusMinus value={frictionBandMm?.static ?? null} kind="length" testID={id('static-band')} />
          <Percent value={result.staticSagPct} testID={id('static-sag-pct')} />
        </Figure>
        <Window range={result.target.staticSagMm} testID={id('static-window')} />
        <Figure label="Rider sag">
          <Quantity value={result.riderSagMm} kind="length" testID={id('rider-sag')} />
          <PlusMinus value={frictionBandMm?.rider ?? null} kind="length" testID={id('rider-band')} />
          <Percent value={result.riderSagPct} testID={id('rider-sag-pct')} />
        </Figure>
        <Window range={result.target.riderSagMm} testID={id('rider-window')} />
        {sagDifference && (
          <Figure label="Rider minus static">
            <Quantity value={sagDifference.mm} kind="length" testID={id('sag-difference')} />
            <PlusMinus value={sagDifference.bandMm} kind="length" testID={id('sag-difference-band')} />
          </Figure>
        )}
        {sagDifference?.softLimitMm != null && sagDifference.stiffLimitMm != null && (
          <ThemedText type="caption" color="textMuted" testID={id('sag-difference-limits')}>
            the fitted spring suits between {format.length(sagDifference.stiffLimitMm)} and {format.length(sagDifference.softLimitMm)}
          </ThemedText>
        )}
        <Figure label="Travel">
          <Quantity value={result.travelMm} kind="length" testID={id('travel')} />
        </Figure>
        <ThemedText type="caption" color="textMuted">
          {result.mode === 'readings' ? 'Measured' : 'Predicted from the weights'} · {result.target.label} windows
        </ThemedText>
      </Card>
      {preload && hasPreloadStep && (
        <Card tone={preload.interim ? 'warning' : preload.direction === 'none' ? 'success' : 'plain'} testID={id('preload-card')}>
          <ThemedText type="label">{preload.interim ? 'Preload for now' : 'Preload'}</ThemedText>
          <ThemedText type="heading" accessibilityRole="text" testID={id('preload')}>
            {describeChange(preload.unit, preloadUnitsOf(result))}
          </ThemedText>
          <ThemedText color="textMuted">{preload.instruction}</ThemedText>
          <Figure label="Rider sag after">
            <Quantity value={preload.riderSagAfterMm} kind="length" testID={id('rider-sag-after')} />
          </Figure>
          <Figure label={preload.staticSagAfterMaxMm !== null ? 'Static sag after, at most' : 'Static sag after'}>
            <Quantity value={preload.staticSagAfterMaxMm ?? preload.staticSagAfterMm} kind="length" testID={id('static-sag-after')} />
          </Figure>
        </Card>
      )}
      <Card>
        <ThemedText type="label">Springs</ThemedText>
        <Figure label="Fitted">
          <ThemedText type="figure" testID={id('installed-spring')}>
            {nameSpring(result.installedSpring, format)}
          </ThemedText>
        </Figure>
        {(dual || result.mode === 'readings') && (
          <Figure label={dual ? 'Its rate over the sags' : 'Rate the readings show'}>
            <Quantity value={dual ? result.installedRateNmm : result.impliedRateNmm} kind="rate" testID={id(dual ? 'installed-rate' : 'implied-rate')} />
            {!dual && <PlusMinus value={result.impliedRateBandNmm} kind="rate" testID={id('implied-rate-band')} />}
          </Figure>
        )}
        {result.idealRateNmm !== null && (
          <Figure label="Ideal rate">
            <Quantity value={result.idealRateNmm} kind="rate" testID={id('ideal-rate')} />
            <PlusMinus value={result.idealRateBandNmm} kind="rate" testID={id('ideal-rate-band')} />
          </Figure>
        )}
        {decision.pick && (
          <SpringLine title={pickIsChange ? 'To fit' : 'The better option'} spring={decision.pick} testID={id('spring-pick')} />
        )}
        {pickIsChange && best && best.sku !== decision.pick?.sku && <SpringLine title="Nearer the ideal, to order" spring={best} testID={id('spring-best')} />}
        <Figure label="Ride frequency now">
          <ThemedText type="figure" testID={id('freq-current')}>
            {rideFrequencyHz.current === null ? '–' : `${formatNumber(rideFrequencyHz.current, 2)} Hz`}
          </ThemedText>
        </Figure>
        <Figure label="After the change">
          <ThemedText type="figure" testID={id('freq-after')}>
            {rideFrequencyHz.after === null ? '–' : `${formatNumber(rideFrequencyHz.after, 2)} Hz`}
          </ThemedText>
        </Figure>
      </Card>
      {result.loadCases.length > 0 && decision.kind !== 'check' && (
        <Card testID={id('load-cases')}>
          <ThemedText type="label">With a passenger or luggage</ThemedText>
          {result.loadCases.map((loadCase, i) => (
            <ThemedText key={loadCase.name} color={loadCase.carries ? 'text' : 'danger'} testID={id(`load-case-${i}`)}>
              {describeLoadCase(loadCase, format)}
            </ThemedText>
          ))}
        </Card>
      )}
      <Card>
        <ThemedText type="label">Ride preview</ThemedText>
        <RidePreviewChart preview={result.preview} testID={id('preview')} />
      </Card>
      {result.warnings.map((warning) => (
        <Card key={warning.code + warning.message} tone={warning.level === 'warning' ? 'warning' : 'plain'} testID={id(`warning-${warning.code}`)}>
          <ThemedText type="bodyStrong">{warning.message}</ThemedText>
          <ThemedText>What to do: {warning.hint}</ThemedText>
        </Card>
      ))}
    </View>
  );
}
