/** The demo accounts: one per role, each signing in with the one demo password that start-up prints. */
import request from 'supertest';
import { ROLES } from '../../../shared/types/roles';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, seedDemoAccounts } from '../../../server/seed/demo-accounts';
import { makeTestContext, TestContext } from '../test-context';

let t: TestContext;
beforeAll(async () => {
  t = await makeTestContext();
  await t.db.write(seedDemoAccounts);
});
afterAll(() => t.dispose());

test('there is exactly one per role, on demo.test', () => {
  expect(DEMO_ACCOUNTS.map((a) => a.role).sort()).toEqual([...ROLES].sort());
  expect(DEMO_ACCOUNTS.map((a) => a.email)).toEqual(ROLES.map((role) => `${role}@demo.test`));
});

test.each(DEMO_ACCOUNTS.map((a) => [a.email, a.role]))('%s signs in as %s', async (email, role) => {
  const res = await request(t.app).post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD }).expect(200);
  expect(res.body.user).toEqual(expect.objectContaining({ email, role }));
});
