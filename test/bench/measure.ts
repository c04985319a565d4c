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
}

export function printTable(rows: BenchRow[]): void {
  const header = ['benchmark', 'figure', 'baseline (same run)', 'ratio', 'target', 'met'];
  const cells = rows.map((r) => [r.name, r.figure, r.baseline, r.ratio.toFixed(2), r.target, r.met ? 'yes' : 'NO']);
  const widths = header.map((h, i) => Math.max(h.length, ...cells.map((c) => c[i].length)));
  const line = (c: string[]) => c.map((v, i) => v.padEnd(widths[i])).join(' | ');
  console.log(line(header));
  console.log(widths.map((w) => '-'.repeat(w)).join('-|-'));
  cells.forEach((c) => console.log(line(c)));
}
