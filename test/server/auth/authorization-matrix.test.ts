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
import { prepareCatalogueFixtures } from '../catalogue/helpers';
import { makeRiderFlowFixtures } from '../rider/helpers';
import { makeDeskFixtures } from '../desk/helpers';
import { makeLoopFixtures } from '../damping/helpers';

type Expected = 'public' | 'quote-token' | 'webhook' | readonly Role[];

/** A well-formed quote link token that opens nothing. */
const UNKNOWN_QUOTE_TOKEN = 'A'.repeat(43);

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
  'GET /catalogue/springs': everyone,
  'GET /catalogue/springs.csv': ['counter', 'admin'],
  'GET /catalogue/springs/:id': everyone,
  'POST /catalogue/springs': ['counter', 'admin'],
  'PATCH /catalogue/springs/:id': ['counter', 'admin'],
  'POST /catalogue/springs/:id/deactivate': ['counter', 'admin'],
  'POST /catalogue/springs/:id/reactivate': ['counter', 'admin'],
  'GET /catalogue/families': everyone,
  'GET /catalogue/rates-for-fit': everyone,
  'GET /catalogue/low-stock': ['counter', 'admin'],
  'GET /catalogue/low-stock.csv': ['counter', 'admin'],
  'POST /catalogue/identify': ['counter', 'admin', 'desk'],
  'POST /stock/:id/receive': ['counter', 'admin'],
  'POST /stock/:id/count': ['counter', 'admin'],
  'POST /stock/:id/reserve': ['counter', 'admin', 'desk'],
  'POST /stock/:id/release': ['counter', 'admin', 'desk'],
  'POST /stock/:id/fit': ['counter', 'admin', 'desk'],
  'POST /stock/:id/override-release': ['counter', 'admin'],
  'GET /stock/:id/holds': ['counter', 'admin', 'desk'],
  'GET /stock/movements': ['counter', 'admin'],
  'GET /stock/movements.csv': ['counter', 'admin'],
  'POST /imports/dry-run': ['counter', 'admin'],
  'POST /imports': ['counter', 'admin'],
  'GET /imports': ['counter', 'admin'],
  'GET /imports/:id': ['counter', 'admin'],
  'GET /bike-models': everyone,
  'GET /bike-models/:id': everyone,
  'POST /bike-models': ['admin'],
  'PUT /bike-models/:id': ['admin'],
  'DELETE /bike-models/:id': ['admin'],
  'GET /damper-kinds': everyone,
  'POST /damper-kinds': ['admin'],
  'GET /bikes': everyone,
  'POST /bikes': everyone,
  'GET /bikes/:id': everyone,
  'PUT /bikes/:id': everyone,
  'DELETE /bikes/:id': everyone,
  'GET /me/units': everyone,
  'PUT /me/units': everyone,
  'GET /weigh-in': everyone,
  'PUT /weigh-in': everyone,
  'GET /bikes/:id/draft': everyone,
  'PUT /bikes/:id/draft': everyone,
  'POST /bikes/:id/draft': everyone,
  'DELETE /bikes/:id/draft': everyone,
  'POST /bikes/:id/sizing-records': everyone,
  'GET /bikes/:id/sizing-records': everyone,
  'GET /sizing-records/:id': everyone,
  'GET /bikes/:id/setup-log': everyone,
  'POST /bikes/:id/setup-log': everyone,
  'GET /bikes/:id/setup-log/back-to-baseline': everyone,
  'GET /bikes/:id/load-cases': everyone,
  'POST /bikes/:id/load-case': everyone,
  'PUT /target-profiles/:discipline': ['admin'],
  'GET /engine-settings': ['admin'],
  'PATCH /engine-settings': ['admin'],
  'GET /audit': ['admin'],
  'GET /shop-settings': ['desk', 'admin'],
  'PUT /shop-settings': ['admin'],
  'GET /customers': ['desk', 'admin'],
  'POST /customers': ['desk', 'admin'],
  'GET /quotes': everyone,
  'POST /quotes': ['desk', 'admin'],
  'POST /sizing-records/:id/quote-request': everyone,
  'GET /quotes/:id': everyone,
  'GET /quotes/:id/spring-options': ['desk', 'admin'],
  'PUT /quotes/:id/lines': ['desk', 'admin'],
  'POST /quotes/:id/send': ['desk', 'admin'],
  'POST /quotes/:id/revise': ['desk', 'admin'],
  'POST /quotes/:id/book': ['desk', 'admin'],
  'POST /quotes/:id/fitted': ['desk', 'admin'],
  'POST /quotes/:id/cancel': ['desk', 'admin'],
  'POST /quotes/:id/accept': everyone,
  'POST /quotes/:id/decline': everyone,
  'POST /quotes/:id/pay-deposit': everyone,
  'GET /customer-quotes/:token': 'quote-token',
  'POST /customer-quotes/:token/accept': 'quote-token',
  'POST /customer-quotes/:token/decline': 'quote-token',
  'POST /customer-quotes/:token/pay-deposit': 'quote-token',
  'POST /payments/webhook': 'webhook',
  'GET /damping-rules': ['desk', 'admin'],
  'POST /damping-rules': ['desk', 'admin'],
  'PATCH /damping-rules/:id': ['admin'],
  'GET /bikes/:id/test-rides': everyone,
  'POST /bikes/:id/test-rides': everyone,
  'POST /test-rides/:id/made': everyone,
  'POST /test-rides/:id/outcome': everyone,
  'POST /test-rides/:id/undo': everyone,
  'GET /bikes/:id/damper-plans': everyone,
  'POST /bikes/:id/damper-plans/:target': everyone,
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
  const catalogue = await prepareCatalogueFixtures(t, accounts.counter.id);
  const flow = await makeRiderFlowFixtures(t, accounts.rider, accounts.admin);
  const desk = await makeDeskFixtures(t, accounts.desk, flow.recordId);
  const loop = await makeLoopFixtures(t, accounts.rider, flow.bikeId);
  params = {
    'PATCH /users/:id/role': { id: target },
    'PATCH /users/:id/active': { id: target },
    'GET /dev/outbox/:id': { id: mailId },
    'GET /catalogue/springs/:id': { id: catalogue.springId },
    'PATCH /catalogue/springs/:id': { id: catalogue.springId },
    'POST /catalogue/springs/:id/deactivate': { id: catalogue.springId },
    'POST /catalogue/springs/:id/reactivate': { id: catalogue.springId },
    'POST /stock/:id/receive': { id: catalogue.springId },
    'POST /stock/:id/count': { id: catalogue.springId },
    'POST /stock/:id/reserve': { id: catalogue.springId },
    'POST /stock/:id/release': { id: catalogue.springId },
    'POST /stock/:id/fit': { id: catalogue.springId },
    'POST /stock/:id/override-release': { id: catalogue.springId },
    'GET /stock/:id/holds': { id: catalogue.springId },
    'GET /imports/:id': { id: catalogue.batchId },
    'GET /bike-models/:id': { id: flow.modelId },
    'PUT /bike-models/:id': { id: flow.modelId },
    'DELETE /bike-models/:id': { id: flow.doomedModelId },
    'GET /bikes/:id': { id: flow.bikeId },
    'PUT /bikes/:id': { id: flow.bikeId },
    'DELETE /bikes/:id': { id: flow.doomedBikeId },
    'GET /bikes/:id/draft': { id: flow.bikeId },
    'PUT /bikes/:id/draft': { id: flow.bikeId },
    'POST /bikes/:id/draft': { id: flow.bikeId },
    'DELETE /bikes/:id/draft': { id: flow.bikeId },
    'POST /bikes/:id/sizing-records': { id: flow.bikeId },
    'GET /bikes/:id/sizing-records': { id: flow.bikeId },
    'GET /sizing-records/:id': { id: flow.recordId },
    'POST /sizing-records/:id/quote-request': { id: flow.recordId },
    'GET /bikes/:id/setup-log': { id: flow.bikeId },
    'POST /bikes/:id/setup-log': { id: flow.bikeId },
    'GET /bikes/:id/setup-log/back-to-baseline': { id: flow.bikeId },
    'GET /bikes/:id/load-cases': { id: flow.bikeId },
    'POST /bikes/:id/load-case': { id: flow.bikeId },
    'PUT /target-profiles/:discipline': { discipline: 'road' },
    'GET /quotes/:id': { id: desk.quoteId },
    'GET /quotes/:id/spring-options': { id: desk.quoteId },
    'PUT /quotes/:id/lines': { id: desk.quoteId },
    'POST /quotes/:id/send': { id: desk.quoteId },
    'POST /quotes/:id/revise': { id: desk.quoteId },
    'POST /quotes/:id/book': { id: desk.quoteId },
    'POST /quotes/:id/fitted': { id: desk.quoteId },
    'POST /quotes/:id/cancel': { id: desk.quoteId },
    'POST /quotes/:id/accept': { id: desk.quoteId },
    'POST /quotes/:id/decline': { id: desk.quoteId },
    'POST /quotes/:id/pay-deposit': { id: desk.quoteId },
    'GET /customer-quotes/:token': { token: UNKNOWN_QUOTE_TOKEN },
    'POST /customer-quotes/:token/accept': { token: UNKNOWN_QUOTE_TOKEN },
    'POST /customer-quotes/:token/decline': { token: UNKNOWN_QUOTE_TOKEN },
    'POST /customer-quotes/:token/pay-deposit': { token: UNKNOWN_QUOTE_TOKEN },
    'PATCH /damping-rules/:id': { id: loop.ruleId },
    'GET /bikes/:id/test-rides': { id: flow.bikeId },
    'POST /bikes/:id/test-rides': { id: flow.bikeId },
    'POST /test-rides/:id/made': { id: loop.rideId },
    'POST /test-rides/:id/outcome': { id: loop.rideId },
    'POST /test-rides/:id/undo': { id: loop.rideId },
    'GET /bikes/:id/damper-plans': { id: flow.bikeId },
    'POST /bikes/:id/damper-plans/:target': { id: flow.bikeId, target: 'standard' },
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

// Some 500 real requests: more than Jest's default 5 s on a loaded machine.
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
      if (expected === 'quote-token') {
        // Without a link that opens a quote, anyone, signed in or not, gets the dead-link answer.
        if (res.status !== 404 || res.body.error?.code !== 'quote-link') wrong.push(`${label}, expected 404 quote-link`);
      } else if (expected === 'webhook') {
        // Without the provider's signature, anyone gets a 400 before the body is read.
        if (res.status !== 400 || res.body.error?.code !== 'bad-signature') wrong.push(`${label}, expected 400 bad-signature`);
      } else if (expected === 'public') {
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
}, 60_000);
