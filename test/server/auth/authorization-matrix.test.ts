/**
 * Walks every route of the API table anonymously and as each role. The expectations are this
 * file's, keyed by `METHOD path`, so a route added without one fails here. Rules from the accounts
 * issue: anonymous on a signed-in route → 401, a role not allowed → 403, an allowed role (or anyone
 * on a public route) → not refused by a guard.
 */
import request from 'supertest';
import { Role, ROLES } from '../../../shared/types/roles';
import { User } from '../../../server/entities/user.entity';
import { apiRoutes } from '../../../server/routes';
import { RouteSpec } from '../../../server/routes/route-table';
import { makeTestContext, TestContext } from '../test-context';
import { bearer, createAccount, RAISED_LIMITS } from './helpers';

type Expected = 'public' | readonly Role[];

const everyone = ROLES;

const expectations: Record<string, Expected> = {
  'GET /health': 'public',
  'POST /auth/sign-up': 'public',
  'POST /auth/sign-in': 'public',
  'POST /auth/refresh': 'public',
  'POST /auth/sign-out': everyone,
  'POST /auth/reset-request': 'public',
  'POST /auth/reset': 'public',
  'GET /me': everyone,
  'GET /users': ['admin'],
  'POST /users': ['admin'],
  'PATCH /users/:id/role': ['admin'],
  'PATCH /users/:id/active': ['admin'],
  'POST /sizing': everyone,
  'GET /target-profiles': everyone,
  'GET /dev/outbox': ['admin'],
  'GET /dev/outbox/:id': ['admin'],
};

const key = (route: RouteSpec) => `${route.method.toUpperCase()} ${route.path}`;

let t: TestContext;
let routes: RouteSpec[];
const accounts = {} as Record<Role, User>;
/** Real values for the parameters of each parameterised route. */
let params: Record<string, Record<string, string>>;

beforeAll(async () => {
  t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  for (const role of ROLES) accounts[role] = await createAccount(t, role);
  await t.mailer.send({ to: 'someone@example.test', subject: 'A mail for the outbox route', text: 'Hello', html: '<p>Hello</p>' });
  const deadline = Date.now() + 5000;
  while (!t.outbox?.list().length && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 20));
  const mailId = t.outbox?.list()[0]?.id;
  if (!mailId) throw new Error('the outbox caught no mail');
  const target = String(accounts.rider.id);
  params = {
    'PATCH /users/:id/role': { id: target },
    'PATCH /users/:id/active': { id: target },
    'GET /dev/outbox/:id': { id: mailId },
  };
  routes = apiRoutes(t);
});
afterAll(() => t.dispose());

function concretePath(route: RouteSpec): string {
  return route.path.replace(/:(\w+)/g, (_, name: string) => {
    const value = params[key(route)]?.[name];
    if (value === undefined) throw new Error(`no value for :${name} in ${key(route)}; add it to params`);
    return value;
  });
}

async function call(route: RouteSpec, as: Role | 'anonymous') {
  const req = request(t.app)[route.method](`/api${concretePath(route)}`);
  // A fresh token per call: sign-out revokes the caller's earlier ones.
  if (as !== 'anonymous') req.set('Authorization', await bearer(t, accounts[as]));
  return route.method === 'get' ? req : req.send({});
}

function refusedByGuard(res: request.Response): boolean {
  return (res.status === 401 && res.body.error?.code === 'unauthorized') || res.status === 403;
}

test('every route in the table has an expectation, and every expectation a route', () => {
  const declared = routes.map(key);
  expect(new Set(declared).size).toBe(declared.length);
  expect(declared.filter((k) => !(k in expectations))).toEqual([]);
  expect(Object.keys(expectations).filter((k) => !declared.includes(k))).toEqual([]);
});

test('each route answers each caller as its access class says', async () => {
  let walked = 0;
  const wrong: string[] = [];
  for (const route of routes) {
    const expected = expectations[key(route)];
    if (!expected) continue;
    walked += 1;
    for (const as of ['anonymous', ...ROLES] as const) {
      const res = await call(route, as);
      const label = `${key(route)} as ${as}: ${res.status} ${res.body.error?.code ?? ''}`;
      if (expected === 'public') {
        if (refusedByGuard(res)) wrong.push(`${label}, expected the guard to let it through`);
      } else if (as === 'anonymous') {
        if (res.status !== 401) wrong.push(`${label}, expected 401`);
      } else if (expected.includes(as)) {
        if (res.status === 401 || res.status === 403) wrong.push(`${label}, expected neither 401 nor 403`);
      } else if (res.status !== 403) {
        wrong.push(`${label}, expected 403`);
      }
    }
  }
  expect(wrong).toEqual([]);
  expect(walked).toBe(routes.length);
  expect(walked).toBe(Object.keys(expectations).length);
  expect(walked).toBeGreaterThan(0);
});
