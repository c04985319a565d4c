/**
 * The desk's spring-swap quotes: built from a sizing record, priced on the server with the rule
 * of shared/money/quote-totals, moved through their status flow (server/services/quote-rules.ts).
 * Accepting puts the quoted springs on hold for the quote through StockService in the transaction
 * that accepts; cancelling or expiry releases its holds; fitting consumes them and logs the swap on
 * the bike. Only the counter's override takes a hold from a quote, moving it to springs-released.
 */
import { EntityManager, In, LessThan } from 'typeorm';
import { ValidationError as YupValidationError } from 'yup';
import { computeQuoteTotals, depositCents, type TotalLineInput } from '../../shared/money/quote-totals';
import type { QuoteLineInput } from '../../shared/schemas/quote.schema';
import { bikeSpecSchema } from '../../shared/schemas/bike.schema';
import { toFieldErrors } from '../../shared/schemas/field-errors';
import { applySetupChange, settingsOf } from '../../shared/setup/settings';
import type { QuotePage, QuoteStatus, QuoteView, SpringOption } from '../../shared/types/quote';
import type { SetupChangeInput } from '../../shared/types/setup-log';
import type { CandidateResult, EndKind, SpringOffer } from '../../shared/types/sizing';
import type { AppContext } from '../app-context';
import { pauseForFault } from '../db/fault-pause';
import { Bike } from '../entities/bike.entity';
import { QuoteLine } from '../entities/quote-line.entity';
import { QuoteStatusEvent } from '../entities/quote-status-event.entity';
import { Quote } from '../entities/quote.entity';
import { SetupLogEntry } from '../entities/setup-log-entry.entity';
import { ShopSettings } from '../entities/shop-settings.entity';
import { SizingRecord } from '../entities/sizing-record.entity';
import { SpringRate } from '../entities/spring-rate.entity';
import { StockHold } from '../entities/stock-hold.entity';
import { User } from '../entities/user.entity';
import { ConflictError, HttpError, NotFoundError, ValidationError } from '../errors';
import type { AuthUser } from '../types/auth-user';
import { assertOwnerOrStaff, seesAllCustomers } from '../middleware/ownership';
import { specOf } from './bikes.service';
import { newQuoteToken } from './quote-token';
import { assertCanMove, EXPIRES, moveQuote, noteOnQuote, QuoteActor, SYSTEM_ACTOR } from './quote-rules';
import { toQuoteSummaries, toQuoteView } from './quote-view';
import { loadShop, loadShopSettings } from './shop-settings.service';
import { MovementResult, StockService, toSqliteDatetime, writeCatalogue } from './stock.service';

const DAY_MS = 24 * 60 * 60 * 1000;
/** A quote in one of these states answers a rider's second request for the same result. */
const OPEN_FOR_REQUESTS: QuoteStatus[] = ['draft', 'sent', 'accepted', 'deposit-paid', 'booked', 'springs-released'];
const KIND_OF_END: Record<EndKind, 'fork' | 'shock'> = { front: 'fork', rear: 'shock' };
const PART: Record<EndKind, string> = { front: 'fork', rear: 'shock' };

export function actorOf(user: AuthUser): QuoteActor {
  return { kind: seesAllCustomers(user) ? 'staff' : 'rider', id: user.id, name: user.name };
}

export interface QuoteListQuery {
  status?: QuoteStatus;
  riderId?: number;
  q: string;
  page: number;
  pageSize: number;
}

type LinePlan = Omit<QuoteLine, 'id' | 'quoteId'>;

/**
 * The spring the sizing's decision puts forward for an end: the one to fit where it says change,
 * the better option where it says marginal, none where it says keep or check first. The readings
 * screen, the result and its print sheet show the same decision.
 */
function pickFor(record: SizingRecord, end: EndKind): SpringOffer | null {
  return record.result[end]?.decision.pick ?? null;
}

function candidateBySku(record: SizingRecord, end: EndKind, sku: string | null): CandidateResult | null {
  return record.result[end]?.recommendation.candidates.find((c) => c.sku === sku) ?? null;
}

function springCountFor(record: SizingRecord, end: EndKind): number {
  return end === 'front' ? (record.request.front?.springCount ?? 1) : 1;
}

/** The lines a new quote starts with: the recommended springs and the operations that fit them, plus sag set-up. */
function defaultLineInputs(record: SizingRecord, springs: Map<string, SpringRate>, settings: ShopSettings): QuoteLineInput[] {
  const lines: QuoteLineInput[] = [];
  const codes = new Set(settings.operations.map((o) => o.code));
  for (const end of ['front', 'rear'] as const) {
    const pick = pickFor(record, end);
    const spring = pick ? springs.get(pick.sku) : undefined;
    if (!spring) continue;
    lines.push({ kind: 'spring', springId: spring.id, end, quantity: springCountFor(record, end) } as QuoteLineInput);
    const code = end === 'front' ? 'fork-spring-swap' : 'shock-spring-swap';
    if (codes.has(code)) lines.push({ kind: 'labour', operationCode: code, quantity: 1 } as QuoteLineInput);
  }
  if (codes.has('sag-setup')) lines.push({ kind: 'labour', operationCode: 'sag-setup', quantity: 1 } as QuoteLineInput);
  return lines;
}

/** Prices each line from the catalogue and the operation list; a field error per line that cannot be quoted. */
async function planLines(manager: EntityManager, record: SizingRecord, inputs: readonly QuoteLineInput[], rateCentsPerHour: number, settings: ShopSettings): Promise<LinePlan[]> {
  const springIds = inputs.filter((l) => l.kind === 'spring').map((l) => l.springId!);
  const springs = springIds.length ? await manager.findBy(SpringRate, { id: In(springIds) }) : [];
  const springById = new Map(springs.map((s) => [s.id, s]));
  const fields: Record<string, string> = {};
  const plans: LinePlan[] = [];
  inputs.forEach((input, index) => {
    const at = `lines[${index}]`;
    if (input.kind === 'spring') {
      const end = input.end as EndKind;
      const spring = springById.get(input.springId!);
      const family = record.request[end]?.family;
      if (!record.request[end]) fields[`${at}.end`] = `The sizing has no ${PART[end]}: quote springs only for an end it measured.`;
      else if (!spring) fields[`${at}.springId`] = 'There is no such spring in the catalogue.';
      else if (!spring.active) fields[`${at}.springId`] = `${spring.sku} is no longer in the catalogue; choose another spring.`;
      else if (spring.kind !== KIND_OF_END[end]) fields[`${at}.springId`] = `${spring.sku} is a ${spring.kind} spring, not a ${PART[end]} spring.`;
      else if (spring.family !== family) fields[`${at}.springId`] = `${spring.sku} is of the ${spring.family} fit; this ${PART[end]} takes ${family}.`;
      else if (spring.priceCents === null) fields[`${at}.springId`] = `${spring.sku} has no sale price yet; ask the parts counter to set one.`;
      else {
        plans.push({
          position: index,
          kind: 'spring',
          end,
          springId: spring.id,
          sku: spring.sku,
          operationCode: null,
          description: `${PART[end][0].toUpperCase()}${PART[end].slice(1)} spring ${spring.sku}, ${spring.rateNmm} N/mm`,
          quantity: input.quantity,
          minutes: null,
          unitPriceCents: spring.priceCents,
          lineCents: 0,
        });
      }
      return;
    }
    const operation = settings.operations.find((o) => o.code === input.operationCode);
    if (!operation) {
      fields[`${at}.operationCode`] = `"${input.operationCode}" is not in the shop's operation list.`;
      return;
    }
    plans.push({
      position: index,
      kind: 'labour',
      end: null,
      springId: null,
      sku: null,
      operationCode: operation.code,
      description: operation.label,
      quantity: input.quantity,
      minutes: operation.minutes,
      unitPriceCents: rateCentsPerHour,
      lineCents: 0,
    });
  });
  if (Object.keys(fields).length) throw new ValidationError(fields, 'Some lines cannot be quoted.');
  return plans;
}

function totalsOf(plans: LinePlan[], taxBasisPoints: number) {
  const inputs: TotalLineInput[] = plans.map((p) =>
    p.kind === 'spring'
      ? { kind: 'spring', quantity: p.quantity, unitPriceCents: p.unitPriceCents }
      : { kind: 'labour', quantity: p.quantity, minutes: p.minutes!, rateCentsPerHour: p.unitPriceCents },
  );
  const totals = computeQuoteTotals(inputs, taxBasisPoints);
  plans.forEach((p, i) => {
    p.lineCents = totals.lineCents[i];
  });
  return totals;
}

/** Prices the plans (their lineCents) and puts the totals and deposit due on the quote. */
function applyTotals(quote: Quote, plans: LinePlan[], deposit: ShopSettings['deposit']): void {
  const totals = totalsOf(plans, quote.taxBasisPoints);
  Object.assign(quote, {
    partsCents: totals.partsCents,
    labourCents: totals.labourCents,
    subtotalCents: totals.subtotalCents,
    taxCents: totals.taxCents,
    totalCents: totals.totalCents,
    depositDueCents: depositCents(totals.totalCents, deposit),
  });
}

/** Saves the quote with its totals and replaces its lines. */
async function saveWithLines(manager: EntityManager, quote: Quote, plans: LinePlan[], deposit: ShopSettings['deposit']): Promise<Quote> {
  applyTotals(quote, plans, deposit);
  const saved = await manager.save(quote);
  await manager.delete(QuoteLine, { quoteId: saved.id });
  if (plans.length) await manager.insert(QuoteLine, plans.map((p) => ({ ...p, quoteId: saved.id })));
  return saved;
}

async function nextSequence(manager: EntityManager, year: number): Promise<number> {
  const row = await manager.createQueryBuilder(Quote, 'q').select('MAX(q.sequence)', 'max').where('q.year = :year', { year }).getRawOne<{ max: number | null }>();
  return (row?.max ?? 0) + 1;
}

export function formatQuoteNumber(year: number, sequence: number): string {
  return `Q-${year}-${String(sequence).padStart(4, '0')}`;
}

/** Stock refusals in the words the desk and the rider read. */
function asUnavailable(err: unknown, sku: string | null): never {
  if (err instanceof HttpError && (err.code === 'out-of-stock' || err.code === 'inactive' || err.code === 'stock-changed')) {
    throw new ConflictError(`Spring ${sku ?? ''} is no longer available in the quantity quoted: the desk will revise the quote. (${err.message})`, 'out-of-stock');
  }
  throw err;
}

export class QuotesService {
  private readonly stock: StockService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData' | 'payments' | 'log'>) {
    this.stock = new StockService(ctx);
  }

  async create(user: AuthUser, input: { sizingRecordId: number; lines?: QuoteLineInput[] }): Promise<QuoteView> {
    const id = await this.ctx.db.write(async (manager) => {
      const record = await manager.findOneBy(SizingRecord, { id: input.sizingRecordId });
      if (!record) throw new ValidationError({ sizingRecordId: 'There is no such sizing record.' });
      return this.createFromRecord(manager, user, record, input.lines, `From sizing record ${record.id}`);
    });
    return this.get(user, id);
  }

  /**
   * A rider asks the shop to quote for one of their results: a draft with the recommended lines
   * appears on the desk's board. Asking again while a quote for that result is still open
   * answers that quote rather than starting a second one.
   */
  async requestForRecord(user: AuthUser, sizingRecordId: number): Promise<{ quote: QuoteView; created: boolean }> {
    const outcome = await this.ctx.db.write(async (manager) => {
      const record = await manager.findOneBy(SizingRecord, { id: sizingRecordId });
      if (!record) throw new NotFoundError('There is no such sizing record.');
      assertOwnerOrStaff(user, record.riderId);
      const open = await manager.findOne(Quote, {
        where: { sizingRecordId: record.id, status: In(OPEN_FOR_REQUESTS) },
        order: { version: 'DESC' },
      });
      if (open) return { id: open.id, created: false };
      return { id: await this.createFromRecord(manager, user, record, undefined, 'Asked for by the rider from a saved result'), created: true };
    });
    return { quote: await this.get(user, outcome.id), created: outcome.created };
  }

  private async createFromRecord(
    manager: EntityManager,
    user: AuthUser,
    record: SizingRecord,
    lines: QuoteLineInput[] | undefined,
    note: string,
  ): Promise<number> {
    const settings = await loadShopSettings(manager);
    const shop = await loadShop(manager);
    let lineInputs = lines;
    if (!lineInputs) {
      const skus = (['front', 'rear'] as const).map((end) => pickFor(record, end)?.sku).filter((s): s is string => !!s);
      const springs = skus.length ? await manager.findBy(SpringRate, { sku: In(skus), active: true }) : [];
      lineInputs = defaultLineInputs(record, new Map(springs.map((s) => [s.sku, s])), settings);
    }
    const plans = await planLines(manager, record, lineInputs, settings.labourRateCentsPerHour, settings);
    const now = this.ctx.now();
    const year = now.getUTCFullYear();
    const sequence = await nextSequence(manager, year);
    const quote = manager.create(Quote, {
      number: formatQuoteNumber(year, sequence),
      year,
      sequence,
      version: 1,
      previousId: null,
      supersededById: null,
      status: 'draft',
      riderId: record.riderId,
      bikeId: record.bikeId,
      sizingRecordId: record.id,
      createdById: user.id,
      currency: shop.currency,
      shop: shop.identity,
      cautions: settings.cautions,
      labourRateCentsPerHour: settings.labourRateCentsPerHour,
      taxBasisPoints: settings.taxBasisPoints,
      paidCents: 0,
      refundedCents: 0,
      validUntil: new Date(now.getTime() + settings.quoteValidityDays * DAY_MS),
      tokenHash: null,
      sentAt: null,
      fittingAt: null,
      createdAt: now,
      updatedAt: now,
    });
    const saved = await saveWithLines(manager, quote, plans, settings.deposit);
    await manager.insert(QuoteStatusEvent, { quoteId: saved.id, fromStatus: null, toStatus: 'draft', ...eventActor(actorOf(user)), note, at: now });
    return saved.id;
  }

  async updateLines(user: AuthUser, id: number, lines: QuoteLineInput[]): Promise<QuoteView> {
    await this.ctx.db.write(async (manager) => {
      const quote = await this.findForWrite(manager, user, id);
      if (quote.status !== 'draft') throw new ConflictError(`Quote ${quote.number} has been sent: revise it to change its lines.`, 'not-draft');
      const record = await manager.findOneByOrFail(SizingRecord, { id: quote.sizingRecordId });
      const settings = await loadShopSettings(manager);
      const plans = await planLines(manager, record, lines, quote.labourRateCentsPerHour, settings);
      quote.updatedAt = this.ctx.now();
      await saveWithLines(manager, quote, plans, settings.deposit);
    });
    return this.get(user, id);
  }

  async list(user: AuthUser, query: QuoteListQuery): Promise<QuotePage> {
    await this.expireDue();
    const read = this.ctx.db.read.manager;
    const qb = read.getRepository(Quote).createQueryBuilder('q').innerJoin(User, 'u', 'u.id = q.riderId');
    if (!seesAllCustomers(user)) qb.andWhere('q.riderId = :self', { self: user.id });
    else if (query.riderId) qb.andWhere('q.riderId = :riderId', { riderId: query.riderId });
    if (query.status) qb.andWhere('q.status = :status', { status: query.status });
    if (query.q) {
      const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      qb.andWhere("(q.number LIKE :like ESCAPE '\\' OR u.name LIKE :like ESCAPE '\\' OR u.email LIKE :like ESCAPE '\\')", { like });
    }
    const [rows, total] = await qb
      .orderBy('q.updatedAt', 'DESC')
      .addOrderBy('q.id', 'DESC')
      .skip((query.page - 1) * query.pageSize)
      .take(query.pageSize)
      .getManyAndCount();
    return { quotes: await toQuoteSummaries(read, rows), total, page: query.page, pageSize: query.pageSize };
  }

  async get(user: AuthUser, id: number): Promise<QuoteView> {
    await this.expireDue();
    const read = this.ctx.db.read.manager;
    const quote = await read.findOneBy(Quote, { id });
    if (!quote) throw new NotFoundError('There is no such quote.');
    assertOwnerOrStaff(user, quote.riderId);
    return toQuoteView(read, quote);
  }

  /** For the customer link: the guard has already matched the token to this quote. */
  async getForLink(id: number): Promise<QuoteView> {
    await this.expireDue();
    const read = this.ctx.db.read.manager;
    return toQuoteView(read, await read.findOneByOrFail(Quote, { id }));
  }

  /** Active springs of the same kind and fit as each end of the record, with what is available and which the sizing recommended. */
  async springOptions(user: AuthUser, id: number): Promise<{ front: SpringOption[]; rear: SpringOption[] }> {
    const read = this.ctx.db.read.manager;
    const quote = await read.findOneBy(Quote, { id });
    if (!quote) throw new NotFoundError('There is no such quote.');
    assertOwnerOrStaff(user, quote.riderId);
    const record = await read.findOneByOrFail(SizingRecord, { id: quote.sizingRecordId });
    const options = { front: [] as SpringOption[], rear: [] as SpringOption[] };
    for (const end of ['front', 'rear'] as const) {
      const family = record.request[end]?.family;
      if (!family) continue;
      const springs = await read.find(SpringRate, { where: { kind: KIND_OF_END[end], family, active: true }, order: { rateNmm: 'ASC' } });
      const pick = pickFor(record, end)?.sku;
      options[end] = springs.map((s) => ({ springId: s.id, sku: s.sku, family: s.family, rateNmm: s.rateNmm, priceCents: s.priceCents, available: s.onHand - s.reserved, recommended: s.sku === pick }));
    }
    return options;
  }

  /** Drafts, sent and accepted quotes past their validity date become expired; accepted ones release their springs. */
  async expireDue(): Promise<void> {
    const now = this.ctx.now();
    const due = await this.ctx.db.read.getRepository(Quote).count({ where: dueWhere(now) });
    if (!due) return;
    await writeCatalogue(this.ctx, async (manager) => {
      const quotes = await manager.find(Quote, { where: dueWhere(now) });
      for (const quote of quotes) {
        await this.stock.releaseQuoteHolds(manager, { quoteId: quote.id, userId: null, reason: `Quote ${quote.number} expired` });
        await moveQuote(manager, quote, 'expired', SYSTEM_ACTOR, now, 'expired', 'Past its validity date');
      }
    });
  }

  /** The rider's yes: puts every quoted spring on hold for the quote with the status change, or changes nothing. */
  async accept(actor: QuoteActor, id: number, owner?: AuthUser): Promise<QuoteView> {
    await this.expireDue();
    await writeCatalogue(this.ctx, async (manager) => {
      const quote = await this.findQuote(manager, id, owner);
      assertCanMove(quote, 'accepted', 'accepted');
      const lines = await manager.find(QuoteLine, { where: { quoteId: id, kind: 'spring' }, order: { position: 'ASC' } });
      // One hold per spring: two lines of the same spring share it.
      const perSpring = new Map<number, { sku: string | null; quantity: number }>();
      for (const line of lines) {
        const held = perSpring.get(line.springId!);
        perSpring.set(line.springId!, { sku: line.sku, quantity: (held?.quantity ?? 0) + line.quantity });
      }
      for (const [springId, { sku, quantity }] of perSpring) {
        await this.stock
          .reserve(manager, { springId, quantity, userId: actor.id, reason: `Quote ${quote.number} accepted`, holder: { kind: 'quote', quoteId: quote.id } })
          .catch((err) => asUnavailable(err, sku));
      }
      await moveQuote(manager, quote, 'accepted', actor, this.ctx.now(), 'accepted');
      await pauseForFault('quote-accept-written', quote.number);
    });
    return this.getForLink(id);
  }

  async decline(actor: QuoteActor, id: number, reason: string, owner?: AuthUser): Promise<QuoteView> {
    await this.expireDue();
    await this.ctx.db.write(async (manager) => {
      const quote = await this.findQuote(manager, id, owner);
      await moveQuote(manager, quote, 'declined', actor, this.ctx.now(), 'declined', reason);
    });
    return this.getForLink(id);
  }

  /** Marks the quote sent with a new customer link; answers the link's token, which is stored only hashed. */
  async markSent(user: AuthUser, id: number): Promise<{ token: string; quote: Quote }> {
    return this.ctx.db.write(async (manager) => {
      const quote = await this.findForWrite(manager, user, id);
      assertCanMove(quote, 'sent', 'sent');
      const now = this.ctx.now();
      if (quote.validUntil.getTime() <= now.getTime()) throw new ConflictError(`Quote ${quote.number} is past its validity date: revise it first.`, 'expired');
      const { token, hash } = newQuoteToken();
      await moveQuote(manager, quote, 'sent', actorOf(user), now, 'sent', quote.status === 'sent' ? 'Sent again with a new link' : '');
      quote.tokenHash = hash;
      quote.sentAt = now;
      await manager.save(quote);
      return { token, quote };
    });
  }

  /** A new draft, version + 1, with the same lines priced afresh; the old version is superseded and its link stops working. */
  async revise(user: AuthUser, id: number): Promise<QuoteView> {
    const newId = await this.ctx.db.write(async (manager) => {
      const old = await this.findForWrite(manager, user, id);
      assertCanMove(old, 'superseded', 'revised');
      const record = await manager.findOneByOrFail(SizingRecord, { id: old.sizingRecordId });
      const settings = await loadShopSettings(manager);
      const shop = await loadShop(manager);
      const oldLines = await manager.find(QuoteLine, { where: { quoteId: old.id }, order: { position: 'ASC' } });
      const inputs = oldLines.map((l) =>
        (l.kind === 'spring' ? { kind: 'spring', springId: l.springId, end: l.end, quantity: l.quantity } : { kind: 'labour', operationCode: l.operationCode, quantity: l.quantity }) as QuoteLineInput,
      );
      // A line whose spring or operation has gone is dropped, so the desk can pick again in the draft.
      const plans: LinePlan[] = [];
      for (const input of inputs) {
        try {
          plans.push(...(await planLines(manager, record, [input], settings.labourRateCentsPerHour, settings)));
        } catch (err) {
          if (!(err instanceof ValidationError)) throw err;
        }
      }
      plans.forEach((p, i) => (p.position = i));
      const now = this.ctx.now();
      const next = manager.create(Quote, {
        ...old,
        id: undefined,
        version: old.version + 1,
        previousId: old.id,
        supersededById: null,
        status: 'draft',
        createdById: user.id,
        shop: shop.identity,
        currency: shop.currency,
        cautions: settings.cautions,
        labourRateCentsPerHour: settings.labourRateCentsPerHour,
        taxBasisPoints: settings.taxBasisPoints,
        validUntil: new Date(now.getTime() + settings.quoteValidityDays * DAY_MS),
        tokenHash: null,
        sentAt: null,
        fittingAt: null,
        createdAt: now,
        updatedAt: now,
      });
      const saved = await saveWithLines(manager, next, plans, settings.deposit);
      await manager.insert(QuoteStatusEvent, { quoteId: saved.id, fromStatus: null, toStatus: 'draft', ...eventActor(actorOf(user)), note: `Revision of version ${old.version}`, at: now });
      await moveQuote(manager, old, 'superseded', actorOf(user), now, 'revised', `Replaced by version ${saved.version}`);
      await manager.update(Quote, { id: old.id }, { supersededById: saved.id, tokenHash: null });
      return saved.id;
    });
    return this.get(user, newId);
  }

  async book(user: AuthUser, id: number, fittingAt: Date): Promise<QuoteView> {
    await this.expireDue();
    await this.ctx.db.write(async (manager) => {
      const quote = await this.findForWrite(manager, user, id);
      if (quote.status === 'accepted' && quote.depositDueCents > 0 && quote.paidCents === 0) {
        throw new ConflictError(`Quote ${quote.number} waits for its deposit: book the fitting once it is paid.`, 'deposit-due');
      }
      if (fittingAt.getTime() <= this.ctx.now().getTime()) throw new ValidationError({ fittingAt: 'The fitting must be in the future.' });
      const note = `Fitting booked for ${fittingAt.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
      await moveQuote(manager, quote, 'booked', actorOf(user), this.ctx.now(), 'booked', note);
      await manager.update(Quote, { id }, { fittingAt });
    });
    return this.get(user, id);
  }

  /** The springs leave the shelf on the bike, and the swap goes into the bike's setup log with its new preload. */
  async markFitted(user: AuthUser, id: number): Promise<QuoteView> {
    await writeCatalogue(this.ctx, async (manager) => {
      const quote = await this.findForWrite(manager, user, id);
      assertCanMove(quote, 'fitted', 'marked fitted');
      const lines = await manager.find(QuoteLine, { where: { quoteId: id, kind: 'spring' }, order: { position: 'ASC' } });
      await this.stock.fitQuoteHolds(manager, { quoteId: quote.id, userId: user.id, reason: `Quote ${quote.number} fitted` });
      const now = this.ctx.now();
      await this.logSpringSwap(manager, quote, lines, user, now);
      await moveQuote(manager, quote, 'fitted', actorOf(user), now, 'marked fitted');
    });
    return this.get(user, id);
  }

  /** Releases the quote's holds and refunds a paid deposit, with the status change. */
  async cancel(user: AuthUser, id: number, reason: string): Promise<QuoteView> {
    await writeCatalogue(this.ctx, async (manager) => {
      const quote = await this.findForWrite(manager, user, id);
      assertCanMove(quote, 'cancelled', 'cancelled');
      await this.stock.releaseQuoteHolds(manager, { quoteId: quote.id, userId: user.id, reason: `Quote ${quote.number} cancelled` });
      const now = this.ctx.now();
      const refundable = quote.paidCents - quote.refundedCents;
      if (refundable > 0) await this.ctx.payments.refundDeposit(manager, quote, refundable, now);
      await moveQuote(manager, quote, 'cancelled', actorOf(user), now, 'cancelled', reason);
    });
    return this.get(user, id);
  }

  /**
   * The counter's override: takes a quote's hold on a spring back to the shelf, and the quote moves
   * to springs-released (or, already there, notes the further release), in one transaction. The
   * movement and the quote's history both carry who did it and why.
   */
  async releaseOverQuote(user: AuthUser, input: { springId: number; holdId: number; reason: string }): Promise<MovementResult> {
    return writeCatalogue(this.ctx, async (manager) => {
      const quote = await manager
        .createQueryBuilder(Quote, 'q')
        .innerJoin(StockHold, 'h', 'h.quoteId = q.id')
        .where('h.id = :holdId AND h.springId = :springId', input)
        .getOne();
      const reason = quote ? `Released over quote ${quote.number} v${quote.version}: ${input.reason}` : input.reason;
      const released = await this.stock.overrideQuoteHold(manager, { ...input, userId: user.id, reason });
      if (!quote) return released;
      const actor: QuoteActor = { kind: 'staff', id: user.id, name: user.name };
      const note = `The parts counter released ${-released.movement.reservedDelta} x ${released.spring.sku} held for this quote: ${input.reason}`;
      const now = this.ctx.now();
      if (quote.status === 'springs-released') await noteOnQuote(manager, quote, actor, now, note);
      else await moveQuote(manager, quote, 'springs-released', actor, now, 'left without its springs', note);
      return released;
    });
  }

  private async logSpringSwap(manager: EntityManager, quote: Quote, lines: QuoteLine[], user: AuthUser, now: Date): Promise<void> {
    if (quote.bikeId === null || !lines.length) return;
    const bike = await manager.findOneBy(Bike, { id: quote.bikeId });
    if (!bike) return;
    const record = await manager.findOneByOrFail(SizingRecord, { id: quote.sizingRecordId });
    const springs = await manager.findBy(SpringRate, { id: In(lines.map((l) => l.springId!)) });
    const change: SetupChangeInput = { note: `Spring swap, quote ${quote.number} v${quote.version}` };
    for (const line of lines) {
      const end = line.end!;
      const spring = springs.find((s) => s.id === line.springId)!;
      const advice = candidateBySku(record, end, spring.sku);
      change[end] = {
        spring: {
          rateNmm: spring.rateNmm,
          family: spring.family,
          secondRateNmm: spring.secondRateNmm,
          breakMm: spring.breakMm,
          ...(advice?.setPreloadMm != null && advice.position != null ? { preloadMm: advice.setPreloadMm } : {}),
        },
        ...(advice?.setPreloadMm != null && advice.position != null ? { preloadPosition: advice.position } : {}),
      };
    }
    const outcome = applySetupChange(specOf(bike), change);
    if (!outcome.ok) throw new ConflictError('The new springs do not fit the bike as recorded; correct the bike first.', 'bike-mismatch', outcome.fields);
    try {
      await bikeSpecSchema.validate(outcome.bike, { abortEarly: false });
    } catch (err) {
      if (err instanceof YupValidationError) throw new ConflictError('The new springs do not fit the bike as recorded; correct the bike first.', 'bike-mismatch', toFieldErrors(err));
      throw err;
    }
    // A new spring ends any load case: its solo settings were the old spring's.
    await manager.save(Bike, { ...bike, ...outcome.bike, loadCase: null, updatedAt: now });
    await manager.insert(SetupLogEntry, {
      bikeId: bike.id,
      kind: 'change',
      sizingRecordId: null,
      createdById: user.id,
      note: change.note,
      before: settingsOf(bike),
      after: settingsOf(outcome.bike),
      createdAt: now,
    });
  }

  private async findForWrite(manager: EntityManager, user: AuthUser, id: number): Promise<Quote> {
    const quote = await manager.findOneBy(Quote, { id });
    if (!quote) throw new NotFoundError('There is no such quote.');
    assertOwnerOrStaff(user, quote.riderId);
    return quote;
  }

  private async findQuote(manager: EntityManager, id: number, owner?: AuthUser): Promise<Quote> {
    if (owner) return this.findForWrite(manager, owner, id);
    const quote = await manager.findOneBy(Quote, { id });
    if (!quote) throw new NotFoundError('There is no such quote.');
    return quote;
  }
}

function eventActor(actor: QuoteActor) {
  return { actorKind: actor.kind, actorId: actor.id, actorName: actor.name };
}

function dueWhere(now: Date) {
  return EXPIRES.map((status) => ({ status, validUntil: LessThan(toSqliteDatetime(now)) as unknown as Date }));
}
