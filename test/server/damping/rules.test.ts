/**
 * The symptom-to-change table over HTTP: seeded with the common-practice rows of
 * shared/damping/seeded-rules.ts, read and added to by the desk and the admin (an added row is the
 * shop's own), edited by the admin alone, every write audited in its own transaction, and bad
 * rows refused with a message per field. Expected values come from the seed file and the rules of
 * the feature (common practice, no source); 403 for a role the route does not allow and 409 for
 * a conflict with stored state follow RFC 9110 §15.5.4 and §15.5.10.
 */
import { AuditEntry } from '../../../server/entities/audit-entry.entity';
import { DampingRule } from '../../../server/entities/damping-rule.entity';
import { seed } from '../../../server/seed';
import { SEEDED_DAMPING_RULES } from '../../../shared/damping/seeded-rules';
import type { DampingRuleView } from '../../../shared/types/test-ride';
import { makeTestContext, TestContext } from '../test-context';
import { LoopShop, setUpLoopShop } from './helpers';

let t: TestContext;
let shop: LoopShop;

beforeAll(async () => {
  t = await makeTestContext();
  shop = await setUpLoopShop(t);
});
afterAll(() => t.dispose());

const SHOP_ROW = {
  symptom: 'harsh-small-bumps',
  end: 'rear',
  adjuster: 'ls-compression',
  direction: 'less',
  priority: 3,
  why: 'Our shop finds the low-speed side of this shock too firm out of the box.',
  feelFor: 'Small bumps at low speed should feel rounded off.',
};

const auditRows = () => t.db.read.getRepository(AuditEntry).find({ where: { entity: 'damping-rule' }, order: { id: 'ASC' } });

describe('reading the table', () => {
  test('the seeded rows are there once, common practice, active, with words and labels', async () => {
    const res = await shop.asDesk.get('/damping-rules').expect(200);
    const rules: DampingRuleView[] = res.body.rules;
    expect(rules).toHaveLength(SEEDED_DAMPING_RULES.length);
    expect(rules.every((rule) => rule.source === 'common-practice' && rule.active && rule.createdById === null)).toBe(true);
    const bounce = rules.find((rule) => rule.symptom === 'bounces-after-bump' && rule.end === 'front' && rule.priority === 1)!;
    expect(bounce).toEqual(expect.objectContaining({ adjuster: 'rebound', direction: 'more', symptomWords: 'Keeps bouncing after a bump', adjusterLabel: 'Rebound', claim: 'less-overshoot' }));
    // A restart seeds nothing twice: the part is recorded once it has run.
    expect(await seed(t.db, { demo: false })).toEqual([]);
    expect(await t.db.read.getRepository(DampingRule).count()).toBe(SEEDED_DAMPING_RULES.length);
  });

  test('the admin reads it too; a rider and the counter are refused', async () => {
    await shop.asAdmin.get('/damping-rules').expect(200);
    await shop.asRider.get('/damping-rules').expect(403);
    await shop.asCounter.get('/damping-rules').expect(403);
  });
});

describe('adding a row', () => {
  test("the desk's row is the shop's own, by the desk, and audited as created", async () => {
    const before = (await auditRows()).length;
    const res = await shop.asDesk.post('/damping-rules', { ...SHOP_ROW, source: 'common-practice', active: false }).expect(201);
    const rule: DampingRuleView = res.body.rule;
    expect(rule).toEqual(expect.objectContaining({ ...SHOP_ROW, source: 'shop', active: true, claim: null, createdById: shop.desk.id, adjusterLabel: 'Low-speed compression' }));
    const audit = (await auditRows()).slice(before);
    expect(audit).toHaveLength(1);
    expect(audit[0]).toEqual(expect.objectContaining({ actorId: shop.desk.id, entityKey: String(rule.id), action: 'create', before: null }));
    expect(audit[0].after).toEqual(expect.objectContaining({ ...SHOP_ROW, id: rule.id, source: 'shop', active: true, createdById: shop.desk.id }));
  });

  test("the admin's row is the shop's own too", async () => {
    const res = await shop.asAdmin.post('/damping-rules', { ...SHOP_ROW, end: 'front', claim: 'softer-on-sharp-bumps' }).expect(201);
    expect(res.body.rule).toEqual(expect.objectContaining({ source: 'shop', createdById: shop.admin.id, claim: 'softer-on-sharp-bumps' }));
  });

  test('a rider and the counter cannot add rows', async () => {
    await shop.asRider.post('/damping-rules', SHOP_ROW).expect(403);
    await shop.asCounter.post('/damping-rules', SHOP_ROW).expect(403);
  });

  test.each([
    ['an adjuster kind not on the list', { adjuster: 'mid-valve' }, 'adjuster', /not on the shop’s list/],
    ['an adjuster that is not a kind key', { adjuster: 'Mid Valve!' }, 'adjuster', /lower-case letters/],
    ['an unknown symptom', { symptom: 'wobbles' }, 'symptom', /Choose a symptom/],
    ['an unknown direction', { direction: 'harder' }, 'direction', /more \(turn in\) or less \(turn out\)/],
    ['an unknown end', { end: 'middle' }, 'end', /front or rear/],
    ['a symptom the end cannot have', { symptom: 'dives-braking', end: 'rear' }, 'symptom', /at the front only, not the rear/],
    ['a priority out of range', { priority: 0 }, 'priority', /between 1 and 99/],
    ['an empty why', { why: '   ' }, 'why', /why this change helps/],
    ['an unknown claim', { claim: 'faster' }, 'claim', /The claim must be one of/],
  ])('%s is a 400 naming the field, and nothing is written', async (_label, change, field, message) => {
    const [rows, audits] = [await t.db.read.getRepository(DampingRule).count(), (await auditRows()).length];
    const res = await shop.asDesk.post('/damping-rules', { ...SHOP_ROW, ...change }).expect(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect(await t.db.read.getRepository(DampingRule).count()).toBe(rows);
    expect(await auditRows()).toHaveLength(audits);
  });

  test('a second active row for the same move is a 409 that points at the first', async () => {
    const res = await shop.asDesk.post('/damping-rules', { ...SHOP_ROW, symptom: 'bounces-after-bump', end: 'front', adjuster: 'rebound', direction: 'more' }).expect(409);
    expect(res.body.error.code).toBe('rule-exists');
    expect(res.body.error.fields.adjuster).toMatch(/^Rule \d+ already turns the front rebound in/);
  });
});

describe('editing a row', () => {
  let rule: DampingRuleView;

  beforeAll(async () => {
    rule = (await shop.asDesk.get('/damping-rules').expect(200)).body.rules.find((r: DampingRuleView) => r.symptom === 'kicks-after-dip' && r.end === 'rear' && r.priority === 1);
  });

  test('only the admin edits; the desk is refused even for its own rows', async () => {
    await shop.asDesk.patch(`/damping-rules/${rule.id}`, { active: false }).expect(403);
    await shop.asRider.patch(`/damping-rules/${rule.id}`, { active: false }).expect(403);
  });

  test('switching a row off is audited with before and after, and the loop stops using it', async () => {
    const before = (await auditRows()).length;
    const res = await shop.asAdmin.patch(`/damping-rules/${rule.id}`, { active: false, priority: 5 }).expect(200);
    expect(res.body.rule).toEqual(expect.objectContaining({ id: rule.id, active: false, priority: 5, source: 'common-practice' }));
    const [audit] = (await auditRows()).slice(before);
    expect(audit).toEqual(expect.objectContaining({ actorId: shop.admin.id, entityKey: String(rule.id), action: 'update' }));
    expect([audit.before, audit.after]).toEqual([expect.objectContaining({ active: true, priority: 1 }), expect.objectContaining({ active: false, priority: 5 })]);

    // kicks-after-dip at the rear: rebound (now off), then ls-rebound, which the fixture shock lacks.
    const ride = await shop.asRider.post(`/bikes/${shop.bikeId}/test-rides`, { end: 'rear', symptom: 'kicks-after-dip', strength: 'clear' }).expect(201);
    expect(ride.body.ride.proposal).toEqual({ kind: 'none', reason: expect.stringMatching(/has none of the adjusters the table names/) });

    await shop.asAdmin.patch(`/damping-rules/${rule.id}`, { active: true, priority: 1 }).expect(200);
  });

  test('a patch that changes nothing writes nothing', async () => {
    const before = (await auditRows()).length;
    await shop.asAdmin.patch(`/damping-rules/${rule.id}`, {}).expect(200);
    await shop.asAdmin.patch(`/damping-rules/${rule.id}`, { priority: 1, direction: 'more' }).expect(200);
    expect(await auditRows()).toHaveLength(before);
  });

  test.each([
    ['a symptom the row’s end cannot have', { symptom: 'squats-throttle' }, 'symptom', /at the rear only, not the front/, 'front'],
    ['an end the row’s symptom cannot have', { end: 'front' }, 'end', /at the rear only, not the front/, 'rear'],
    ['an adjuster kind not on the list', { adjuster: 'mid-valve' }, 'adjuster', /not on the shop’s list/, 'rear'],
    ['active that is not true or false', { active: 'yes' }, 'active', /true or false/, 'rear'],
  ])('%s is a 400 naming the field, and nothing is written', async (_label, change, field, message, end) => {
    const target: DampingRuleView = (await shop.asAdmin.get('/damping-rules').expect(200)).body.rules.find(
      (r: DampingRuleView) => r.symptom === (end === 'rear' ? 'squats-throttle' : 'bounces-after-bump') && r.end === end,
    );
    const before = (await auditRows()).length;
    const res = await shop.asAdmin.patch(`/damping-rules/${target.id}`, change).expect(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect(await auditRows()).toHaveLength(before);
  });

  test('an unknown rule is a 404', async () => {
    await shop.asAdmin.patch('/damping-rules/999999', { active: false }).expect(404);
  });
});
