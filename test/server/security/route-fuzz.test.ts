/**
 * Generated bad input (fast-check) to every route of the API table, over a real loopback socket
 * to the real app on a real SQLite file, signed in with a role the route allows.
 *
 * Part one sends only what cannot pass: bytes that are not JSON (to every route), path parameters
 * with percent-escapes that do not decode (to every route that has one), bodies that are not what
 * their Content-Encoding names (to every route), bodies with a field missing that the route itself
 * named as required when sent `{}` (to every route that validates), and hostile query strings (to
 * every GET). Every answer is a 4xx (a GET may answer 200), and the checksum of every table is the
 * same after each route as before it.
 *
 * Part two sends bodies that may pass (schema field names with hostile values, the required ones
 * included) to every route, the actions without a body too. Writes may happen there; the rule is
 * that what got written still passes the shared schemas and the database's own checks: integrity,
 * foreign keys, and stock equal to the sum of its movements.
 *
 * Both parts: never a 5xx, every route that takes a body shows a 400 with field errors, and the
 * server answers its health check at the end. Sample strings: OWASP WSTG v4.2 (INPV-01, INPV-05);
 * broken escapes: RFC 3986 §2.1 and RFC 3629 §3; content codings: RFC 9110 §8.4.1.
 */
import * as fc from 'fast-check';
import request from 'supertest';
import { AnySchema } from 'yup';
import { bikeSpecSchema } from '../../../shared/schemas/bike.schema';
import { springCreateSchema } from '../../../shared/schemas/catalogue.schema';
import { shopSettingsSchema } from '../../../shared/schemas/shop-settings.schema';
import { weighInSchema } from '../../../shared/schemas/weigh-in.schema';
import { ROLES } from '../../../shared/types/roles';
import { Bike } from '../../../server/entities/bike.entity';
import { BikeModel } from '../../../server/entities/bike-model.entity';
import { RiderProfile } from '../../../server/entities/rider-profile.entity';
import { ShopSettings } from '../../../server/entities/shop-settings.entity';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { RouteSpec } from '../../../server/routes/route-table';
import { ledgerMismatches } from '../catalogue/helpers';
import { changedTables, tableChecksums } from './db-checksum';
import { openShop, routeKey, send, Shop } from './fuzz-fixtures';
import { BROKEN_ESCAPES, hostileBody, hostileQuery, malformedJson, MISLABELLED_BODIES, schemaFieldNames } from './hostile-values';

/** Actions whose handlers read no body: they act on the path alone, so a body can neither help nor hurt. */
const BODILESS = new Set([
  'POST /auth/refresh',
  'POST /auth/sign-out',
  'POST /catalogue/springs/:id/deactivate',
  'POST /catalogue/springs/:id/reactivate',
  'POST /sizing-records/:id/quote-request',
  'POST /quotes/:id/send',
  'POST /quotes/:id/revise',
  'POST /quotes/:id/fitted',
  'POST /quotes/:id/accept',
  'POST /customer-quotes/:token/accept',
  'POST /test-rides/:id/made',
  'POST /test-rides/:id/undo',
]);

/** The CSV uploads take multipart/form-data, not JSON (uploads.test.ts fuzzes them); here they answer 415 or 400. */
const MULTIPART = new Set(['POST /imports/dry-run', 'POST /imports']);

const RUNS_PER_ROUTE = { malformed: 3, invalid: 12, query: 6, mixed: 6 };

let shop: Shop;
let keys: string[];
const fiveHundreds: string[] = [];
/** Routes that answered at least one 400 with field errors. */
const fieldErrorsSeen = new Set<string>();
/** Per route, the top-level fields it named as required when sent `{}`. */
const required = new Map<string, string[]>();

/** Learns each route's required fields from its answer to `{}` on a scratch shop, since `{}` passes on some routes and acts. */
async function learnRequiredFields() {
  const scratch = await openShop();
  try {
    for (const route of scratch.routes.filter(takesJsonBody)) {
      const res = await send(scratch, route, { body: {} });
      note(route, res, {});
      if (res.status === 400 && res.body.error?.fields) required.set(routeKey(route), [...new Set(Object.keys(res.body.error.fields).map(topLevel))]);
    }
  } finally {
    await scratch.close();
  }
}

beforeAll(async () => {
  keys = schemaFieldNames();
  await learnRequiredFields();
  shop = await openShop();
}, 90_000);
afterAll(() => shop.close());

function takesJsonBody(route: RouteSpec): boolean {
  const key = routeKey(route);
  return route.method !== 'get' && route.method !== 'delete' && route.access.kind !== 'webhook' && !BODILESS.has(key) && !MULTIPART.has(key);
}

function note(route: RouteSpec, res: request.Response, sent: unknown) {
  if (res.status >= 500) fiveHundreds.push(`${routeKey(route)} ${res.status} ${JSON.stringify(res.body)} for ${JSON.stringify(sent)?.slice(0, 300)}`);
  if (res.status === 400 && res.body.error?.fields && Object.keys(res.body.error.fields).length > 0) fieldErrorsSeen.add(routeKey(route));
}

function topLevel(fieldPath: string): string {
  return fieldPath.split(/[.[]/)[0];
}

/** Runs `check` for each route and fails with the routes whose tables changed. */
async function withUnchangedDatabase(routes: RouteSpec[], check: (route: RouteSpec) => Promise<void>) {
  const changed: string[] = [];
  for (const route of routes) {
    const before = await tableChecksums(shop.t);
    await check(route);
    const tables = changedTables(before, await tableChecksums(shop.t));
    if (tables.length) changed.push(`${routeKey(route)} changed ${tables.join(', ')}`);
  }
  expect(changed).toEqual([]);
}

describe('part one: input that cannot pass writes nothing', () => {
  test('bytes that are not JSON get a 400 on every route, before any handler runs', async () => {
    await withUnchangedDatabase(shop.routes, (route) =>
      fc.assert(
        fc.asyncProperty(malformedJson, async (raw) => {
          const res = await send(shop, route, { raw });
          note(route, res, raw);
          const expected = route.access.kind === 'webhook' ? 'bad-signature' : 'malformed-json';
          return res.status === 400 && res.body.error?.code === expected;
        }),
        { numRuns: RUNS_PER_ROUTE.malformed },
      ),
    );
  }, 120_000);

  test('a broken percent-escape in any path parameter is a 400 on every route that has one, before any handler runs', async () => {
    const withParameters = shop.routes.filter((route) => route.path.includes('/:'));
    expect(withParameters.length).toBeGreaterThan(30);
    const wrong: string[] = [];
    await withUnchangedDatabase(withParameters, async (route) => {
      for (const [, name] of route.path.matchAll(/:(\w+)/g)) {
        for (const escape of BROKEN_ESCAPES) {
          const res = await send(shop, route, { rawParams: { [name]: escape } });
          note(route, res, escape);
          if (res.status !== 400 || res.body.error?.code !== 'malformed-url') wrong.push(`${routeKey(route)} :${name}=${escape}: ${res.status} ${res.text.slice(0, 200)}`);
        }
      }
    });
    expect(wrong).toEqual([]);
  }, 120_000);

  test('a body that is not what its Content-Encoding names is a 400 on every route, the webhook included', async () => {
    const wrong: string[] = [];
    await withUnchangedDatabase(shop.routes, async (route) => {
      for (const { encoding, raw } of MISLABELLED_BODIES) {
        const res = await send(shop, route, { raw, contentEncoding: encoding });
        note(route, res, encoding);
        if (res.status !== 400 || res.body.error?.code !== 'malformed-body') wrong.push(`${routeKey(route)} ${encoding} (${raw.length} bytes): ${res.status} ${res.text.slice(0, 200)}`);
      }
    });
    expect(wrong).toEqual([]);
  }, 120_000);

  test('the routes that take a JSON body name their required fields when sent {}', () => {
    expect(shop.routes.filter(takesJsonBody).length).toBeGreaterThan(30);
    expect(required.size).toBeGreaterThan(20);
  });

  test('a list where the body object belongs is a 400 with field errors on every route that takes a JSON body', async () => {
    const wrong: string[] = [];
    await withUnchangedDatabase(shop.routes.filter(takesJsonBody), async (route) => {
      const res = await send(shop, route, { body: [{ reason: 'a list, not an object' }] });
      note(route, res, []);
      if (res.status !== 400 || !res.body.error?.fields) wrong.push(`${routeKey(route)}: ${res.status} ${JSON.stringify(res.body)}`);
    });
    expect(wrong).toEqual([]);
  }, 60_000);

  test('a body without one of those required fields gets a 4xx, whatever else it holds', async () => {
    const validating = shop.routes.filter((route) => required.get(routeKey(route))?.length);
    expect(validating.length).toBeGreaterThan(20);
    await withUnchangedDatabase(validating, (route) => {
      const names = required.get(routeKey(route))!;
      return fc.assert(
        fc.asyncProperty(hostileBody(keys), fc.nat(), async (generated, pick) => {
          const body = generated && typeof generated === 'object' && !Array.isArray(generated) ? { ...generated } : generated;
          if (body && typeof body === 'object' && !Array.isArray(body)) delete (body as Record<string, unknown>)[names[pick % names.length]];
          const res = await send(shop, route, { body });
          note(route, res, body);
          return res.status >= 400 && res.status < 500;
        }),
        { numRuns: RUNS_PER_ROUTE.invalid },
      );
    });
  }, 240_000);

  test('hostile query strings on every GET get an answer, never a 5xx, and write nothing', async () => {
    await withUnchangedDatabase(
      shop.routes.filter((route) => route.method === 'get'),
      (route) =>
        fc.assert(
          fc.asyncProperty(hostileQuery(keys), async (query) => {
            const res = await send(shop, route, { query });
            note(route, res, query);
            return res.status < 500;
          }),
          { numRuns: RUNS_PER_ROUTE.query },
        ),
    );
  }, 120_000);
});

describe('part two: input that may pass writes only what the schemas allow', () => {
  test('bodies of schema fields with hostile values, to every route, never get a 5xx', async () => {
    for (const route of shop.routes) {
      const names = required.get(routeKey(route)) ?? [];
      const withRequired = fc.tuple(hostileBody(keys), fc.dictionary(fc.constantFrom(...(names.length ? names : keys)), hostileBody(keys), { maxKeys: names.length || 1 }));
      await fc.assert(
        fc.asyncProperty(withRequired, async ([generated, requiredPart]) => {
          const body = generated && typeof generated === 'object' && !Array.isArray(generated) ? { ...generated, ...requiredPart } : generated;
          const res = await send(shop, route, { body });
          note(route, res, body);
          return res.status < 500;
        }),
        { numRuns: RUNS_PER_ROUTE.mixed },
      );
    }
  }, 300_000);

  test('what is stored afterwards passes the shared schemas and the database checks', async () => {
    const { read } = shop.t.db;
    expect(await read.query('PRAGMA integrity_check')).toEqual([{ integrity_check: 'ok' }]);
    expect(await read.query('PRAGMA foreign_key_check')).toEqual([]);
    expect(await ledgerMismatches(shop.t)).toEqual([]);
    const invalid: string[] = [];
    const recheck = async (what: string, schema: AnySchema, value: unknown) => {
      await schema.validate(value, { abortEarly: false }).catch((err: Error) => invalid.push(`${what}: ${err.message}`));
    };
    for (const entity of [Bike, BikeModel]) {
      for (const row of await read.getRepository(entity).find()) await recheck(`${entity.name} ${row.id}`, bikeSpecSchema, { masses: row.masses, front: row.front, rear: row.rear });
    }
    for (const { id, onHand: _onHand, reserved: _reserved, active: _active, ...spring } of await read.getRepository(SpringRate).find()) {
      await recheck(`spring ${id}`, springCreateSchema, spring);
    }
    for (const profile of await read.getRepository(RiderProfile).find()) {
      if (profile.weighIn) await recheck(`weigh-in of user ${profile.userId}`, weighInSchema, profile.weighIn);
    }
    for (const settings of await read.getRepository(ShopSettings).find()) await recheck('shop settings', shopSettingsSchema, settings);
    const roles: { role: string }[] = await read.query('SELECT DISTINCT role FROM user');
    expect(roles.filter((r) => !(ROLES as readonly string[]).includes(r.role))).toEqual([]);
    expect(invalid).toEqual([]);
  });
});

describe('over both parts', () => {
  test('no request got a 5xx', () => {
    expect(fiveHundreds).toEqual([]);
  });

  test('every route that takes a body answered a 400 with field errors at least once', () => {
    const bodyRoutes = shop.routes.filter(takesJsonBody).map(routeKey);
    expect(bodyRoutes.filter((key) => !fieldErrorsSeen.has(key))).toEqual([]);
  });

  test('the server still answers', async () => {
    const res = await request(shop.base).get('/api/health').expect(200);
    expect(res.body).toEqual(expect.objectContaining({ ok: true }));
  });
});
