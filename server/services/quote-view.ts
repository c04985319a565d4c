/** Quote rows as the API answers them: the quote with its lines, history, deposit receipt and balance. */
import { EntityManager, In } from 'typeorm';
import { QUOTE_ROUNDING_RULE } from '../../shared/money/quote-totals';
import type { QuoteLineView, QuoteSummary, QuoteView, ReceiptView } from '../../shared/types/quote';
import { Bike } from '../entities/bike.entity';
import { Payment } from '../entities/payment.entity';
import { QuoteLine } from '../entities/quote-line.entity';
import { QuoteStatusEvent } from '../entities/quote-status-event.entity';
import { Quote } from '../entities/quote.entity';
import { User } from '../entities/user.entity';

function toLineView(line: QuoteLine): QuoteLineView {
  return {
    id: line.id,
    kind: line.kind,
    end: line.end,
    springId: line.springId,
    sku: line.sku,
    operationCode: line.operationCode,
    description: line.description,
    quantity: line.quantity,
    minutes: line.minutes,
    unitPriceCents: line.unitPriceCents,
    lineCents: line.lineCents,
  };
}

export function toReceipt(payment: Payment): ReceiptView {
  return { amountCents: payment.amountCents, paidAt: payment.at.toISOString(), method: payment.method, last4: payment.last4, intentId: payment.providerId };
}

async function ridersById(manager: EntityManager, ids: number[]) {
  const users = ids.length ? await manager.find(User, { select: { id: true, name: true, email: true }, where: { id: In([...new Set(ids)]) } }) : [];
  return new Map(users.map((u) => [u.id, { id: u.id, name: u.name, email: u.email }]));
}

async function bikeNamesById(manager: EntityManager, ids: (number | null)[]) {
  const wanted = [...new Set(ids.filter((id): id is number => id !== null))];
  const bikes = wanted.length ? await manager.find(Bike, { select: { id: true, nickname: true }, where: { id: In(wanted) } }) : [];
  return new Map(bikes.map((b) => [b.id, b.nickname]));
}

export async function toQuoteSummaries(manager: EntityManager, quotes: Quote[]): Promise<QuoteSummary[]> {
  const [riders, bikes] = await Promise.all([ridersById(manager, quotes.map((q) => q.riderId)), bikeNamesById(manager, quotes.map((q) => q.bikeId))]);
  return quotes.map((q) => ({
    id: q.id,
    number: q.number,
    version: q.version,
    status: q.status,
    rider: riders.get(q.riderId) ?? { id: q.riderId, name: '', email: '' },
    bikeName: q.bikeId === null ? null : (bikes.get(q.bikeId) ?? null),
    totalCents: q.totalCents,
    currency: q.currency,
    validUntil: q.validUntil.toISOString(),
    fittingAt: q.fittingAt ? q.fittingAt.toISOString() : null,
    updatedAt: q.updatedAt.toISOString(),
  }));
}

export async function toQuoteView(manager: EntityManager, quote: Quote): Promise<QuoteView> {
  const [lines, events, payments, riders, bikes] = await Promise.all([
    manager.find(QuoteLine, { where: { quoteId: quote.id }, order: { position: 'ASC' } }),
    manager.find(QuoteStatusEvent, { where: { quoteId: quote.id }, order: { id: 'ASC' } }),
    manager.find(Payment, { where: { quoteId: quote.id }, order: { id: 'ASC' } }),
    ridersById(manager, [quote.riderId]),
    bikeNamesById(manager, [quote.bikeId]),
  ]);
  const deposit = payments.find((p) => p.kind === 'deposit');
  return {
    id: quote.id,
    number: quote.number,
    version: quote.version,
    previousId: quote.previousId,
    supersededById: quote.supersededById,
    status: quote.status,
    rider: riders.get(quote.riderId) ?? { id: quote.riderId, name: '', email: '' },
    bikeId: quote.bikeId,
    bikeName: quote.bikeId === null ? null : (bikes.get(quote.bikeId) ?? null),
    sizingRecordId: quote.sizingRecordId,
    currency: quote.currency,
    shop: quote.shop,
    lines: lines.map(toLineView),
    labourRateCentsPerHour: quote.labourRateCentsPerHour,
    taxBasisPoints: quote.taxBasisPoints,
    partsCents: quote.partsCents,
    labourCents: quote.labourCents,
    subtotalCents: quote.subtotalCents,
    taxCents: quote.taxCents,
    totalCents: quote.totalCents,
    depositDueCents: quote.paidCents > 0 ? 0 : quote.depositDueCents,
    paidCents: quote.paidCents,
    refundedCents: quote.refundedCents,
    balanceDueCents: quote.status === 'cancelled' ? 0 : quote.totalCents - (quote.paidCents - quote.refundedCents),
    roundingRule: QUOTE_ROUNDING_RULE,
    cautions: quote.cautions,
    validUntil: quote.validUntil.toISOString(),
    fittingAt: quote.fittingAt ? quote.fittingAt.toISOString() : null,
    sentAt: quote.sentAt ? quote.sentAt.toISOString() : null,
    createdAt: quote.createdAt.toISOString(),
    updatedAt: quote.updatedAt.toISOString(),
    receipt: deposit ? toReceipt(deposit) : null,
    history: events.map((e) => ({ from: e.fromStatus, to: e.toStatus, at: e.at.toISOString(), actor: { kind: e.actorKind, id: e.actorId, name: e.actorName }, note: e.note })),
  };
}
