/**
 * The server is killed with SIGKILL in the middle of confirming a 20,000-row catalogue import. The
 * server runs with SAGWRIGHT_FAULT_PAUSE=import-written, so the confirmation's transaction prints a
 * marker once every row is written and then never commits: the kill falls between the two. After a
 * restart the file passes SQLite's integrity check and holds none of the batch, the ledger holds,
 * and the same file then imports whole. All-or-nothing is SQLite's atomic commit
 * (sqlite.org/atomiccommit.html, sqlite.org/wal.html: a transaction not committed to the WAL is
 * not part of the database after recovery).
 */
import fs from 'node:fs';
import { RunningServer, startServer } from '../../e2e/server-process';
import { countRows, integrityCheck, ledgerMismatches } from './database-check';
import { call } from '../../support/api-call';
import { signIn, waitForOutput } from './shop-api';

jest.setTimeout(150_000);

const ROWS = 20_000;
const HEADER = 'sku,kind,family,rate_n_mm,free_length_mm,max_deflection_mm,supplier,supplier_code,cost,price_cents,bin,on_hand,reorder_point';

/** New fork and shock springs of invented fits, each with stock to count in. */
function generatedCsv(): string {
  const lines = [HEADER];
  for (let i = 0; i < ROWS; i++) {
    const fork = i % 2 === 0;
    lines.push(
      [
        `RLY-${String(i).padStart(5, '0')}`,
        fork ? 'fork' : 'shock',
        fork ? 'F41x300' : 'S60x160',
        fork ? (5 + (i % 60) / 10).toFixed(1) : String(60 + (i % 80)),
        fork ? 300 : 160,
        fork ? 180 : 70,
        'Reliability Coil Supply',
        `RC-${i}`,
        '41.50',
        fork ? 8400 : 12900,
        `R-${i % 200}`,
        1 + (i % 7),
        i % 3,
      ].join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}

function upload(csv: string, token?: string): FormData {
  const form = new FormData();
  if (token) form.append('token', token);
  form.append('file', new Blob([csv], { type: 'text/csv' }), 'reliability.csv');
  return form;
}

async function post(base: string, path: string, bearer: string, form: FormData): Promise<Response> {
  return fetch(`${base}/api${path}`, { method: 'POST', headers: { Authorization: `Bearer ${bearer}` }, body: form });
}

const snapshot = async (dataDir: string) => ({
  springs: await countRows(dataDir, 'spring_rate'),
  imported: await countRows(dataDir, 'spring_rate', `"sku" LIKE 'RLY-%'`),
  movements: await countRows(dataDir, 'stock_movement'),
  batches: await countRows(dataDir, 'import_batch'),
});

let server: RunningServer | undefined;
let dataDir: string;

afterAll(async () => {
  await server?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

test('a kill between writing every row and the commit leaves none of the batch; the file then imports whole', async () => {
  const csv = generatedCsv();
  server = await startServer({ SAGWRIGHT_FAULT_PAUSE: 'import-written' });
  dataDir = server.dataDir;
  const counter = await signIn(server.url, 'counter');
  const dry = await post(server.url, '/imports/dry-run', counter, upload(csv));
  expect(dry.status).toBe(200);
  const { token, counts } = (await dry.json()) as { token: string; counts: { new: number; stockCorrections: number } };
  expect(counts).toMatchObject({ new: ROWS, stockCorrections: ROWS });
  const before = await snapshot(dataDir);

  const confirming = post(server.url, '/imports', counter, upload(csv, token)).then(
    (r) => `answered ${r.status}`,
    () => 'no answer',
  );
  const [, batchId] = await waitForOutput(server.output, /fault pause: import-written \(import (\d+)\)/, 60_000);
  // Inside the open transaction: every row written, none of it visible to another connection.
  expect(await snapshot(dataDir)).toEqual(before);
  await server.kill();
  expect(await confirming).toBe('no answer');

  server = await startServer({ DATA_DIR: dataDir });
  expect(await integrityCheck(dataDir)).toEqual(['ok']);
  expect(await snapshot(dataDir)).toEqual(before);
  expect(await countRows(dataDir, 'stock_movement', '"importBatchId" = ?', [Number(batchId)])).toBe(0);
  expect(await ledgerMismatches(dataDir)).toEqual([]);

  // The dry run's token still matches: the catalogue is as it was before the confirmation began.
  const again = await post(server.url, '/imports', await signIn(server.url, 'counter'), upload(csv, token));
  expect(again.status).toBe(201);
  const after = await snapshot(dataDir);
  expect(after).toEqual({ springs: before.springs + ROWS, imported: ROWS, movements: before.movements + ROWS, batches: before.batches + 1 });
  expect(await ledgerMismatches(dataDir)).toEqual([]);
  const { batches } = await call<{ batches: { rows: number }[] }>(server.url, 'GET', '/imports', counter);
  expect(batches[0].rows).toBe(ROWS);
});
