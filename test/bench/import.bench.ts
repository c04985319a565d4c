/**
 * The CSV import at scale: a 100,000-row file of new springs in the import's columns, uploaded as
 * multipart to the real routes of the real server process (dry run, then the confirmation with
 * its token), against a 1,000-row file as the baseline (the ratio is per row). Each size gets a
 * fresh server over the demo catalogue, so the peak memory read from /proc (VmHWM) is that import's.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Database } from '../../server/data-source';
import { seed } from '../../server/seed';
import { generateSprings, springsToCsv } from './catalogue-data';
import { signIn, startServerProcess } from './catalogue-server';
import { BenchRow } from './measure';

const SCALE_ROWS = 100_000;
const BASELINE_ROWS = 1_000;
const TARGET_SECONDS = 15;
const WARM_UP_ROWS = 50;

interface ImportRun {
  rows: number;
  bytes: number;
  dryRunSeconds: number;
  confirmSeconds: number;
  dryRunCpuSeconds: number;
  confirmCpuSeconds: number;
  idleBytes: number;
  peakBytes: number;
}

async function upload(url: string, token: string, route: string, file: Buffer, fields: Record<string, string>): Promise<{ status: number; body: unknown; seconds: number }> {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.append(name, value);
  form.append('file', new Blob([new Uint8Array(file)], { type: 'text/csv' }), 'catalogue.csv');
  const started = performance.now();
  const response = await fetch(`${url}${route}`, { method: 'POST', headers: { authorization: `Bearer ${token}` }, body: form });
  const body: unknown = await response.json();
  return { status: response.status, body, seconds: (performance.now() - started) / 1000 };
}

async function runImport(rows: number): Promise<ImportRun> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-import-bench-'));
  try {
    const db = await Database.open(dataDir);
    await seed(db, { demo: true }).finally(() => db.close());
    const file = springsToCsv(generateSprings(rows));
    const server = await startServerProcess(dataDir);
    try {
      const token = await signIn(server.url, 'counter@demo.test');
      // One untimed dry run of a small file first, so the timed ones do not include the server's warm-up.
      await upload(server.url, token, '/api/imports/dry-run', springsToCsv(generateSprings(WARM_UP_ROWS)), { unit: 'N/mm' });
      const idleBytes = server.memory().residentBytes;
      const cpuAtStart = server.cpuSeconds();
      const dry = await upload(server.url, token, '/api/imports/dry-run', file, { unit: 'N/mm' });
      const plan = dry.body as { token: string | null; counts: { new: number; errors: number } };
      if (dry.status !== 200 || !plan.token || plan.counts.new !== rows) {
        throw new Error(`the dry run of ${rows} rows answered ${dry.status}: ${JSON.stringify(dry.body).slice(0, 500)}`);
      }
      const cpuAfterDryRun = server.cpuSeconds();
      const confirm = await upload(server.url, token, '/api/imports', file, { unit: 'N/mm', token: plan.token });
      const done = confirm.body as { counts: { new: number } };
      if (confirm.status !== 201 || done.counts.new !== rows) {
        throw new Error(`the import of ${rows} rows answered ${confirm.status}: ${JSON.stringify(confirm.body).slice(0, 500)}`);
      }
      return {
        rows,
        bytes: file.length,
        dryRunSeconds: dry.seconds,
        confirmSeconds: confirm.seconds,
        dryRunCpuSeconds: cpuAfterDryRun - cpuAtStart,
        confirmCpuSeconds: server.cpuSeconds() - cpuAfterDryRun,
        idleBytes,
        peakBytes: server.memory().peakBytes,
      };
    } finally {
      await server.stop();
    }
  } finally {
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

const mb = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(0)} MB`;

function timeRow(step: string, seconds: (run: ImportRun) => number, cpuSeconds: (run: ImportRun) => number, scale: ImportRun, baseline: ImportRun): BenchRow {
  const perRow = (run: ImportRun) => seconds(run) / run.rows;
  return {
    name: `import ${scale.rows / 1000}k rows: ${step}`,
    figure: `${seconds(scale).toFixed(2)} s (${(perRow(scale) * 1e6).toFixed(0)} µs/row, server CPU ${cpuSeconds(scale).toFixed(2)} s)`,
    baseline: `${baseline.rows / 1000}k rows ${seconds(baseline).toFixed(2)} s (${(perRow(baseline) * 1e6).toFixed(0)} µs/row)`,
    ratio: perRow(scale) / perRow(baseline),
    target: `< ${TARGET_SECONDS} s`,
    met: seconds(scale) < TARGET_SECONDS,
    shortfall:
      'the confirmation parses and plans the whole file again inside its transaction (nothing is kept between the two requests), then writes every row and its search-index entry; garbage collection is about half of parsing and planning.',
  };
}

export async function benchImport(): Promise<BenchRow[]> {
  const baseline = await runImport(BASELINE_ROWS);
  const scale = await runImport(SCALE_ROWS);
  return [
    timeRow(`dry run (${mb(scale.bytes)} file)`, (run) => run.dryRunSeconds, (run) => run.dryRunCpuSeconds, scale, baseline),
    timeRow('confirmed import', (run) => run.confirmSeconds, (run) => run.confirmCpuSeconds, scale, baseline),
    {
      name: `import ${scale.rows / 1000}k rows: server peak memory (VmHWM)`,
      figure: `${mb(scale.peakBytes)} (idle ${mb(scale.idleBytes)})`,
      baseline: `${baseline.rows / 1000}k rows ${mb(baseline.peakBytes)} (idle ${mb(baseline.idleBytes)})`,
      ratio: scale.peakBytes / baseline.peakBytes,
      target: 'reported',
      met: true,
    },
  ];
}
