/**
 * The server is killed with SIGKILL in the middle of a quote acceptance. With
 * SAGWRIGHT_FAULT_PAUSE=quote-accept-written the acceptance's transaction prints a marker once it
 * has reserved every quoted spring and moved the quote to accepted, then never commits: the kill
 * falls between the two. After a restart the file passes SQLite's integrity check, the quote is
 * still sent with nothing reserved or held for it, the ledger holds, and accepting again reserves
 * the whole quote. All-or-nothing is SQLite's atomic commit (sqlite.org/atomiccommit.html).
 */
import fs from 'node:fs';
import { RunningServer, startServer } from '../../e2e/server-process';
import { countRows, integrityCheck, ledgerMismatches, queryFile } from './database-check';
import { call } from '../../support/api-call';
import { riderPass, sentSpringQuote, signIn, springsForPass, waitForOutput } from './shop-api';

jest.setTimeout(120_000);

let server: RunningServer | undefined;
let dataDir: string;

afterAll(async () => {
  await server?.stop();
  if (dataDir) fs.rmSync(dataDir, { recursive: true, force: true });
});

const stockOf = async (ids: number[]) =>
  queryFile<{ id: number; onHand: number; reserved: number }>(dataDir, `SELECT "id", "onHand", "reserved" FROM "spring_rate" WHERE "id" IN (${ids.map(() => '?').join(', ')}) ORDER BY "id"`, ids);

test('a kill between reserving the springs and the commit leaves the quote sent and nothing reserved; accepting again reserves it all', async () => {
  server = await startServer({ SAGWRIGHT_FAULT_PAUSE: 'quote-accept-written' });
  dataDir = server.dataDir;
  const desk = await signIn(server.url, 'desk');
  const recordId = await riderPass(server.url, await signIn(server.url, 'rider'));
  const springs = await springsForPass(server.url, desk, recordId);
  expect(springs.front.available).toBeGreaterThanOrEqual(2);
  expect(springs.rear.available).toBeGreaterThanOrEqual(1);
  const quote = await sentSpringQuote(server.url, desk, recordId, springs);
  const ids = [springs.front.springId, springs.rear.springId];
  const before = { stock: await stockOf(ids), movements: await countRows(dataDir, 'stock_movement') };

  const accepting = fetch(`${server.url}/api/quotes/${quote.id}/accept`, { method: 'POST', headers: { Authorization: `Bearer ${desk}` } }).then(
    (r) => `answered ${r.status}`,
    () => 'no answer',
  );
  await waitForOutput(server.output, new RegExp(`fault pause: quote-accept-written \\(${quote.number}\\)`), 30_000);
  await server.kill();
  expect(await accepting).toBe('no answer');

  server = await startServer({ DATA_DIR: dataDir });
  expect(await integrityCheck(dataDir)).toEqual(['ok']);
  expect(await stockOf(ids)).toEqual(before.stock);
  expect(await countRows(dataDir, 'stock_movement')).toBe(before.movements);
  expect(await countRows(dataDir, 'stock_movement', '"quoteId" = ?', [quote.id])).toBe(0);
  expect(await countRows(dataDir, 'stock_hold', '"quoteId" = ?', [quote.id])).toBe(0);
  expect(await countRows(dataDir, 'quote_status_event', '"quoteId" = ? AND "toStatus" = ?', [quote.id, 'accepted'])).toBe(0);
  expect(await ledgerMismatches(dataDir)).toEqual([]);
  const desk2 = await signIn(server.url, 'desk');
  expect((await call<{ quote: { status: string } }>(server.url, 'GET', `/quotes/${quote.id}`, desk2)).quote.status).toBe('sent');

  const { quote: accepted } = await call<{ quote: { status: string } }>(server.url, 'POST', `/quotes/${quote.id}/accept`, desk2);
  expect(accepted.status).toBe('accepted');
  const reservedFor = Object.fromEntries((await stockOf(ids)).map((s) => [s.id, s.reserved]));
  const reservedBefore = Object.fromEntries(before.stock.map((s) => [s.id, s.reserved]));
  expect(reservedFor).toEqual({ [springs.front.springId]: reservedBefore[springs.front.springId] + 2, [springs.rear.springId]: reservedBefore[springs.rear.springId] + 1 });
  expect(await countRows(dataDir, 'stock_movement', '"quoteId" = ? AND "kind" = ?', [quote.id, 'reserve'])).toBe(2);
  expect(await countRows(dataDir, 'stock_hold', '"quoteId" = ? AND "status" = ?', [quote.id, 'open'])).toBe(2);
  expect(await ledgerMismatches(dataDir)).toEqual([]);
});
