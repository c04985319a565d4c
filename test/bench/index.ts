/**
 * `npm run bench`: every figure beside a baseline measured in the same run. Each module adds one
 * entry to `benches`; they run one after another (never in parallel, so one does not slow the
 * next) and the rows of all of them print as one table at the end.
 */
import { benchApi } from './api.bench';
import { benchCatalogueAtScale } from './catalogue.bench';
import { benchEngine } from './engine.bench';
import { BenchRow, printTable } from './measure';
import { benchWeb } from './web.bench';

type Bench = () => BenchRow[] | Promise<BenchRow[]>;

const benches: Bench[] = [
  benchEngine,
  benchApi,
  benchCatalogueAtScale,
  benchWeb,
];

async function runBenches(): Promise<void> {
  const rows: BenchRow[] = [];
  for (const bench of benches) rows.push(...(await bench()));
  printTable(rows);
}

runBenches().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
