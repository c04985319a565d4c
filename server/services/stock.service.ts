/**
 * The stock ledger. Every change to a spring's onHand or reserved is one stock_movement row written
 * in the same transaction that changes the spring, so both always equal the sums of the movements.
 * Reserved units belong to a hold (stock_hold): a quote's, made by its acceptance, or one made by
 * name at the counter. A spring's reserved is the sum of its open holds, and every reserve, release
 * or fit of held units names the hold it moved, so nobody releases what another holds. Each method
 * takes the caller's transaction (`db.write`'s manager), so the service desk's quote flows hold,
 * release and fit through this same code inside their own writes. Each refuses what would leave
 * stock negative or more reserved than on hand, with a ConflictError that says why.
 */
import { EntityManager, In } from 'typeorm';
import { MAX_STOCK_QUANTITY } from '../../shared/schemas/catalogue.schema';
import type { HoldStatus, MovementKind, MovementPage, StockHoldView, StockMovementView } from '../../shared/types/catalogue';
import type { AppContext } from '../app-context';
import { Quote } from '../entities/quote.entity';
import { SpringRate } from '../entities/spring-rate.entity';
import { StockHold } from '../entities/stock-hold.entity';
import { StockMovement } from '../entities/stock-movement.entity';
import { User } from '../entities/user.entity';
import { ConflictError, NotFoundError } from '../errors';

export interface MovementRequest {
  springId: number;
  quantity: number;
  /** Who did it; null only for stock the system records itself. */
  userId: number | null;
  reason: string;
}

/** Who a new hold is for: a quote (only its acceptance makes one) or a name given at the counter. */
export type HolderInput = { kind: 'quote'; quoteId: number } | { kind: 'manual'; name: string };

export interface HoldRequest extends MovementRequest {
  holder: HolderInput;
}

/** Names the hold a release takes from; all it holds unless a quantity is given. */
export interface ReleaseRequest {
  springId: number;
  holdId: number;
  quantity?: number;
  userId: number | null;
  reason: string;
}

/** What a quote's flow does to all it holds: who and why, for the movements. */
export interface QuoteHoldsRequest {
  quoteId: number;
  userId: number | null;
  reason: string;
}

export interface CountRequest {
  springId: number;
  /** What is on the shelf now; the movement is the difference. */
  counted: number;
  userId: number | null;
  reason: string;
}

export interface FitRequest extends MovementRequest {
  /** The counter's hold the units come from; without one they come from what is available. */
  holdId?: number;
}

export interface MovementResult {
  spring: SpringRate;
  movement: StockMovement;
  /** The hold the movement moved, as it now stands. */
  hold?: StockHold;
}

/** A movement's who, why and what for. */
interface MovementMeta {
  userId: number | null;
  reason: string;
  quoteId?: number | null;
  holdId?: number | null;
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
          `${spring.reserved} of ${spring.sku} are held, more than the ${request.counted} counted: release holds first, or count again.`,
          'below-reserved',
        );
      }
      return { onHand: request.counted - spring.onHand, reserved: 0 };
    });
  }

  /** Holds units for a quote or a name: a hold row and the reserve movement that names it. */
  async reserve(manager: EntityManager, request: HoldRequest): Promise<MovementResult & { hold: StockHold }> {
    const spring = await this.load(manager, request.springId);
    if (!spring.active) throw new ConflictError(`${spring.sku} is no longer in the catalogue; choose another spring.`, 'inactive');
    const available = spring.onHand - spring.reserved;
    if (request.quantity > available) {
      throw new ConflictError(`Only ${available} of ${spring.sku} available (${describe(spring)}): ${request.quantity} cannot be reserved.`, 'out-of-stock');
    }
    const { holder } = request;
    const hold = await manager.save(
      manager.create(StockHold, {
        springId: spring.id,
        kind: holder.kind,
        quoteId: holder.kind === 'quote' ? holder.quoteId : null,
        name: holder.kind === 'manual' ? holder.name : null,
        reason: request.reason,
        heldQuantity: request.quantity,
        quantity: request.quantity,
        status: 'open',
        createdById: request.userId,
        createdAt: this.ctx.now(),
        closedById: null,
        closedAt: null,
      }),
    );
    const moved = await this.write(manager, spring, 'reserve', { onHand: 0, reserved: request.quantity }, { ...request, quoteId: hold.quoteId, holdId: hold.id });
    return { ...moved, hold };
  }

  /** Releases a hold made at the counter; a quote's hold goes only with its quote, or by `overrideQuoteHold`. */
  async release(manager: EntityManager, request: ReleaseRequest): Promise<MovementResult> {
    const hold = await this.openHold(manager, request.springId, request.holdId);
    if (hold.kind === 'quote') throw await heldByQuote(manager, hold);
    return this.releaseHold(manager, hold, request.quantity ?? hold.quantity, request);
  }

  /**
   * The counter's override: releases all a quote's hold on this spring. The caller moves the quote
   * (QuotesService.releaseOverQuote), in the same transaction.
   */
  async overrideQuoteHold(manager: EntityManager, request: Omit<ReleaseRequest, 'quantity'>): Promise<MovementResult & { hold: StockHold }> {
    const hold = await this.openHold(manager, request.springId, request.holdId);
    if (hold.kind !== 'quote') {
      throw new ConflictError(`Hold #${hold.id} was made at the counter, for ${hold.name}: release it as usual.`, 'not-a-quote-hold');
    }
    const released = await this.releaseHold(manager, hold, hold.quantity, request);
    return { ...released, hold: released.hold! };
  }

  /** Releases everything a quote holds (its cancel or expiry). */
  async releaseQuoteHolds(manager: EntityManager, request: QuoteHoldsRequest): Promise<void> {
    for (const hold of await this.quoteHolds(manager, request.quoteId)) await this.releaseHold(manager, hold, hold.quantity, request);
  }

  /** Springs leave the shop on a bike: from a hold made at the counter, or from what is available. */
  async fit(manager: EntityManager, request: FitRequest): Promise<MovementResult> {
    if (request.holdId === undefined) {
      return this.apply(manager, request.springId, 'fit', request, (spring) => {
        const available = spring.onHand - spring.reserved;
        if (request.quantity > available) {
          throw new ConflictError(`Only ${available} of ${spring.sku} available (${describe(spring)}): ${request.quantity} cannot be fitted.`, 'out-of-stock');
        }
        return { onHand: -request.quantity, reserved: 0 };
      });
    }
    const hold = await this.openHold(manager, request.springId, request.holdId);
    if (hold.kind === 'quote') throw await heldByQuote(manager, hold);
    return this.fitFromHold(manager, hold, request.quantity, request);
  }

  /** Fits everything a quote holds (the quote marked fitted). */
  async fitQuoteHolds(manager: EntityManager, request: QuoteHoldsRequest): Promise<void> {
    for (const hold of await this.quoteHolds(manager, request.quoteId)) await this.fitFromHold(manager, hold, hold.quantity, request);
  }

  /** A spring's open holds, oldest first, with who holds them. */
  async holdsOf(manager: EntityManager, springId: number): Promise<StockHoldView[]> {
    await this.load(manager, springId);
    return toHoldViews(manager, await manager.find(StockHold, { where: { springId, status: 'open' }, order: { id: 'ASC' } }));
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

  private quoteHolds(manager: EntityManager, quoteId: number): Promise<StockHold[]> {
    return manager.find(StockHold, { where: { quoteId, status: 'open' }, order: { id: 'ASC' } });
  }

  private async load(manager: EntityManager, springId: number): Promise<SpringRate> {
    const spring = await manager.findOneBy(SpringRate, { id: springId });
    if (!spring) throw new NotFoundError('There is no such spring in the catalogue.');
    return spring;
  }

  /** A hold of this spring that still holds something; one of another spring is not found here. */
  private async openHold(manager: EntityManager, springId: number, holdId: number): Promise<StockHold> {
    const hold = await manager.findOneBy(StockHold, { id: holdId, springId });
    if (!hold) throw new NotFoundError('This spring has no such hold.');
    if (hold.status !== 'open') throw new ConflictError(`Hold #${hold.id} holds nothing any more: it was ${hold.status}.`, 'hold-closed');
    return hold;
  }

  private async releaseHold(manager: EntityManager, hold: StockHold, quantity: number, meta: MovementMeta): Promise<MovementResult> {
    if (quantity > hold.quantity) {
      throw new ConflictError(`Hold #${hold.id} holds only ${hold.quantity}: ${quantity} cannot be released.`, 'not-reserved');
    }
    const spring = await this.load(manager, hold.springId);
    const moved = await this.write(manager, spring, 'release', { onHand: 0, reserved: -quantity }, { ...meta, quoteId: hold.quoteId, holdId: hold.id });
    return { ...moved, hold: await this.takeFromHold(manager, hold, quantity, 'released', meta.userId) };
  }

  private async fitFromHold(manager: EntityManager, hold: StockHold, quantity: number, meta: MovementMeta): Promise<MovementResult> {
    if (quantity > hold.quantity) {
      throw new ConflictError(`Hold #${hold.id} holds only ${hold.quantity}: fit ${hold.quantity} from it, or the rest from what is available.`, 'not-reserved');
    }
    const spring = await this.load(manager, hold.springId);
    const moved = await this.write(manager, spring, 'fit', { onHand: -quantity, reserved: -quantity }, { ...meta, quoteId: hold.quoteId, holdId: hold.id });
    return { ...moved, hold: await this.takeFromHold(manager, hold, quantity, 'fitted', meta.userId) };
  }

  /** Takes units off a hold, closing it as `closeAs` when none are left; guarded like the spring's update. */
  private async takeFromHold(manager: EntityManager, hold: StockHold, quantity: number, closeAs: Exclude<HoldStatus, 'open'>, userId: number | null): Promise<StockHold> {
    const left = hold.quantity - quantity;
    const closing = left === 0;
    const after = { quantity: left, status: closing ? closeAs : 'open', closedAt: closing ? this.ctx.now() : null, closedById: closing ? userId : null } as const;
    const changed = await manager.update(StockHold, { id: hold.id, quantity: hold.quantity, status: 'open' }, after);
    if (changed.affected !== 1) throw new ConflictError(`Hold #${hold.id} changed meanwhile; try again.`, 'stock-changed');
    return Object.assign(hold, after);
  }

  private async apply(
    manager: EntityManager,
    springId: number,
    kind: MovementKind,
    meta: MovementMeta,
    deltasFor: (spring: SpringRate) => { onHand: number; reserved: number },
  ): Promise<MovementResult> {
    const spring = await this.load(manager, springId);
    return this.write(manager, spring, kind, deltasFor(spring), meta);
  }

  /** Changes the spring by `delta` and writes the movement that says so. */
  private async write(manager: EntityManager, spring: SpringRate, kind: MovementKind, delta: { onHand: number; reserved: number }, meta: MovementMeta): Promise<MovementResult> {
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
        userId: meta.userId,
        at: this.ctx.now(),
        reason: meta.reason,
        quoteId: meta.quoteId ?? null,
        importBatchId: null,
        holdId: meta.holdId ?? null,
      }),
    );
    this.ctx.sizingData.invalidate();
    return { spring: { ...spring, ...after }, movement };
  }
}

/** The refusal for a quote's hold taken at the counter: it names the quote and the way that is open. */
async function heldByQuote(manager: EntityManager, hold: StockHold): Promise<ConflictError> {
  const quote = await manager.findOneByOrFail(Quote, { id: hold.quoteId! });
  return new ConflictError(
    `Hold #${hold.id} is quote ${quote.number} v${quote.version}'s (${quote.status}): it goes when the quote is cancelled, expires or is fitted. ` +
      'To take the springs all the same, release them over the quote: the desk and the customer will see that the quote lost its springs.',
    'held-by-quote',
  );
}

export async function toHoldViews(manager: EntityManager, holds: StockHold[]): Promise<StockHoldView[]> {
  const quoteIds = [...new Set(holds.map((h) => h.quoteId).filter((id): id is number => id !== null))];
  const quotes = quoteIds.length ? await manager.find(Quote, { select: { id: true, number: true, version: true, status: true, riderId: true }, where: { id: In(quoteIds) } }) : [];
  const userIds = [...new Set([...holds.map((h) => h.createdById), ...quotes.map((q) => q.riderId)].filter((id): id is number => id !== null))];
  const users = userIds.length ? await manager.find(User, { select: { id: true, name: true }, where: { id: In(userIds) } }) : [];
  const quoteById = new Map(quotes.map((q) => [q.id, q]));
  const userById = new Map(users.map((u) => [u.id, { id: u.id, name: u.name }]));
  return holds.map((hold) => {
    const quote = hold.quoteId === null ? undefined : quoteById.get(hold.quoteId);
    return {
      id: hold.id,
      springId: hold.springId,
      holder: quote
        ? { kind: 'quote', quoteId: quote.id, number: quote.number, version: quote.version, status: quote.status, riderName: userById.get(quote.riderId)?.name ?? '' }
        : { kind: 'manual', name: hold.name ?? '' },
      quantity: hold.quantity,
      heldQuantity: hold.heldQuantity,
      status: hold.status,
      reason: hold.reason,
      createdAt: hold.createdAt.toISOString(),
      createdBy: hold.createdById === null ? null : (userById.get(hold.createdById) ?? null),
    };
  });
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
    holdId: row.holdId,
  }));
}
