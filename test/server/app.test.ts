import fs from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { makeTestContext, TestContext } from './test-context';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
});
afterAll(() => t.dispose());

describe('the API surface', () => {
  test('health answers after a real query', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ ok: true, version: expect.any(String), database: { ok: true, sqlite: expect.stringMatching(/^3\./) } });
  });

  test('an unknown API route answers JSON 404', async () => {
    for (const method of ['get', 'post', 'delete'] as const) {
      const res = await request(t.app)[method]('/api/no/such/route').expect(404);
      expect(res.headers['content-type']).toMatch(/json/);
      expect(res.body.error.code).toBe('not-found');
    }
  });

  test('a malformed JSON body answers JSON 400', async () => {
    const res = await request(t.app).post('/api/health').set('content-type', 'application/json').send('{"massKg": 1').expect(400);
    expect(res.body.error).toEqual({ code: 'malformed-json', message: expect.any(String) });
  });

  test('an oversized JSON body answers 413, not a stack trace', async () => {
    const body = JSON.stringify({ pad: 'x'.repeat(200 * 1024) });
    const res = await request(t.app).post('/api/health').set('content-type', 'application/json').send(body).expect(413);
    expect(res.body.error.code).toBe('too-large');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });

  test('security headers allow plain HTTP on a local network', async () => {
    const res = await request(t.app).get('/api/health');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).not.toContain('upgrade-insecure-requests');
    expect(res.headers['strict-transport-security']).toBeUndefined();
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  test('CORS lets the Expo dev server in, with credentials for the refresh cookie', async () => {
    const res = await request(t.app).get('/api/health').set('Origin', 'http://localhost:8081');
    expect(res.headers['access-control-allow-origin']).toBe('http://localhost:8081');
    expect(res.headers['access-control-allow-credentials']).toBe('true');
  });

  test('CORS is closed to an origin that is not listed', async () => {
    const res = await request(t.app).get('/api/health').set('Origin', 'http://elsewhere.test');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });
});

describe('the web build', () => {
  test('is served with a history fallback to index.html, but never for /api', async () => {
    fs.mkdirSync(t.config.webDir, { recursive: true });
    fs.writeFileSync(path.join(t.config.webDir, 'index.html'), '<!doctype html><title>Sagwright</title>');
    const deep = await request(t.app).get('/rider/garage/3').expect(200);
    expect(deep.text).toContain('<title>Sagwright</title>');
    await request(t.app).get('/api/rider/garage').expect(404);
  });
});
