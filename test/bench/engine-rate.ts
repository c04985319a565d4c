/**
 * The engine's rate on one request and context, beside a JSON copy of the request as the baseline.
 * Imported by engine.bench.ts, and also bundled by it with esbuild and run on its own
 * (`node engine-rate.js input.json` prints the rates as JSON), to time the engine without tsx's
 * loader in the way.
 */
import fs from 'node:fs';
import { sizeBike } from '../../shared/sizing';
import type { SizingContext, SizingRequest } from '../../shared/types/sizing';
import { measureRate, Rate } from './measure';

export interface EngineInput {
  request: SizingRequest;
  context: SizingContext;
}

export interface EngineRates {
  engine: Rate;
  baseline: Rate;
}

export function measureEngineRates({ request, context }: EngineInput): EngineRates {
  const baseline = measureRate(() => JSON.parse(JSON.stringify(request)));
  const engine = measureRate(() => sizeBike(request, context));
  return { engine, baseline };
}

if (require.main === module) {
  const input = JSON.parse(fs.readFileSync(process.argv[2], 'utf8')) as EngineInput;
  process.stdout.write(JSON.stringify(measureEngineRates(input)));
}
