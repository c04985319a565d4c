/**
 * `npm run bench`: every figure beside a baseline measured in the same run. Each module adds one
 * entry to `benches`; they run one after another (never in parallel, so one does not slow the
 * next) and the rows of all of them print as one table at the end. `npm run bench -- api web`
 * runs only the named ones.
 */
import { benchApi } from './api.bench';
import { benchCatalogueAtScale } from './catalogue.bench';
import { benchEngine } from './engine.bench';
import { BenchRow, printTable } from './measure';
import { benchWeb } from './web.bench';

type Bench = () => BenchRow[] | Promise<BenchRow[]>;

const benches: Record<string, Bench> = {
  engine: benchEngine,
  api: benchApi,
  catalogue: benchCatalogueAtScale,
  web: benchWeb,
};

function chosenBenches(names: string[]): Bench[] {
  const unknown = names.filter((name) => !(name in benches));
  if (unknown.length) throw new Error(`No bench named ${unknown.join(', ')}; choose from ${Object.keys(benches).join(', ')}.`);
  return names.length ? names.map((name) => benches[name]) : Object.values(benches);
}

async function runBenches(): Promise<void> {
  const rows: BenchRow[] = [];
  for (const bench of chosenBenches(process.argv.slice(2))) rows.push(...(await bench()));
  printTable(rows);
}

runBenches().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
