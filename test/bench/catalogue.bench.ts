/**
 * The catalogue at scale: 100,000 invented springs in a real SQLite file, searched over HTTP on
 * loopback by the parts counter through the real server process (`catalogue-server.ts`), and the
 * sizing's candidate read for a fit, uncached, in process. Every figure is a p95 of sequential
 * requests, against the same request on the demo catalogue (46 springs) in the same run.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Database } from '../../server/data-source';
import { seed } from '../../server/seed';
import { SizingDataCache } from '../../server/services/sizing-data.service';
import body from '../server/fixtures/sizing-two-ends.json';
import { generateSprings, insertSprings } from './catalogue-data';
import { CANDIDATE_FIT, RATES_FOR_FIT_QUERY, SEARCH_SCENARIOS } from './catalogue-scenarios';
import { signIn, startServerProcess } from './catalogue-server';
import { benchImport } from './import.bench';
import { loopbackClient } from './loopback-client';
import { BenchRow, percentile } from './measure';

export const SCALE_SPRINGS = 100_000;
const TARGET_P95_MS = 20;
const SAMPLES = 200;
const WARM_UP = 20;

/** Sequential runs of a task, timed one by one after untimed warm-up runs; the p95 in ms. */
async function p95Of(task: () => Promise<unknown>, samples = SAMPLES): Promise<number> {
  for (let i = 0; i < WARM_UP; i += 1) await task();
  const times: number[] = [];
  for (let i = 0; i < samples; i += 1) {
    const started = performance.now();
    await task();
    times.push(performance.now() - started);
  }
  return percentile(times, 95);
}

type Timings = Map<string, number>;

/** Every HTTP scenario against the server over this data folder, with GET /api/health beside them. */
async function timeOverHttp(dataDir: string): Promise<Timings> {
  const server = await startServerProcess(dataDir);
  const client = loopbackClient();
  try {
    const counter = await signIn(server.url, 'counter@demo.test');
    const rider = await signIn(server.url, 'rider@demo.test');
    const get = (path: string, token?: string) => () => client.ok('GET', `${server.url}${path}`, token);
    const timings: Timings = new Map();
    timings.set('health', await p95Of(get('/api/health')));
    for (const scenario of SEARCH_SCENARIOS) {
      timings.set(scenario.name, await p95Of(get(`/api/catalogue/springs?${scenario.query}`, counter)));
    }
    timings.set('rates-for-fit', await p95Of(get(`/api/catalogue/rates-for-fit?${RATES_FOR_FIT_QUERY}`, counter)));
    const sizing = () => client.ok('POST', `${server.url}/api/sizing`, rider, body);
    timings.set('sizing', await p95Of(sizing));
    timings.set('sizing-kb', (await sizing()).length / 1024);
    return timings;
  } finally {
    client.close();
    await server.stop();
  }
}

/** The sizing's read of one fit with nothing cached: a new cache for every read. */
function timeCandidatesUncached(db: Database): Promise<number> {
  return p95Of(async () => {
    const springs = await new SizingDataCache(db).candidates(CANDIDATE_FIT.kind, CANDIDATE_FIT.family);
    if (!springs.length) throw new Error(`no candidates in ${CANDIDATE_FIT.family}`);
  });
}

const ms = (value: number) => `p95 ${value.toFixed(2)} ms`;

function row(name: string, figure: number, baseline: number, baselineLabel: string): BenchRow {
  return {
    name,
    figure: ms(figure),
    baseline: `${baselineLabel} ${ms(baseline)}`,
    ratio: figure / baseline,
    target: `p95 < ${TARGET_P95_MS} ms`,
    met: figure < TARGET_P95_MS,
    shortfall: `compare with the demo catalogue's figure in the same run: a ratio near 1 means the machine, not the catalogue, sets the time; see the query plans in docs/performance.md.`,
  };
}

/** Opens the database in the data folder for one task in process, and closes it before the server opens it. */
async function withDatabase<T>(dataDir: string, task: (db: Database) => Promise<T>): Promise<T> {
  const db = await Database.open(dataDir);
  try {
    return await task(db);
  } finally {
    await db.close();
  }
}

export async function benchCatalogue(): Promise<BenchRow[]> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-catalogue-bench-'));
  try {
    // First the demo catalogue alone (the baseline), then the same database with the large catalogue added.
    const demoCandidates = await withDatabase(dataDir, async (db) => {
      await seed(db, { demo: true });
      return timeCandidatesUncached(db);
    });
    const demo = await timeOverHttp(dataDir);
    const { scaleCandidates, loadSeconds } = await withDatabase(dataDir, async (db) => {
      const started = performance.now();
      await insertSprings(db, generateSprings(SCALE_SPRINGS), new Date());
      return { loadSeconds: (performance.now() - started) / 1000, scaleCandidates: await timeCandidatesUncached(db) };
    });
    const scale = await timeOverHttp(dataDir);
    const label = (name: string) => `catalogue ${SCALE_SPRINGS / 1000}k: ${name}`;
    console.error(`catalogue bench: ${SCALE_SPRINGS.toLocaleString('en')} springs generated and written in ${loadSeconds.toFixed(1)} s`);
    return [
      row(label('GET /api/health (baseline)'), scale.get('health')!, demo.get('health')!, 'demo'),
      ...SEARCH_SCENARIOS.map((s) => row(label(`search, ${s.name}`), scale.get(s.name)!, demo.get(s.name)!, 'demo')),
      row(label('rates for a fit'), scale.get('rates-for-fit')!, demo.get('rates-for-fit')!, 'demo'),
      {
        ...row(label('POST /api/sizing (fit cached)'), scale.get('sizing')!, demo.get('sizing')!, 'demo'),
        shortfall: `the answer ranks every spring of each end's fit, each with its preload and sags: ${scale.get('sizing-kb')!.toFixed(0)} KB of JSON here against ${demo.get('sizing-kb')!.toFixed(0)} KB on the demo catalogue.`,
      },
      row(label('sizing candidates, uncached, in process'), scaleCandidates, demoCandidates, 'demo'),
    ];
  } finally {
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

/** The catalogue's searches at scale, then the CSV import at scale, one after the other. */
export async function benchCatalogueAtScale(): Promise<BenchRow[]> {
  return [...(await benchCatalogue()), ...(await benchImport())];
}
