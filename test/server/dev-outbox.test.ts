/**
 * The local SMTP stand-in and the admin's dev routes over it: mail sent through nodemailer over
 * SMTP lands in the data folder and reads back whole; in production neither exists.
 */
import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { bearer, createAccount, waitForMail } from './auth/helpers';
import { makeTestContext, TestContext } from './test-context';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
});
afterAll(() => t.dispose());

test('a mail sent over SMTP is kept as .eml with an index, and the admin reads it whole', async () => {
  const admin = await createAccount(t, 'admin');
  await t.mailer.send({ to: 'rider@example.test', subject: 'Your quote — 2 springs', text: 'Total: 180 €', html: '<p>Total: <b>180 €</b></p>' });
  const entry = await waitForMail(t, admin, 'rider@example.test');
  expect(entry).toEqual({ id: expect.any(String), from: t.config.mailFrom, to: ['rider@example.test'], subject: 'Your quote — 2 springs', date: expect.any(String) });

  const dir = t.outbox!.dir;
  expect(dir).toBe(path.join(t.config.dataDir, 'outbox'));
  expect(fs.existsSync(path.join(dir, `${entry.id}.eml`))).toBe(true);
  expect(JSON.parse(fs.readFileSync(path.join(dir, 'index.json'), 'utf8'))).toEqual([entry]);

  const res = await request(t.app).get(`/api/dev/outbox/${entry.id}`).set('Authorization', await bearer(t, admin)).expect(200);
  expect(res.body.mail).toEqual({ ...entry, text: 'Total: 180 €', html: '<p>Total: <b>180 €</b></p>' });
});

test('an id that is not in the index answers 404, whatever it looks like', async () => {
  const admin = await createAccount(t, 'admin');
  for (const id of ['nope', '..%2Findex', encodeURIComponent('../jwt-secret')]) {
    await request(t.app).get(`/api/dev/outbox/${id}`).set('Authorization', await bearer(t, admin)).expect(404);
  }
});

test('in production no stand-in starts, the dev routes are not there, and a reset request still answers alike', async () => {
  // With a public address, so that the missing SMTP server is what stops the mail.
  const prod = await makeTestContext({ production: true, publicUrl: 'https://shop.example' });
  try {
    expect(prod.outbox).toBeUndefined();
    expect(fs.existsSync(path.join(prod.config.dataDir, 'outbox'))).toBe(false);
    const admin = await createAccount(prod, 'admin');
    const res = await request(prod.app).get('/api/dev/outbox').set('Authorization', await bearer(prod, admin)).expect(404);
    expect(res.body.error.code).toBe('not-found');
    await request(prod.app).post('/api/auth/reset-request').send({ email: admin.email }).expect(202);
    await request(prod.app).post('/api/auth/reset-request').send({ email: 'nobody@example.test' }).expect(202);
    expect(prod.logged).toEqual(['password reset mail not sent']);
  } finally {
    await prod.dispose();
  }
});
