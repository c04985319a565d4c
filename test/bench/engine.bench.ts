/**
 * The sizing engine in-process, on one core: a realistic two-end request from readings, no
 * linkage curve, against the demo catalogue. Baseline: a JSON copy of the same request, the
 * least work any handler does with it.
 */
import { validateSizingRequest } from '../../shared/schemas/sizing.schema';
import { buildWarningThresholds, sizeBike } from '../../shared/sizing';
import type { SizingContext, SizingRequest } from '../../shared/types/sizing';
import { demoSprings } from '../../server/seed/demo-catalogue';
import { engineSettingSeeds, targetProfileSeeds } from '../../server/seed/sizing-defaults';
import body from '../server/fixtures/sizing-two-ends.json';
import { BenchRow, measureRate } from './measure';

export function benchEngine(): BenchRow[] {
  const request = body as SizingRequest;
  const springs = demoSprings().map((s) => ({ ...s, reserved: 0 })) as SizingContext['springs']['front'];
  const context: SizingContext = {
    profile: targetProfileSeeds.find((p) => p.discipline === 'road')!,
    thresholds: buildWarningThresholds(engineSettingSeeds),
    springs: {
      front: springs.filter((s) => s.family === request.front!.family),
      rear: springs.filter((s) => s.family === request.rear!.family),
    },
  };
  const baseline = measureRate(() => JSON.parse(JSON.stringify(request)));
  const engine = measureRate(() => sizeBike(request, context));
  const validated = measureRate(() => validateSizingRequest(body));
  const fmt = (r: { opsPerSecond: number; microsPerOp: number }) =>
    `${Math.round(r.opsPerSecond).toLocaleString('en')}/s (${r.microsPerOp.toFixed(1)} µs)`;
  return [
    {
      name: 'engine: time per two-end sizing',
      figure: fmt(engine),
      baseline: `JSON copy ${fmt(baseline)}`,
      ratio: engine.opsPerSecond / baseline.opsPerSecond,
      target: '< 1,000 µs',
      met: engine.microsPerOp < 1000,
    },
    {
      name: 'engine: two-end sizings per second',
      figure: fmt(engine),
      baseline: `JSON copy ${fmt(baseline)}`,
      ratio: engine.opsPerSecond / baseline.opsPerSecond,
      target: '> 100,000/s',
      met: engine.opsPerSecond > 100_000,
    },
    {
      name: 'schema: validating the same body',
      figure: fmt(validated),
      baseline: `JSON copy ${fmt(baseline)}`,
      ratio: validated.opsPerSecond / baseline.opsPerSecond,
      target: 'well under 1 ms',
      met: validated.microsPerOp < 1000,
    },
  ];
}
