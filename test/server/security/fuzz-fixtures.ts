/**
 * A shop with a record of every kind, served on a real loopback socket, for the bad-input tests:
 * an account per role, a spring with stock, an import batch, bike models and bikes (one of each
 * only to be deleted), a weigh-in, a saved pass, a draft quote and a sent one whose link token
 * the mail carries. `pathFor` fills any route's parameters from these, by the path's resource.
 */
import request from 'supertest';
import { Role, ROLES } from '../../../shared/types/roles';
import { User } from '../../../server/entities/user.entity';
import { apiRoutes } from '../../../server/routes';
import { RouteSpec } from '../../../server/routes/route-table';
import { bearer, createAccount, RAISED_LIMITS } from '../auth/helpers';
import { prepareCatalogueFixtures } from '../catalogue/helpers';
import { listen, makeDeskFixtures } from '../desk/helpers';
import { makeLoopFixtures } from '../damping/helpers';
import { as, makeRiderFlowFixtures } from '../rider/helpers';
import { makeTestContext, TestContext } from '../test-context';

export interface Shop {
  t: TestContext;
  base: string;
  close: () => Promise<void>;
  routes: RouteSpec[];
  accounts: Record<Role, User>;
  /** An account the user routes may change (role, deactivation) without locking the fuzz out. */
  bystander: User;
  ids: {
    mailId: string;
    springId: string;
    batchId: string;
    modelId: string;
    doomedModelId: string;
    bikeId: string;
    doomedBikeId: string;
    recordId: string;
    quoteId: string;
    sentQuoteId: string;
    quoteToken: string;
    rideId: string;
    ruleId: string;
  };
}

export const routeKey = (route: RouteSpec) => `${route.method.toUpperCase()} ${route.path}`;

/** Sends a quote as the desk and answers the link token its mail carries. */
export async function sendQuoteForToken(t: TestContext, desk: User, admin: User, quoteId: number): Promise<{ token: string; mailId: string }> {
  const seen = new Set((t.outbox?.list() ?? []).map((m) => m.id));
  await (await as(t, desk)).post(`/quotes/${quoteId}/send`).expect(200);
  const deadline = Date.now() + 5000;
  while (Date.now() < deadline) {
    for (const entry of (t.outbox?.list() ?? []).filter((m) => !seen.has(m.id))) {
      const mail = await request(t.app).get(`/api/dev/outbox/${entry.id}`).set('Authorization', await bearer(t, admin));
      const token = /\/q\/([A-Za-z0-9_-]{43})/.exec(mail.body.mail?.text ?? '')?.[1];
      if (token) return { token, mailId: entry.id };
    }
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error(`the mail of quote ${quoteId} did not arrive`);
}

export async function openShop(): Promise<Shop> {
  const t = await makeTestContext({ rateLimits: RAISED_LIMITS });
  const accounts = {} as Record<Role, User>;
  for (const role of ROLES) accounts[role] = await createAccount(t, role);
  const bystander = await createAccount(t, 'rider');
  const catalogue = await prepareCatalogueFixtures(t, accounts.counter.id);
  const flow = await makeRiderFlowFixtures(t, accounts.rider, accounts.admin);
  const desk = await makeDeskFixtures(t, accounts.desk, flow.recordId);
  const asDesk = await as(t, accounts.desk);
  const sent = await asDesk.post('/quotes', { sizingRecordId: Number(flow.recordId), lines: [{ kind: 'labour', operationCode: 'sag-setup' }] }).expect(201);
  const { token: quoteToken, mailId } = await sendQuoteForToken(t, accounts.desk, accounts.admin, sent.body.quote.id);
  const loop = await makeLoopFixtures(t, accounts.rider, flow.bikeId);
  const { base, close } = await listen(t);
  return {
    t,
    base,
    close: async () => {
      await close();
      await t.dispose();
    },
    routes: apiRoutes(t),
    accounts,
    bystander,
    ids: { ...flow, ...catalogue, ...loop, mailId, quoteId: desk.quoteId, sentQuoteId: String(sent.body.quote.id), quoteToken },
  };
}

/** The value of a path parameter, by the resource the path names; a route under a new resource fails here until it has one. */
function paramValue(shop: Shop, route: RouteSpec, name: string): string {
  const { ids } = shop;
  const deleting = route.method === 'delete';
  const path = route.path;
  if (name === 'token') return ids.quoteToken;
  if (name === 'discipline') return 'road';
  if (name === 'target') return 'standard';
  if (name !== 'id') throw new Error(`no value for :${name} in ${routeKey(route)}`);
  if (path.startsWith('/users/')) return String(shop.bystander.id);
  if (path.startsWith('/dev/outbox/')) return ids.mailId;
  if (path.startsWith('/catalogue/springs/') || path.startsWith('/stock/')) return ids.springId;
  if (path.startsWith('/imports/')) return ids.batchId;
  if (path.startsWith('/bike-models/')) return deleting ? ids.doomedModelId : ids.modelId;
  if (path === '/bikes/:id' && deleting) return ids.doomedBikeId;
  if (path.startsWith('/bikes/')) return ids.bikeId;
  if (path.startsWith('/sizing-records/')) return ids.recordId;
  if (path.startsWith('/quotes/')) return ids.quoteId;
  if (path.startsWith('/test-rides/')) return ids.rideId;
  if (path.startsWith('/damping-rules/')) return ids.ruleId;
  throw new Error(`no value for :id in ${routeKey(route)}`);
}

/** The route's path with real values for its parameters, or the text given in `raw` put in as it is. */
export function pathFor(shop: Shop, route: RouteSpec, raw: Record<string, string> = {}): string {
  return `/api${route.path.replace(/:(\w+)/g, (_, name: string) => raw[name] ?? encodeURIComponent(paramValue(shop, route, name)))}`;
}

/** The role the fuzz signs in with: the first allowed of rider (who owns the fixtures' bikes), desk, counter, admin. */
export function callerFor(route: RouteSpec): Role | undefined {
  if (route.access.kind !== 'signed-in') return undefined;
  const allowed = route.access.roles;
  return (['rider', 'desk', 'counter', 'admin'] as const).find((role) => allowed.includes(role));
}

/** A request on the socket, signed in as the route's caller with a fresh token (sign-out revokes the earlier ones). */
export async function send(
  shop: Shop,
  route: RouteSpec,
  options: { body?: unknown; raw?: string | Buffer; query?: string; contentType?: string; contentEncoding?: string; rawParams?: Record<string, string> } = {},
) {
  const url = pathFor(shop, route, options.rawParams) + (options.query ? `?${options.query}` : '');
  // A request that never answers fails the run instead of hanging it.
  const req = request(shop.base)[route.method](url).timeout({ response: 15_000, deadline: 20_000 });
  const role = callerFor(route);
  if (role) req.set('Authorization', await bearer(shop.t, shop.accounts[role]));
  // Without a signature header the webhook refuses before reading; a wrong one makes it read and verify.
  if (route.access.kind === 'webhook') req.set('stripe-signature', 't=1,v1=00');
  if (options.contentEncoding) req.set('Content-Encoding', options.contentEncoding);
  if (options.raw !== undefined) return req.set('Content-Type', options.contentType ?? 'application/json').send(options.raw);
  if (options.body !== undefined) return req.set('Content-Type', 'application/json').send(JSON.stringify(options.body));
  return req;
}
