/**
 * The stock ledger. Every change to a spring's onHand or reserved is one stock_movement row written
 * in the same transaction that changes the spring, so both always equal the sums of the movements.
 * Each method takes the caller's transaction (`db.write`'s manager), so the service desk's quote
 * flows reserve, release and fit through this same code inside their own writes. Each refuses what
 * would leave stock negative or more reserved than on hand, with a ConflictError that says why.
 */
import { EntityManager, In } from 'typeorm';
import { MAX_STOCK_QUANTITY } from '../../shared/schemas/catalogue.schema';
import type { MovementKind, MovementPage, StockMovementView } from '../../shared/types/catalogue';
import { AppContext } from '../context';
import { SpringRate } from '../entities/spring-rate.entity';
import { StockMovement } from '../entities/stock-movement.entity';
import { User } from '../entities/user.entity';
import { ConflictError, NotFoundError } from '../errors';

export interface MovementRequest {
  springId: number;
  quantity: number;
  /** Who did it; null only for stock the system records itself. */
  userId: number | null;
  reason: string;
  quoteId?: number | null;
}

export interface CountRequest {
  springId: number;
  /** What is on the shelf now; the movement is the difference. */
  counted: number;
  userId: number | null;
  reason: string;
}

export interface FitRequest extends MovementRequest {
  /** Consume units reserved before (the quote's, the default), or take them from what is available. */
  fromReserved?: boolean;
}

export interface MovementResult {
  spring: SpringRate;
  movement: StockMovement;
}

/** A count correction worked out in bulk (the CSV import): the spring's on-hand from `from` to `to`. */
export interface BulkCorrection {
  springId: number;
  from: number;
  to: number;
  reserved: number;
}

export interface MovementFilter {
  springId?: number;
  kind?: MovementKind;
  importBatchId?: number;
  quoteId?: number;
  from?: string;
  to?: string;
}

/** SQLite binds at most 32,766 parameters per statement; chunks stay well below. */
const CHUNK_PARAMETERS = 30_000;

/** As TypeORM stores a datetime in SQLite: UTC, 'YYYY-MM-DD HH:MM:SS.SSS'. */
export function toSqliteDatetime(date: Date): string {
  return date.toISOString().replace('T', ' ').replace('Z', '');
}

export function chunk<T>(items: readonly T[], size: number): T[][] {
  const chunks: T[][] = [];
  for (let i = 0; i < items.length; i += size) chunks.push(items.slice(i, i + size));
  return chunks;
}

function describe(spring: SpringRate): string {
  return `${spring.onHand} on hand, ${spring.reserved} reserved`;
}

/**
 * `db.write` for anything that changes springs or stock. The writes themselves invalidate the sizing
 * cache inside the transaction (the house rule); it is dropped once more after the commit, because
 * a sizing that ran between that invalidation and the commit read, and cached, the old stock.
 */
export async function writeCatalogue<T>(ctx: Pick<AppContext, 'db' | 'sizingData'>, fn: (manager: EntityManager) => Promise<T>): Promise<T> {
  try {
    return await ctx.db.write(fn);
  } finally {
    ctx.sizingData.invalidate();
  }
}

export class StockService {
  constructor(private readonly ctx: Pick<AppContext, 'now' | 'sizingData'>) {}

  receive(manager: EntityManager, request: MovementRequest): Promise<MovementResult> {
    return this.apply(manager, request.springId, 'receive', request, (spring) => {
      if (spring.onHand + request.quantity > MAX_STOCK_QUANTITY) {
        throw new ConflictError(`${spring.sku} would hold more than ${MAX_STOCK_QUANTITY} on hand; check the quantity.`, 'too-many');
      }
      return { onHand: request.quantity, reserved: 0 };
    });
  }

  /** A stock count: records the difference between the books and the shelf, even none, so the count itself is on record. */
  correct(manager: EntityManager, request: CountRequest): Promise<MovementResult> {
    return this.apply(manager, request.springId, 'correction', request, (spring) => {
      if (request.counted < spring.reserved) {
        throw new ConflictError(
          `${spring.reserved} of ${spring.sku} are reserved for quotes, more than the ${request.counted} counted: release those reservations first, or count again.`,
          'below-reserved',
        );
      }
      return { onHand: request.counted - spring.onHand, reserved: 0 };
    });
  }

  reserve(manager: EntityManager, request: MovementRequest): Promise<MovementResult> {
    return this.apply(manager, request.springId, 'reserve', request, (spring) => {
      if (!spring.active) throw new ConflictError(`${spring.sku} is no longer in the catalogue; choose another spring.`, 'inactive');
      const available = spring.onHand - spring.reserved;
      if (request.quantity > available) {
        throw new ConflictError(
          `Only ${available} of ${spring.sku} available (${describe(spring)}): ${request.quantity} cannot be reserved.`,
          'out-of-stock',
        );
      }
      return { onHand: 0, reserved: request.quantity };
    });
  }

  release(manager: EntityManager, request: MovementRequest): Promise<MovementResult> {
    return this.apply(manager, request.springId, 'release', request, (spring) => {
      if (request.quantity > spring.reserved) {
        throw new ConflictError(`Only ${spring.reserved} of ${spring.sku} are reserved: ${request.quantity} cannot be released.`, 'not-reserved');
      }
      return { onHand: 0, reserved: -request.quantity };
    });
  }

  /** Springs leave the shop on a bike. */
  fit(manager: EntityManager, request: FitRequest): Promise<MovementResult> {
    const fromReserved = request.fromReserved ?? true;
    return this.apply(manager, request.springId, 'fit', request, (spring) => {
      if (fromReserved && request.quantity > spring.reserved) {
        throw new ConflictError(
          `Only ${spring.reserved} of ${spring.sku} are reserved: reserve them before fitting ${request.quantity}, or fit from what is available.`,
          'not-reserved',
        );
      }
      const available = spring.onHand - spring.reserved;
      if (!fromReserved && request.quantity > available) {
        throw new ConflictError(`Only ${available} of ${spring.sku} available (${describe(spring)}): ${request.quantity} cannot be fitted.`, 'out-of-stock');
      }
      return { onHand: -request.quantity, reserved: fromReserved ? -request.quantity : 0 };
    });
  }

  /**
   * Writes many count corrections of one import at once: one UPDATE and one INSERT per chunk, not
   * per spring. Each spring must still hold `from`, or the whole write fails.
   */
  async correctInBulk(
    manager: EntityManager,
    corrections: readonly BulkCorrection[],
    meta: { userId: number | null; reason: string; importBatchId: number },
  ): Promise<void> {
    if (!corrections.length) return;
    const runner = manager.queryRunner;
    if (!runner) throw new Error('correctInBulk needs the manager of a transaction');
    for (const part of chunk(corrections, Math.floor(CHUNK_PARAMETERS / 3))) {
      const values = part.map(() => '(?, ?, ?)').join(', ');
      const result = await runner.query(
        `UPDATE "spring_rate" SET "onHand" = v."onHand"
         FROM (SELECT column1 AS "id", column2 AS "onHand", column3 AS "before" FROM (VALUES ${values})) AS v
         WHERE "spring_rate"."id" = v."id" AND "spring_rate"."onHand" = v."before"`,
        part.flatMap((c) => [c.springId, c.to, c.from]),
        true,
      );
      if (result.affected !== part.length) {
        throw new ConflictError('Stock changed while the import ran: run the dry run again.', 'import-changed');
      }
    }
    const at = toSqliteDatetime(this.ctx.now());
    const columns = ['springId', 'kind', 'onHandDelta', 'reservedDelta', 'onHandAfter', 'reservedAfter', 'userId', 'at', 'reason', 'importBatchId'];
    for (const part of chunk(corrections, Math.floor(CHUNK_PARAMETERS / columns.length))) {
      await runner.query(
        `INSERT INTO "stock_movement" (${columns.map((c) => `"${c}"`).join(', ')}) VALUES ${part.map(() => `(${columns.map(() => '?').join(', ')})`).join(', ')}`,
        part.flatMap((c) => [c.springId, 'correction', c.to - c.from, 0, c.to, c.reserved, meta.userId, at, meta.reason, meta.importBatchId]),
      );
    }
    this.ctx.sizingData.invalidate();
  }

  /** One page of movements, newest first. */
  async list(manager: EntityManager, filter: MovementFilter, page: number, pageSize: number): Promise<MovementPage> {
    const [rows, total] = await this.filtered(manager, filter)
      .orderBy('m.id', 'DESC')
      .skip((page - 1) * pageSize)
      .take(pageSize)
      .getManyAndCount();
    return { movements: await toMovementViews(manager, rows), total, page, pageSize };
  }

  /** Every movement matching the filter, oldest first, a page at a time (for the CSV export). */
  async *each(manager: EntityManager, filter: MovementFilter, pageSize = 2000): AsyncGenerator<StockMovementView> {
    let afterId = 0;
    for (;;) {
      const rows = await this.filtered(manager, filter).andWhere('m.id > :afterId', { afterId }).orderBy('m.id', 'ASC').take(pageSize).getMany();
      if (!rows.length) return;
      yield* await toMovementViews(manager, rows);
      afterId = rows[rows.length - 1].id;
    }
  }

  private filtered(manager: EntityManager, filter: MovementFilter) {
    const query = manager.getRepository(StockMovement).createQueryBuilder('m');
    if (filter.springId) query.andWhere('m.springId = :springId', { springId: filter.springId });
    if (filter.kind) query.andWhere('m.kind = :kind', { kind: filter.kind });
    if (filter.importBatchId) query.andWhere('m.importBatchId = :importBatchId', { importBatchId: filter.importBatchId });
    if (filter.quoteId) query.andWhere('m.quoteId = :quoteId', { quoteId: filter.quoteId });
    if (filter.from) query.andWhere('m.at >= :from', { from: toSqliteDatetime(new Date(filter.from)) });
    if (filter.to) query.andWhere('m.at < :to', { to: toSqliteDatetime(new Date(filter.to)) });
    return query;
  }

  private async apply(
    manager: EntityManager,
    springId: number,
    kind: MovementKind,
    request: { userId: number | null; reason: string; quoteId?: number | null },
    deltasFor: (spring: SpringRate) => { onHand: number; reserved: number },
  ): Promise<MovementResult> {
    const spring = await manager.findOneBy(SpringRate, { id: springId });
    if (!spring) throw new NotFoundError('There is no such spring in the catalogue.');
    const delta = deltasFor(spring);
    const after = { onHand: spring.onHand + delta.onHand, reserved: spring.reserved + delta.reserved };
    if (after.onHand < 0 || after.reserved < 0 || after.reserved > after.onHand) {
      throw new ConflictError(`That would leave ${spring.sku} with ${after.onHand} on hand and ${after.reserved} reserved.`, 'stock-conflict');
    }
    // Guarded by the values just read, so a write that slipped in between fails instead of being overwritten.
    const changed = await manager.update(SpringRate, { id: spring.id, onHand: spring.onHand, reserved: spring.reserved }, after);
    if (changed.affected !== 1) throw new ConflictError(`The stock of ${spring.sku} changed meanwhile; try again.`, 'stock-changed');
    const movement = await manager.save(
      manager.create(StockMovement, {
        springId: spring.id,
        kind,
        onHandDelta: delta.onHand,
        reservedDelta: delta.reserved,
        onHandAfter: after.onHand,
        reservedAfter: after.reserved,
        userId: request.userId,
        at: this.ctx.now(),
        reason: request.reason,
        quoteId: request.quoteId ?? null,
        importBatchId: null,
      }),
    );
    this.ctx.sizingData.invalidate();
    return { spring: { ...spring, ...after }, movement };
  }
}

export async function toMovementViews(manager: EntityManager, rows: StockMovement[]): Promise<StockMovementView[]> {
  const userIds = [...new Set(rows.map((r) => r.userId).filter((id): id is number => id !== null))];
  const springIds = [...new Set(rows.map((r) => r.springId))];
  const [users, springs] = await Promise.all([
    userIds.length ? manager.find(User, { select: { id: true, name: true }, where: { id: In(userIds) } }) : [],
    manager.find(SpringRate, { select: { id: true, sku: true }, where: { id: In(springIds) } }),
  ]);
  const userById = new Map(users.map((u) => [u.id, { id: u.id, name: u.name }]));
  const skuById = new Map(springs.map((s) => [s.id, s.sku]));
  return rows.map((row) => ({
    id: row.id,
    springId: row.springId,
    sku: skuById.get(row.springId) ?? '',
    kind: row.kind,
    onHandDelta: row.onHandDelta,
    reservedDelta: row.reservedDelta,
    onHandAfter: row.onHandAfter,
    reservedAfter: row.reservedAfter,
    at: row.at.toISOString(),
    user: row.userId === null ? null : (userById.get(row.userId) ?? null),
    reason: row.reason,
    quoteId: row.quoteId,
    importBatchId: row.importBatchId,
  }));
}
