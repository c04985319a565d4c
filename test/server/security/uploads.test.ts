/**
 * Malformed multipart/form-data (RFC 7578) to both CSV upload routes, the confirmation carrying a
 * real dry-run token so the upload itself is the only thing wrong: every answer is a 4xx, nothing
 * is stored (the checksum of every table is unchanged), and nothing is written to disk beside the
 * database (the data folder holds the same files, and no file appears where a path-like name
 * points). The path-traversal names are the OWASP WSTG v4.2 INPV-12 / WSTG-ATHZ-01 samples.
 */
import fs from 'node:fs';
import path from 'node:path';
import * as fc from 'fast-check';
import request from 'supertest';
import { tableChecksums } from './db-checksum';
import { accountsByRole, dryRun, Tokens } from '../catalogue/helpers';
import { listen } from '../desk/helpers';
import { makeTestContext, TestContext } from '../test-context';

const CSV = 'sku,kind,family,rate_n_mm,free_length_mm,max_deflection_mm,on_hand\nUPX-1,fork,F37x320,9,320,190,4\n';
const BOUNDARY = 'sagwrightBoundary7MA4YWxk';

let t: TestContext;
let tokens: Tokens;
let base: string;
let stopListening: () => Promise<void>;
let importToken: string;

beforeAll(async () => {
  t = await makeTestContext();
  ({ tokens } = await accountsByRole(t));
  ({ base, close: stopListening } = await listen(t));
  importToken = (await dryRun(t, tokens.counter, CSV).expect(200)).body.token;
  expect(importToken).toEqual(expect.any(String));
});
afterAll(async () => {
  await stopListening();
  await t.dispose();
});

/** Every file under the data folder with its size, except the database's own files and the mail outbox. */
function filesOnDisk(dir = t.config.dataDir): string[] {
  return fs
    .readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((entry) => entry.isFile())
    .map((entry) => path.relative(t.config.dataDir, path.join(entry.parentPath, entry.name)))
    .filter((name) => !/^sagwright\.sqlite(-wal|-shm)?$/.test(name) && !name.startsWith('outbox'))
    .sort();
}

function part(name: string, value: string | Buffer, fileName?: string, type = 'text/csv'): Buffer {
  const disposition = `form-data; name="${name}"${fileName === undefined ? '' : `; filename="${fileName}"`}`;
  const headers = `--${BOUNDARY}\r\nContent-Disposition: ${disposition}\r\n${fileName === undefined ? '' : `Content-Type: ${type}\r\n`}\r\n`;
  return Buffer.concat([Buffer.from(headers, 'latin1'), Buffer.isBuffer(value) ? value : Buffer.from(value), Buffer.from('\r\n')]);
}

const end = Buffer.from(`--${BOUNDARY}--\r\n`);

/** The confirmation's body as a browser builds it: the token field, then the file. */
function confirmationBody(fileName = 'springs.csv'): Buffer {
  return Buffer.concat([part('token', importToken), part('file', CSV, fileName), end]);
}

function post(route: '/imports' | '/imports/dry-run', body: Buffer, contentType = `multipart/form-data; boundary=${BOUNDARY}`) {
  return request(base).post(`/api${route}`).set('Authorization', tokens.counter).set('Content-Type', contentType).send(body);
}

describe('both upload routes', () => {
  let checksums: Record<string, string>;
  let files: string[];
  beforeEach(async () => {
    checksums = await tableChecksums(t);
    files = filesOnDisk();
  });
  afterEach(async () => {
    expect(await tableChecksums(t)).toEqual(checksums);
    expect(filesOnDisk()).toEqual(files);
  });

  test('the well-formed confirmation body is accepted by the dry run, so the cases below differ from it only as they say', async () => {
    const res = await post('/imports/dry-run', confirmationBody()).expect(200);
    expect(res.body.rows).toEqual([expect.objectContaining({ outcome: 'new' })]);
  });

  test('every cut of the confirmation before its closing boundary is a 4xx and stores nothing', async () => {
    const whole = confirmationBody();
    const closing = whole.lastIndexOf(end);
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 0, max: closing - 1 }), async (length) => {
        const res = await post('/imports', whole.subarray(0, length));
        return res.status >= 400 && res.status < 500 && typeof res.body.error?.code === 'string';
      }),
      { numRuns: 40 },
    );
  }, 60_000);

  test('random bytes flipped anywhere in an upload never get a 5xx, and the dry run still stores nothing', async () => {
    const whole = confirmationBody();
    await fc.assert(
      fc.asyncProperty(fc.array(fc.tuple(fc.nat({ max: whole.length - 1 }), fc.integer({ min: 1, max: 255 })), { minLength: 1, maxLength: 4 }), async (flips) => {
        const body = Buffer.from(whole);
        for (const [at, mask] of flips) body[at] ^= mask;
        const res = await post('/imports/dry-run', body);
        return res.status < 500 && typeof res.body === 'object';
      }),
      { numRuns: 40 },
    );
  }, 60_000);

  test.each(['/imports', '/imports/dry-run'] as const)('%s: no file, two files, a wrong field name, garbage, no boundary', async (route) => {
    const answers = [
      await post(route, Buffer.concat([part('token', importToken), end])),
      await post(route, Buffer.concat([part('token', importToken), part('file', CSV, 'a.csv'), part('file', CSV, 'b.csv'), end])),
      await post(route, Buffer.concat([part('token', importToken), part('upload', CSV, 'springs.csv'), end])),
      await post(route, Buffer.from(Array.from({ length: 4096 }, (_, i) => (i * 7919) % 256))),
      await post(route, confirmationBody(), 'multipart/form-data'),
      await post(route, Buffer.concat([part('token', importToken), part('file', Buffer.from([0x00, 0xff, 0xfe, 0x00, 0x89, 0x50]), 'springs.csv'), end])),
    ];
    expect(answers.map((res) => [res.status, res.body.error?.code])).toEqual([
      [400, 'invalid'],
      [400, 'unexpected-file'],
      [400, 'unexpected-file'],
      [400, 'malformed-upload'],
      [400, 'malformed-upload'],
      [415, 'not-csv'],
    ]);
    expect(answers[0].body.error.fields).toEqual({ file: expect.stringMatching(/field named "file"/) });
  });

  const TRAVERSAL_NAMES = [
    '../../etc/passwd',
    '../../../../../../etc/passwd.csv',
    '/etc/passwd.csv',
    '/tmp/sagwright-upload.csv',
    '..\\..\\windows\\win.ini.csv',
    'C:\\temp\\springs.csv',
    '\\\\server\\share\\springs.csv',
    'springs\u0000.csv',
    'springs.csv\u0000.exe',
    '..',
    '.',
    'line\nbreak.csv',
    `${'a'.repeat(300)}.csv`,
  ];

  test.each(['/imports', '/imports/dry-run'] as const)('%s: a file name with a path, a NUL byte or a control character is refused', async (route) => {
    for (const name of TRAVERSAL_NAMES) {
      const res = await post(route, confirmationBody(name));
      // A raw NUL or line break breaks the part's header itself, which the multipart parser refuses first.
      const codes = /[\u0000\n]/.test(name) ? ['bad-file-name', 'malformed-upload'] : ['bad-file-name'];
      expect([name, res.status, codes.includes(res.body.error?.code)]).toEqual([name, 400, true]);
    }
    // Nothing appeared where the names point, from the data folder or the server's working folder.
    for (const from of [t.config.dataDir, process.cwd()]) {
      expect(fs.existsSync(path.resolve(from, '../../etc/passwd.csv'))).toBe(false);
    }
    expect(fs.existsSync('/etc/passwd.csv')).toBe(false);
    expect(fs.existsSync('/tmp/sagwright-upload.csv')).toBe(false);
  });

  test('a name percent-encoded or in the RFC 5987 form is kept as text or refused, never used as a path', async () => {
    const encoded = Buffer.concat([
      part('token', importToken),
      Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename*=UTF-8''..%2F..%2Fetc%2Fpasswd.csv\r\nContent-Type: text/csv\r\n\r\n${CSV}\r\n`),
      end,
    ]);
    const res = await post('/imports/dry-run', encoded);
    expect([res.status, res.body.error?.code]).toEqual([400, 'bad-file-name']);
    const percent = await post('/imports/dry-run', confirmationBody('..%2F..%2Fetc%2Fpasswd.csv')).expect(200);
    expect(percent.body.rows).toHaveLength(1);
  });
});
