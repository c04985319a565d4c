/**
 * The admin's user management over HTTP, against the rules of the accounts issue: staff accounts
 * are made by an admin, roles change at once, a switched-off account's tokens stop at once, and
 * an admin can neither demote nor switch off themself.
 */
import request from 'supertest';
import { User } from '../../server/entities/user.entity';
import { bearer, createAccount, PASSWORD, RAISED_LIMITS, signIn } from './auth/helpers';
import { makeTestContext, TestContext } from './test-context';

let t: TestContext;
let admin: User;
let adminAuth: string;
beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  admin = await createAccount(t, 'admin', 'owner@example.test');
  adminAuth = await bearer(t, admin);
});
afterAll(() => t.dispose());

const api = () => request(t.app);

describe('listing', () => {
  beforeAll(async () => {
    for (const [name, email] of [
      ['Linnea Ross', 'linnea@example.test'],
      ['Carl Lindqvist', 'carl@example.test'],
      ['Mo Hart', 'mo@lindenhof.test'],
      ['Zed 100%_sure', 'zed@example.test'],
    ]) {
      await api().post('/api/users').set('Authorization', adminAuth).send({ name, email, role: 'rider', password: PASSWORD }).expect(201);
    }
  });

  test('searches name and e-mail, case-insensitively, and pages', async () => {
    const all = await api().get('/api/users').query({ q: 'LIN' }).set('Authorization', adminAuth).expect(200);
    expect(all.body.users.map((u: { name: string }) => u.name)).toEqual(['Carl Lindqvist', 'Linnea Ross', 'Mo Hart']);
    expect(all.body.total).toBe(3);

    const second = await api().get('/api/users').query({ q: 'lin', page: 2, pageSize: 2 }).set('Authorization', adminAuth).expect(200);
    expect(second.body).toEqual({ users: [expect.objectContaining({ name: 'Mo Hart' })], total: 3, page: 2, pageSize: 2 });
  });

  test('treats % and _ in the search as plain characters', async () => {
    const res = await api().get('/api/users').query({ q: '100%_' }).set('Authorization', adminAuth).expect(200);
    expect(res.body.users.map((u: { name: string }) => u.name)).toEqual(['Zed 100%_sure']);
  });

  test('refuses a page size over 100 with a field error', async () => {
    const res = await api().get('/api/users').query({ pageSize: 1000 }).set('Authorization', adminAuth).expect(400);
    expect(res.body.error.fields).toEqual({ pageSize: expect.any(String) });
  });
});

describe('creating', () => {
  test('makes a staff account that can sign in with its role', async () => {
    const res = await api()
      .post('/api/users')
      .set('Authorization', adminAuth)
      .send({ name: 'Noor Pike', email: 'Noor@Example.test', role: 'counter', password: PASSWORD })
      .expect(201);
    expect(res.body.user).toEqual(expect.objectContaining({ email: 'noor@example.test', role: 'counter', active: true, lastSignInAt: null }));
    expect((await signIn(t, 'noor@example.test').expect(200)).body.user.role).toBe('counter');
  });

  test('answers field errors for a bad role, a short password and a taken e-mail', async () => {
    const bad = await api().post('/api/users').set('Authorization', adminAuth).send({ name: 'X', email: 'x@example.test', role: 'owner', password: 'short' }).expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['password', 'role']);
    const taken = await api().post('/api/users').set('Authorization', adminAuth).send({ name: 'X', email: 'OWNER@example.test', role: 'desk', password: PASSWORD }).expect(409);
    expect(taken.body.error.fields).toEqual({ email: expect.any(String) });
  });
});

describe('changing a role', () => {
  test('takes effect on the next request with the same token', async () => {
    const counter = await createAccount(t, 'counter');
    const token = await bearer(t, counter);
    await api().get('/api/users').set('Authorization', token).expect(403);
    const res = await api().patch(`/api/users/${counter.id}/role`).set('Authorization', adminAuth).send({ role: 'admin' }).expect(200);
    expect(res.body.user.role).toBe('admin');
    await api().get('/api/users').set('Authorization', token).expect(200);
  });

  test('an admin cannot demote themself, and nothing changes', async () => {
    const res = await api().patch(`/api/users/${admin.id}/role`).set('Authorization', adminAuth).send({ role: 'desk' }).expect(409);
    expect(res.body.error.code).toBe('own-account');
    await api().get('/api/users').set('Authorization', adminAuth).expect(200);
  });

  test('an unknown account answers 404, an unknown role 400', async () => {
    await api().patch('/api/users/99999/role').set('Authorization', adminAuth).send({ role: 'desk' }).expect(404);
    await api().patch('/api/users/abc/role').set('Authorization', adminAuth).send({ role: 'desk' }).expect(404);
    await api().patch(`/api/users/${admin.id}/role`).set('Authorization', adminAuth).send({ role: 'boss' }).expect(400);
  });
});

describe('switching an account off and on', () => {
  test('off stops its tokens at once; on again needs a new sign-in', async () => {
    const desk = await createAccount(t, 'desk');
    const session = await signIn(t, desk.email).expect(200);
    const auth = `Bearer ${session.body.token}`;
    await api().get('/api/me').set('Authorization', auth).expect(200);

    const off = await api().patch(`/api/users/${desk.id}/active`).set('Authorization', adminAuth).send({ active: false }).expect(200);
    expect(off.body.user.active).toBe(false);
    await api().get('/api/me').set('Authorization', auth).expect(401);
    await signIn(t, desk.email).expect(403);

    await api().patch(`/api/users/${desk.id}/active`).set('Authorization', adminAuth).send({ active: true }).expect(200);
    await api().get('/api/me').set('Authorization', auth).expect(401);
    await signIn(t, desk.email).expect(200);
  });

  test('an admin cannot switch themself off', async () => {
    const res = await api().patch(`/api/users/${admin.id}/active`).set('Authorization', adminAuth).send({ active: false }).expect(409);
    expect(res.body.error.code).toBe('own-account');
    await api().get('/api/me').set('Authorization', adminAuth).expect(200);
  });

  test('wants a real boolean', async () => {
    const res = await api().patch(`/api/users/${admin.id}/active`).set('Authorization', adminAuth).send({ active: 'no' }).expect(400);
    expect(res.body.error.fields).toEqual({ active: expect.any(String) });
  });
});
