/** Springs, accounts and CSV uploads for the catalogue tests, made through the real services. */
import request from 'supertest';
import type { SpringCreateInput } from '../../../shared/schemas/catalogue.schema';
import { Role, ROLES } from '../../../shared/types/roles';
import { SpringRate } from '../../../server/entities/spring-rate.entity';
import { StockMovement } from '../../../server/entities/stock-movement.entity';
import { User } from '../../../server/entities/user.entity';
import { CatalogueImportService } from '../../../server/services/catalogue-import.service';
import { CatalogueService } from '../../../server/services/catalogue.service';
import { StockService, writeCatalogue } from '../../../server/services/stock.service';
import { bearer, createAccount } from '../auth/helpers';
import { TestContext } from '../test-context';

let serial = 0;

export function springInput(overrides: Partial<SpringCreateInput> = {}): SpringCreateInput {
  serial += 1;
  return {
    sku: `T-${String(serial).padStart(5, '0')}`,
    kind: 'shock',
    family: 'S56x150',
    rateNmm: 90,
    secondRateNmm: null,
    breakMm: null,
    freeLengthMm: 150,
    innerDiameterMm: 56,
    outerDiameterMm: 80,
    wireDiameterMm: 12,
    maxDeflectionMm: 68,
    supplier: 'Test Coil Supply',
    supplierCode: `TC-${serial}`,
    costCents: 7000,
    priceCents: 13000,
    bin: 'T-01',
    reorderPoint: 1,
    ...overrides,
  } as SpringCreateInput;
}

/** A spring with `onHand` received through the stock service, as a delivery would be. */
export async function createSpring(t: TestContext, overrides: Partial<SpringCreateInput> = {}, onHand = 0): Promise<SpringRate> {
  const spring = await new CatalogueService(t).create(springInput(overrides));
  if (onHand > 0) {
    await writeCatalogue(t, (m) => new StockService(t).receive(m, { springId: spring.id, quantity: onHand, userId: null, reason: 'Test delivery' }));
  }
  return (await t.db.read.getRepository(SpringRate).findOneByOrFail({ id: spring.id }))!;
}

export type Tokens = Record<Role, string>;

export async function accountsByRole(t: TestContext): Promise<{ users: Record<Role, User>; tokens: Tokens }> {
  const users = {} as Record<Role, User>;
  const tokens = {} as Tokens;
  for (const role of ROLES) {
    users[role] = await createAccount(t, role);
    tokens[role] = await bearer(t, users[role]);
  }
  return { users, tokens };
}

/** onHand and reserved of every spring against the sums of its movements; empty when they agree. */
export async function ledgerMismatches(t: TestContext): Promise<string[]> {
  const sums: { springId: number; onHand: number; reserved: number }[] = await t.db.read
    .getRepository(StockMovement)
    .createQueryBuilder('m')
    .select('m.springId', 'springId')
    .addSelect('SUM(m.onHandDelta)', 'onHand')
    .addSelect('SUM(m.reservedDelta)', 'reserved')
    .groupBy('m.springId')
    .getRawMany();
  const bySpring = new Map(sums.map((s) => [Number(s.springId), s]));
  const wrong: string[] = [];
  for (const spring of await t.db.read.getRepository(SpringRate).find()) {
    const sum = bySpring.get(spring.id) ?? { onHand: 0, reserved: 0 };
    if (spring.onHand !== Number(sum.onHand) || spring.reserved !== Number(sum.reserved)) {
      wrong.push(`${spring.sku}: ${spring.onHand}/${spring.reserved} on the spring, ${sum.onHand}/${sum.reserved} in the movements`);
    }
    if (spring.onHand < 0 || spring.reserved < 0 || spring.reserved > spring.onHand) wrong.push(`${spring.sku}: ${spring.onHand} on hand, ${spring.reserved} reserved`);
  }
  return wrong;
}

export function dryRun(t: TestContext, token: string, csv: string | Buffer, fileName = 'springs.csv', fields: Record<string, string> = {}) {
  const req = request(t.app).post('/api/imports/dry-run').set('Authorization', token);
  for (const [name, value] of Object.entries(fields)) req.field(name, value);
  return req.attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), { filename: fileName, contentType: 'text/csv' });
}

export function confirmImport(t: TestContext, token: string, csv: string | Buffer, importToken: string, fileName = 'springs.csv', fields: Record<string, string> = {}) {
  const req = request(t.app).post('/api/imports').set('Authorization', token).field('token', importToken);
  for (const [name, value] of Object.entries(fields)) req.field(name, value);
  return req.attach('file', Buffer.isBuffer(csv) ? csv : Buffer.from(csv), { filename: fileName, contentType: 'text/csv' });
}

/** Real values for the matrix's parameterised catalogue routes: a spring in stock and one import batch. */
export async function prepareCatalogueFixtures(t: TestContext, userId: number): Promise<{ springId: string; batchId: string }> {
  const spring = await createSpring(t, {}, 3);
  const imports = new CatalogueImportService(t);
  const upload = { buffer: Buffer.from(`sku,bin\n${spring.sku},M-01\n`), fileName: 'matrix.csv' };
  const { token } = await imports.dryRun(upload, 'N/mm');
  const { batch } = await imports.confirm(upload, 'N/mm', token!, userId);
  return { springId: String(spring.id), batchId: String(batch.id) };
}
