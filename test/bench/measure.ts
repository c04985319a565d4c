/** Timing helpers for the benchmarks: run a task repeatedly for a fixed time and report its rate. */
export interface Rate {
  opsPerSecond: number;
  microsPerOp: number;
}

export function measureRate(task: () => unknown, seconds = 2): Rate {
  // Warm up so the JIT has compiled the task before it is timed.
  const warmUntil = performance.now() + 300;
  while (performance.now() < warmUntil) task();
  let count = 0;
  const started = performance.now();
  const until = started + seconds * 1000;
  while (performance.now() < until) {
    for (let i = 0; i < 100; i += 1) task();
    count += 100;
  }
  const elapsedS = (performance.now() - started) / 1000;
  return { opsPerSecond: count / elapsedS, microsPerOp: (elapsedS * 1e6) / count };
}

export interface BenchRow {
  name: string;
  figure: string;
  baseline: string;
  ratio: number;
  target: string;
  met: boolean;
  /** Why the figure can fall short of its target, printed under the table when it does. */
  shortfall?: string;
}

export function printTable(rows: BenchRow[]): void {
  const header = ['benchmark', 'figure', 'baseline (same run)', 'ratio', 'target', 'met'];
  const cells = rows.map((r) => [r.name, r.figure, r.baseline, r.ratio.toFixed(2), r.target, r.met ? 'yes' : 'NO']);
  const widths = header.map((h, i) => Math.max(h.length, ...cells.map((c) => c[i].length)));
  const line = (c: string[]) => c.map((v, i) => v.padEnd(widths[i])).join(' | ');
  console.log(line(header));
  console.log(widths.map((w) => '-'.repeat(w)).join('-|-'));
  cells.forEach((c) => console.log(line(c)));
  const missed = rows.filter((r) => !r.met);
  if (!missed.length) return;
  console.log('\nWhere a target is not met:');
  missed.forEach((r) => console.log(`- ${r.name}: ${r.shortfall ?? 'no explanation given; see docs/performance.md.'}`));
}

/** Formats a rate the way every row shows it: operations per second and the time per operation. */
export function formatRate(rate: Rate): string {
  return `${Math.round(rate.opsPerSecond).toLocaleString('en')}/s (${rate.microsPerOp.toFixed(1)} µs)`;
}

/**
 * The value below which `p` percent of the samples fall (nearest-rank method, NIST/SEMATECH
 * e-Handbook of Statistical Methods 7.2.6.2): the ceil(p/100 × n)-th smallest sample.
 */
export function percentile(samples: readonly number[], p: number): number {
  if (samples.length === 0) throw new RangeError('percentile of no samples');
  if (!(p > 0 && p <= 100)) throw new RangeError(`percentile ${p} is outside (0, 100]`);
  const sorted = [...samples].sort((a, b) => a - b);
  return sorted[Math.ceil((p / 100) * sorted.length) - 1];
}

export interface Latency {
  samples: number;
  meanMs: number;
  p50Ms: number;
  p90Ms: number;
  p99Ms: number;
  maxMs: number;
}

export function summariseLatencies(samplesMs: readonly number[]): Latency {
  const total = samplesMs.reduce((sum, v) => sum + v, 0);
  return {
    samples: samplesMs.length,
    meanMs: total / samplesMs.length,
    p50Ms: percentile(samplesMs, 50),
    p90Ms: percentile(samplesMs, 90),
    p99Ms: percentile(samplesMs, 99),
    maxMs: samplesMs.reduce((max, v) => Math.max(max, v), -Infinity),
  };
}

/**
 * Times each of `count` runs of a task, sync or async, one after another (after `warmup` untimed
 * runs), and summarises the times. For operations slow enough that one run is worth timing alone.
 */
export async function measureLatency(task: () => unknown, count: number, warmup = 10): Promise<Latency> {
  for (let i = 0; i < warmup; i += 1) await task();
  const samplesMs: number[] = [];
  for (let i = 0; i < count; i += 1) {
    const started = performance.now();
    await task();
    samplesMs.push(performance.now() - started);
  }
  return summariseLatencies(samplesMs);
}

export function formatLatency(latency: Latency): string {
  return `p50 ${latency.p50Ms.toFixed(2)} ms, p99 ${latency.p99Ms.toFixed(2)} ms`;
}
