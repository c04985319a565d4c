/**
 * The sizing engine in-process, on one core: a realistic two-end request from readings, no
 * linkage curve, against the demo catalogue. Baseline: a JSON copy of the same request, the
 * least work any handler does with it. Timed twice: as `npm run bench` loads it (tsx, whose
 * keepNames wraps every closure the engine makes and whose module interop puts a getter on every
 * call between its modules), and bundled by esbuild without keepNames in a process of its own.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildSync } from 'esbuild';
import { validateSizingRequest } from '../../shared/schemas/sizing.schema';
import { buildWarningThresholds } from '../../shared/sizing';
import type { SizingContext, SizingRequest } from '../../shared/types/sizing';
import { demoSprings } from '../../server/seed/demo-catalogue';
import { engineSettingSeeds, targetProfileSeeds } from '../../server/seed/sizing-defaults';
import body from '../server/fixtures/sizing-two-ends.json';
import { EngineInput, EngineRates, measureEngineRates } from './engine-rate';
import { BenchRow, formatRate, measureRate } from './measure';

function engineInput(): EngineInput {
  const request = body as SizingRequest;
  const springs = demoSprings().map((s) => ({ ...s, reserved: 0 })) as SizingContext['springs']['front'];
  return {
    request,
    context: {
      profile: targetProfileSeeds.find((p) => p.discipline === 'road')!,
      thresholds: buildWarningThresholds(engineSettingSeeds),
      springs: {
        front: springs.filter((s) => s.family === request.front!.family),
        rear: springs.filter((s) => s.family === request.rear!.family),
      },
    },
  };
}

/** The same measurement from an esbuild bundle (keepNames off, as esbuild has it by default) in a child process. */
function measureBundled(input: EngineInput): EngineRates {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-engine-bench-'));
  try {
    const bundle = path.join(dir, 'engine-rate.js');
    const inputFile = path.join(dir, 'input.json');
    buildSync({ entryPoints: [path.join(__dirname, 'engine-rate.ts')], bundle: true, platform: 'node', outfile: bundle, logLevel: 'error' });
    fs.writeFileSync(inputFile, JSON.stringify(input));
    return JSON.parse(execFileSync(process.execPath, [bundle, inputFile], { encoding: 'utf8' })) as EngineRates;
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

function perSecondRow(name: string, { engine, baseline }: EngineRates): BenchRow {
  return {
    name,
    figure: formatRate(engine),
    baseline: `JSON copy ${formatRate(baseline)}`,
    ratio: engine.opsPerSecond / baseline.opsPerSecond,
    target: '> 100,000/s',
    met: engine.opsPerSecond > 100_000,
    shortfall:
      'the engine ranks every spring of each fit and writes a full result per candidate (about 20 KB of JSON for this request, reasons as text); 10 µs per sizing would need a leaner result, not only faster arithmetic.',
  };
}

export function benchEngine(): BenchRow[] {
  const input = engineInput();
  const underTsx = measureEngineRates(input);
  const bundled = measureBundled(input);
  const validated = measureRate(() => validateSizingRequest(body));
  return [
    {
      name: 'engine: time per two-end sizing',
      figure: formatRate(underTsx.engine),
      baseline: `JSON copy ${formatRate(underTsx.baseline)}`,
      ratio: underTsx.engine.opsPerSecond / underTsx.baseline.opsPerSecond,
      target: '< 1,000 µs',
      met: underTsx.engine.microsPerOp < 1000,
    },
    perSecondRow('engine: two-end sizings per second (tsx)', underTsx),
    perSecondRow('engine: the same, esbuild bundle', bundled),
    {
      name: 'schema: validating the same body',
      figure: formatRate(validated),
      baseline: `JSON copy ${formatRate(underTsx.baseline)}`,
      ratio: validated.opsPerSecond / underTsx.baseline.opsPerSecond,
      target: 'well under 1 ms',
      met: validated.microsPerOp < 1000,
    },
  ];
}
