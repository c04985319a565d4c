/**
 * CSV import and export over HTTP against a real SQLite file: the dry run writes nothing and
 * reports every row, the confirmation writes in one transaction as one batch, a bad file writes
 * nothing, a repeated import changes nothing, rates convert from any unit, an export imports back
 * unchanged, and bad uploads get a clear 4xx. Unit check values: NIST SP 811 (2008), B.8
 * (1 kgf = 9.80665 N exactly, 1 lbf = 4.4482216152605 N, 1 in = 25.4 mm exactly, so
 * 1 kgf/mm = 9.80665 N/mm and 1 lbf/in = 0.1751268 N/mm).
 */
import sqlite3 from 'sqlite3';
import request from 'supertest';
import { ImportBatch } from '../../../server/entities/import-batch.entity';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { StockMovement } from '../../../server/entities/stock-movement.entity';
import { makeTestContext, TestContext } from '../test-context';
import { accountsByRole, confirmImport, createSpring, dryRun, ledgerMismatches, Tokens } from './helpers';

let t: TestContext;
let tokens: Tokens;

beforeAll(async () => {
  t = await makeTestContext();
  ({ tokens } = await accountsByRole(t));
});
afterAll(() => t.dispose());

const HEADER = 'sku,kind,family,rate_n_mm,free_length_mm,max_deflection_mm,supplier,supplier_code,cost,price_cents,bin,on_hand,reorder_point';

function generated(rows: number, prefix: string): string {
  const lines = [HEADER];
  for (let i = 0; i < rows; i++) {
    const fork = i % 2 === 0;
    lines.push(
      [
        `${prefix}-${String(i).padStart(5, '0')}`,
        fork ? 'fork' : 'shock',
        fork ? 'F37x320' : 'S56x150',
        fork ? (5 + (i % 60) / 10).toFixed(1) : String(60 + (i % 80)),
        fork ? 320 : 150,
        fork ? 190 : 68,
        'Generated Coil Supply',
        `GC-${i}`,
        '48.50',
        fork ? 8900 : 13900,
        `G-${i % 300}`,
        1 + (i % 5),
        i % 3,
      ].join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}

async function counts() {
  return {
    springs: await t.db.read.getRepository(SpringRate).count(),
    movements: await t.db.read.getRepository(StockMovement).count(),
    batches: await t.db.read.getRepository(ImportBatch).count(),
  };
}

/** Runs SQL on the database file through a connection of its own, as an outside tool would. */
function runOutside(file: string, sql: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const db = new sqlite3.Database(file, (err) => {
      if (err) return reject(err);
      db.exec(sql, (execErr) => db.close(() => (execErr ? reject(execErr) : resolve())));
    });
  });
}

describe('a 10,000-row file', () => {
  const csv = generated(10_000, 'GEN');

  test('a database refusal at the last row leaves nothing written: the import is one transaction', async () => {
    const before = await counts();
    const dry = await dryRun(t, tokens.counter, csv).expect(200);
    expect(dry.body.counts).toEqual({ rows: 10_000, new: 10_000, updated: 0, unchanged: 0, errors: 0, stockCorrections: 10_000 });
    expect(await counts()).toEqual(before);
    await runOutside(
      t.db.file,
      `CREATE TRIGGER "test_refuse_last" BEFORE INSERT ON "stock_movement" WHEN NEW."springId" = (SELECT "id" FROM "spring_rate" WHERE "sku" = 'GEN-09999')
       BEGIN SELECT RAISE(ABORT, 'refused by the test'); END;`,
    );
    try {
      await confirmImport(t, tokens.counter, csv, dry.body.token).expect(500);
    } finally {
      await runOutside(t.db.file, `DROP TRIGGER "test_refuse_last";`);
    }
    expect(await counts()).toEqual(before);
  });

  test('imports as one batch, each on-hand a count-correction movement, within the time budget', async () => {
    const before = await counts();
    const started = Date.now();
    const dry = await dryRun(t, tokens.counter, csv, 'big.csv').expect(200);
    const dryRunMs = Date.now() - started;
    const confirmed = await confirmImport(t, tokens.admin, csv, dry.body.token, 'big.csv').expect(201);
    const confirmMs = Date.now() - started - dryRunMs;
    expect(confirmed.body.batch).toEqual(expect.objectContaining({ fileName: 'big.csv', rows: 10_000, created: 10_000, stockCorrections: 10_000 }));
    expect(await counts()).toEqual({ springs: before.springs + 10_000, movements: before.movements + 10_000, batches: before.batches + 1 });
    expect(await t.db.read.getRepository(StockMovement).countBy({ importBatchId: confirmed.body.batch.id, kind: 'correction' })).toBe(10_000);
    const spring = await t.db.read.getRepository(SpringRate).findOneByOrFail({ sku: 'GEN-00007' });
    // Line 9 of the file: i = 7, a shock spring, rate 67 N/mm, cost 48.50 = 4850 cents, on hand 1 + 7 % 5 = 3.
    expect(spring).toEqual(expect.objectContaining({ kind: 'shock', rateNmm: 67, costCents: 4850, priceCents: 13900, onHand: 3, reorderPoint: 1, bin: 'G-7' }));
    expect(await ledgerMismatches(t)).toEqual([]);
    // A tenth of the 100,000-row budget of 15 s each, with room for a slow test machine.
    expect(dryRunMs).toBeLessThan(5000);
    expect(confirmMs).toBeLessThan(5000);
  }, 30_000);

  test('importing the same file again changes nothing: every row unchanged, no new movements', async () => {
    const before = await counts();
    const dry = await dryRun(t, tokens.counter, csv).expect(200);
    expect(dry.body.counts).toEqual({ rows: 10_000, new: 0, updated: 0, unchanged: 10_000, errors: 0, stockCorrections: 0 });
    const confirmed = await confirmImport(t, tokens.counter, csv, dry.body.token).expect(201);
    expect(confirmed.body.batch).toEqual(expect.objectContaining({ created: 0, updated: 0, unchanged: 10_000, stockCorrections: 0 }));
    expect(await counts()).toEqual({ ...before, batches: before.batches + 1 });
  }, 30_000);
});

describe('bad rows', () => {
  test('a file with bad rows writes nothing and reports every bad row by line and column', async () => {
    const csv = [
      'sku,kind,family,rate (kgf/mm),free_length_mm,max_deflection_mm,on_hand,active',
      'BAD-1,fork,F37x320,0.9,320,190,2,yes',
      'BAD-2,bicycle,F37x320,0.9,320,190,2,yes',
      'BAD-3,fork,F37x320,heavy,320,400,-1,maybe',
      ',fork,F37x320,0.9,320,190,2,yes',
      '"BAD-5","fork","F37x320","0.9","320","190","2","yes","extra"',
      'BAD-1,fork,F37x320,0.9,320,190,2,yes',
      'BAD-7,shock,S56x150,,150,68,,',
    ].join('\r\n');
    const before = await counts();
    const dry = await dryRun(t, tokens.counter, csv).expect(200);
    expect(dry.body.token).toBeNull();
    expect(dry.body.counts).toEqual(expect.objectContaining({ rows: 7, new: 1, errors: 6 }));
    const errorsOf = (line: number) => dry.body.rows.find((r: { line: number }) => r.line === line).errors.map((e: { column: string }) => e.column);
    expect(dry.body.rows[0]).toEqual({ line: 2, sku: 'BAD-1', outcome: 'new', stock: { from: 0, to: 2 } });
    expect(errorsOf(3)).toEqual(['kind']);
    // Also a maximum deflection of 400 mm in a 320 mm spring.
    expect(errorsOf(4).sort()).toEqual(['active', 'max_deflection_mm', 'on_hand', 'rate (kgf/mm)']);
    expect(errorsOf(5)).toEqual(['sku']);
    expect(errorsOf(6)).toEqual(['']);
    expect(errorsOf(7)).toEqual(['sku']);
    expect(dry.body.rows[5].errors[0].message).toMatch(/also on line 2/);
    expect(errorsOf(8)).toEqual(['rate (kgf/mm)']);

    const confirm = await confirmImport(t, tokens.counter, csv, 'a'.repeat(64)).expect(400);
    expect(confirm.body.error.code).toBe('import-has-errors');
    expect(Object.keys(confirm.body.error.fields)).toEqual(expect.arrayContaining(['line 3: kind', 'line 4: on_hand', 'line 6', 'line 8: rate (kgf/mm)']));
    expect(await counts()).toEqual(before);
  });

  test('a change to the catalogue after the dry run refuses the confirmation', async () => {
    const spring = await createSpring(t, {}, 1);
    const csv = `sku,on_hand\n${spring.sku},5\n`;
    const dry = await dryRun(t, tokens.counter, csv).expect(200);
    expect(dry.body.rows[0]).toEqual({ line: 2, sku: spring.sku, outcome: 'updated', stock: { from: 1, to: 5 } });
    await request(t.app).post(`/api/stock/${spring.id}/receive`).set('Authorization', tokens.counter).send({ quantity: 1, reason: 'Delivery' }).expect(201);
    const before = await counts();
    expect((await confirmImport(t, tokens.counter, csv, dry.body.token).expect(409)).body.error.code).toBe('import-changed');
    expect((await confirmImport(t, tokens.counter, `${csv}\n`, dry.body.token).expect(409)).body.error.code).toBe('import-changed');
    await request(t.app).post('/api/imports').set('Authorization', tokens.counter).attach('file', Buffer.from(csv), 'stock.csv').expect(400);
    expect(await counts()).toEqual(before);
  });
});

describe('units', () => {
  test('rate columns in kgf/mm and lbf/in, and a unit column per row, are stored in N/mm', async () => {
    const csv = [
      'sku;kind;family;rate_kgf_mm;second rate (lbf/in);break_mm;free_length_mm;max_deflection_mm',
      'U-1;fork;F37x320;1;;;320;190',
      'U-2;fork;F37x320;0,5;100;80;320;190',
    ].join('\n');
    const dry = await dryRun(t, tokens.counter, csv).expect(200);
    await confirmImport(t, tokens.counter, csv, dry.body.token).expect(201);
    const perRow = 'sku,kind,family,rate,unit,free_length_mm,max_deflection_mm\nU-3,shock,S56x150,1,lbf/in,150,68\nU-4,shock,S56x150,2,,150,68\nU-5,shock,S56x150,1,N/mm,150,68\n';
    const dry2 = await dryRun(t, tokens.counter, perRow, 'units.csv', { unit: 'kgf/mm' }).expect(200);
    await confirmImport(t, tokens.counter, perRow, dry2.body.token, 'units.csv', { unit: 'kgf/mm' }).expect(201);
    const rate = async (sku: string) => t.db.read.getRepository(SpringRate).findOneByOrFail({ sku });
    expect((await rate('U-1')).rateNmm).toBeCloseTo(9.80665, 12);
    expect((await rate('U-2')).rateNmm).toBeCloseTo(4.903325, 12);
    expect((await rate('U-2')).secondRateNmm).toBeCloseTo(17.51268, 5);
    expect((await rate('U-3')).rateNmm).toBeCloseTo(0.1751268, 7);
    // The upload's unit (kgf/mm) for a row that names none.
    expect((await rate('U-4')).rateNmm).toBeCloseTo(19.6133, 12);
    expect((await rate('U-5')).rateNmm).toBe(1);
    // The same file again: the converted rates compare equal, so nothing changes.
    expect((await dryRun(t, tokens.counter, csv).expect(200)).body.counts.unchanged).toBe(2);
  });
});

describe('export', () => {
  test('the catalogue export imports back with every row unchanged', async () => {
    await createSpring(t, { sku: 'EXP, "quoted"', supplier: 'Comma, Quote " Supply', secondRateNmm: 120, breakMm: 40 }, 2);
    const exported = await request(t.app).get('/api/catalogue/springs.csv').set('Authorization', tokens.counter).expect(200);
    expect(exported.headers['content-type']).toMatch(/^text\/csv/);
    expect(exported.text.split('\n')[0]).toBe(
      'sku,kind,family,rate_n_mm,second_rate_n_mm,break_mm,free_length_mm,inner_diameter_mm,outer_diameter_mm,wire_diameter_mm,max_deflection_mm,supplier,supplier_code,cost_cents,price_cents,bin,on_hand,reorder_point,active',
    );
    const total = await t.db.read.getRepository(SpringRate).count();
    const before = await counts();
    const dry = await dryRun(t, tokens.counter, exported.text, 'catalogue.csv').expect(200);
    expect(dry.body.ignoredColumns).toEqual([]);
    expect(dry.body.counts).toEqual({ rows: total, new: 0, updated: 0, unchanged: total, errors: 0, stockCorrections: 0 });
    expect(await counts()).toEqual(before);
  }, 30_000);

  test('the movements export has one row per movement, with who and why', async () => {
    const spring = await createSpring(t, { sku: 'MOV-EXPORT' }, 2);
    const res = await request(t.app).get(`/api/stock/movements.csv?springId=${spring.id}`).set('Authorization', tokens.admin).expect(200);
    const lines = res.text.trim().split('\n');
    expect(lines[0]).toBe('id,at,sku,kind,on_hand_delta,reserved_delta,on_hand_after,reserved_after,user,reason,quote_id,import_batch_id,hold_id');
    expect(lines).toHaveLength(2);
    expect(lines[1]).toMatch(/,MOV-EXPORT,receive,2,0,2,0,,Test delivery,,,$/);
  });
});

describe('bad uploads get a clear 4xx and write nothing', () => {
  const csv = 'sku,kind,family,rate_n_mm,free_length_mm,max_deflection_mm\nUP-1,fork,F37x320,9,320,190\n';
  let before: Awaited<ReturnType<typeof counts>>;
  beforeEach(async () => {
    before = await counts();
  });
  afterEach(async () => {
    expect(await counts()).toEqual(before);
  });

  test('malformed multipart', async () => {
    const res = await request(t.app)
      .post('/api/imports/dry-run')
      .set('Authorization', tokens.counter)
      .set('Content-Type', 'multipart/form-data; boundary=----sagwright')
      .send('------sagwright\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\nContent-Type: text/csv\r\n\r\nsku\r\nX')
      .expect(400);
    expect(res.body.error.code).toBe('malformed-upload');
    const noBoundary = await request(t.app).post('/api/imports/dry-run').set('Authorization', tokens.counter).set('Content-Type', 'multipart/form-data').send('x').expect(400);
    expect(noBoundary.body.error.code).toBe('malformed-upload');
    const json = await request(t.app).post('/api/imports/dry-run').set('Authorization', tokens.counter).send({ csv }).expect(415);
    expect(json.body.error.code).toBe('not-multipart');
    const noFile = await request(t.app).post('/api/imports/dry-run').set('Authorization', tokens.counter).field('unit', 'N/mm').expect(400);
    expect(noFile.body.error.fields.file).toMatch(/field named "file"/);
  });

  test('a file that is not CSV', async () => {
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const image = await request(t.app).post('/api/imports/dry-run').set('Authorization', tokens.counter).attach('file', png, { filename: 'photo.png', contentType: 'image/png' }).expect(415);
    expect(image.body.error.code).toBe('not-csv');
    const binary = await request(t.app).post('/api/imports/dry-run').set('Authorization', tokens.counter).attach('file', png, { filename: 'photo.csv', contentType: 'text/csv' }).expect(415);
    expect(binary.body.error.message).toMatch(/not text/);
    const latin1 = Buffer.from('sku,family\nX-1,Fran\xe7ais\n', 'latin1');
    expect((await dryRun(t, tokens.counter, latin1).expect(415)).body.error.message).toMatch(/UTF-8/);
    const unclosed = await dryRun(t, tokens.counter, 'sku,kind\n"X-1,fork\n').expect(400);
    expect(unclosed.body.error.code).toBe('csv-malformed');
    expect((await dryRun(t, tokens.counter, 'kind,family\nfork,F37x320\n').expect(400)).body.error.code).toBe('csv-no-sku');
    expect((await dryRun(t, tokens.counter, '').expect(400)).body.error.code).toBe('csv-empty');
    expect((await dryRun(t, tokens.counter, 'sku,rate,rate_kgf_mm\nX,1,1\n').expect(400)).body.error.code).toBe('csv-duplicate-column');
  });

  test('an oversized file', async () => {
    const big = Buffer.alloc(20 * 1024 * 1024 + 1, 'a');
    const res = await dryRun(t, tokens.counter, big).expect(413);
    expect(res.body.error).toEqual({ code: 'too-large', message: expect.stringMatching(/20 MB/) });
  }, 30_000);

  /** Written by hand: form libraries cut a file name to its last segment, an attacker's client does not. */
  function rawUpload(fileName: string) {
    const body = `--b0undary\r\nContent-Disposition: form-data; name="file"; filename="${fileName}"\r\nContent-Type: text/csv\r\n\r\n${csv}\r\n--b0undary--\r\n`;
    return request(t.app).post('/api/imports/dry-run').set('Authorization', tokens.counter).set('Content-Type', 'multipart/form-data; boundary=b0undary').send(body);
  }

  test('a path-like file name, and two files', async () => {
    await rawUpload('springs.csv').expect(200);
    const res = await rawUpload('../../etc/passwd.csv').expect(400);
    expect(res.body.error.code).toBe('bad-file-name');
    expect((await rawUpload('C:\\stock\\springs.csv').expect(400)).body.error.code).toBe('bad-file-name');
    const two = await request(t.app)
      .post('/api/imports/dry-run')
      .set('Authorization', tokens.counter)
      .attach('file', Buffer.from(csv), 'a.csv')
      .attach('file', Buffer.from(csv), 'b.csv')
      .expect(400);
    expect(two.body.error.code).toBe('unexpected-file');
  });
});

describe('the import log', () => {
  test('lists batches newest first with who, when, the file name and the counts', async () => {
    const csv = 'sku,kind,family,rate_n_mm,free_length_mm,max_deflection_mm,on_hand\nLOG-1,fork,F37x320,9,320,190,4\n';
    const dry = await dryRun(t, tokens.counter, csv, 'März lieferung.csv').expect(200);
    const { body } = await confirmImport(t, tokens.counter, csv, dry.body.token, 'März lieferung.csv').expect(201);
    const list = await request(t.app).get('/api/imports?pageSize=1').set('Authorization', tokens.admin).expect(200);
    expect(list.body.batches[0]).toEqual(
      expect.objectContaining({ id: body.batch.id, fileName: 'März lieferung.csv', created: 1, stockCorrections: 1, user: expect.objectContaining({ name: expect.stringMatching(/counter/) }) }),
    );
    expect(list.body.total).toBeGreaterThan(1);
    expect((await request(t.app).get(`/api/imports/${body.batch.id}`).set('Authorization', tokens.counter).expect(200)).body.batch.rows).toBe(1);
    await request(t.app).get('/api/imports/999999').set('Authorization', tokens.counter).expect(404);
    const movements = await request(t.app).get(`/api/stock/movements?importBatchId=${body.batch.id}`).set('Authorization', tokens.counter).expect(200);
    expect(movements.body.movements[0]).toEqual(expect.objectContaining({ kind: 'correction', onHandDelta: 4, reason: expect.stringMatching(/import/) }));
  });
});
