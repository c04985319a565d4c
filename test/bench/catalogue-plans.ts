/**
 * `node --import tsx test/bench/catalogue-plans.ts`: the SQL each counter search and the sizing's
 * candidate read send over a 100,000-spring catalogue, with SQLite's EXPLAIN QUERY PLAN and the
 * time of one run beside it. The SQL is captured from the services themselves (a logger on the
 * read connection), so the plans are those of the queries the server runs.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Logger } from 'typeorm';
import { springListSchema } from '../../shared/schemas/catalogue.schema';
import { Database } from '../../server/data-source';
import { seed } from '../../server/seed';
import { CatalogueService } from '../../server/services/catalogue.service';
import { SizingDataCache } from '../../server/services/sizing-data.service';
import { generateSprings, insertSprings } from './catalogue-data';
import { CANDIDATE_FIT, SEARCH_SCENARIOS } from './catalogue-scenarios';

interface Captured {
  sql: string;
  parameters: unknown[];
}

/** Collects every statement the read connection runs while the task runs. */
async function captureQueries(db: Database, task: () => Promise<unknown>): Promise<Captured[]> {
  const captured: Captured[] = [];
  const original = db.read.logger;
  const capturing: Logger = {
    logQuery: (sql, parameters) => captured.push({ sql, parameters: parameters ?? [] }),
    logQueryError: () => undefined,
    logQuerySlow: () => undefined,
    logSchemaBuild: () => undefined,
    logMigration: () => undefined,
    log: () => undefined,
  };
  // The logger is read on every query; swapping it for the task is the one way to see the final SQL.
  Object.assign(db.read, { logger: capturing });
  try {
    await task();
  } finally {
    Object.assign(db.read, { logger: original });
  }
  return captured.filter((c) => /^\s*SELECT/i.test(c.sql));
}

async function report(db: Database, name: string, task: () => Promise<unknown>): Promise<void> {
  const queries = await captureQueries(db, task);
  console.log(`\n#### ${name}`);
  for (const { sql, parameters } of queries) {
    const plan: { id: number; parent: number; detail: string }[] = await db.read.query(`EXPLAIN QUERY PLAN ${sql}`, parameters);
    const depth = new Map<number, number>([[0, 0]]);
    const lines = plan.map((step) => {
      depth.set(step.id, (depth.get(step.parent) ?? 0) + 1);
      return `${'  '.repeat(depth.get(step.id)! - 1)}${step.detail}`;
    });
    const started = performance.now();
    await db.read.query(sql, parameters);
    const elapsed = performance.now() - started;
    console.log('```sql');
    console.log(sql.replace(/\s+/g, ' ').trim());
    console.log('```');
    console.log(`parameters ${JSON.stringify(parameters)}; one run ${elapsed.toFixed(1)} ms`);
    console.log('```');
    console.log(lines.join('\n'));
    console.log('```');
  }
}

async function main(): Promise<void> {
  const dataDir = process.argv[2] ?? fs.mkdtempSync(path.join(os.tmpdir(), 'sagwright-catalogue-plans-'));
  const db = await Database.open(dataDir);
  try {
    const [{ springs }] = await db.read.query(`SELECT count(*) AS "springs" FROM "spring_rate"`);
    if (springs < 100_000) {
      await seed(db, { demo: true });
      await insertSprings(db, generateSprings(100_000), new Date());
    }
    const catalogue = new CatalogueService({ db, sizingData: new SizingDataCache(db) });
    for (const scenario of SEARCH_SCENARIOS) {
      const query = await springListSchema.validate(Object.fromEntries(new URLSearchParams(scenario.query)));
      await report(db, `Search: ${scenario.name} (${scenario.query || 'no filter'})`, () => catalogue.list(query, 'counter'));
    }
    await report(db, `Rates for a fit (${CANDIDATE_FIT.family}, nearest 9.3 N/mm)`, () =>
      catalogue.nearestRates(9.3, { kind: CANDIDATE_FIT.kind, family: CANDIDATE_FIT.family, limit: 5 }),
    );
    await report(db, `Sizing candidates of a fit (${CANDIDATE_FIT.family})`, () => new SizingDataCache(db).candidates(CANDIDATE_FIT.kind, CANDIDATE_FIT.family));
    await report(db, 'Low-stock list', () => catalogue.lowStock());
  } finally {
    await db.close();
    if (!process.argv[2]) fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
