/**
 * The quote's status flow. A status changes only through `moveQuote`, which checks the move is
 * allowed and records who made it and when in quote_status_event, in the caller's transaction;
 * `noteOnQuote` records an event that leaves the status as it is.
 *
 *   draft ─send─▶ sent ─accept─▶ accepted ─pay─▶ deposit-paid ─book─▶ booked ─fit─▶ fitted
 *            sent ─decline─▶ declined      accepted ─book (no deposit due)─▶ booked
 *            sent/declined/expired ─revise─▶ superseded (a new draft, version + 1)
 *   draft, sent, accepted, deposit-paid, booked ─cancel─▶ cancelled (stock released, deposit refunded)
 *   draft, sent, accepted past the validity date ─▶ expired (stock released)
 *   accepted, deposit-paid, booked ─the counter takes a held spring─▶ springs-released ─cancel─▶ cancelled
 */
import { EntityManager } from 'typeorm';
import type { QuoteStatus, QuoteStatusEventView } from '../../shared/types/quote';
import { Quote } from '../entities/quote.entity';
import { QuoteStatusEvent } from '../entities/quote-status-event.entity';
import { ConflictError } from '../errors';

export type QuoteActor = QuoteStatusEventView['actor'];

export const SYSTEM_ACTOR: QuoteActor = { kind: 'system', id: null, name: 'Sagwright' };

const MOVES: Record<QuoteStatus, readonly QuoteStatus[]> = {
  draft: ['sent', 'cancelled', 'expired'],
  sent: ['sent', 'accepted', 'declined', 'superseded', 'cancelled', 'expired'],
  accepted: ['deposit-paid', 'booked', 'cancelled', 'expired', 'springs-released'],
  declined: ['superseded'],
  'deposit-paid': ['booked', 'cancelled', 'springs-released'],
  booked: ['booked', 'fitted', 'cancelled', 'springs-released'],
  // Without its springs the work cannot go ahead as quoted: the desk cancels, which refunds a deposit.
  'springs-released': ['cancelled'],
  fitted: [],
  cancelled: [],
  expired: ['superseded'],
  superseded: [],
};

/** Statuses that lapse when the validity date passes: nothing has been paid yet. */
export const EXPIRES: readonly QuoteStatus[] = ['draft', 'sent', 'accepted'];

const LABEL: Record<QuoteStatus, string> = {
  draft: 'a draft',
  sent: 'sent',
  accepted: 'accepted',
  declined: 'declined',
  'deposit-paid': 'paid (deposit)',
  booked: 'booked',
  'springs-released': 'without its springs (the parts counter released them)',
  fitted: 'fitted',
  cancelled: 'cancelled',
  expired: 'expired',
  superseded: 'replaced by a newer version',
};

export function canMove(from: QuoteStatus, to: QuoteStatus): boolean {
  return MOVES[from].includes(to);
}

export function assertCanMove(quote: Pick<Quote, 'status' | 'number'>, to: QuoteStatus, action: string): void {
  if (!canMove(quote.status, to)) {
    throw new ConflictError(`Quote ${quote.number} is ${LABEL[quote.status]}: it cannot be ${action} now.`, 'bad-status');
  }
}

export async function moveQuote(manager: EntityManager, quote: Quote, to: QuoteStatus, actor: QuoteActor, at: Date, action: string, note = ''): Promise<Quote> {
  assertCanMove(quote, to, action);
  const from = quote.status;
  const changed = await manager.update(Quote, { id: quote.id, status: from }, { status: to, updatedAt: at });
  if (changed.affected !== 1) throw new ConflictError(`Quote ${quote.number} changed meanwhile; reload it and try again.`, 'quote-changed');
  await manager.insert(QuoteStatusEvent, { quoteId: quote.id, fromStatus: from, toStatus: to, actorKind: actor.kind, actorId: actor.id, actorName: actor.name, note, at });
  quote.status = to;
  quote.updatedAt = at;
  return quote;
}

/** An event in the quote's history that does not change its status (from and to are the same), for what happened to a closed quote. */
export async function noteOnQuote(manager: EntityManager, quote: Quote, actor: QuoteActor, at: Date, note: string): Promise<void> {
  await manager.insert(QuoteStatusEvent, { quoteId: quote.id, fromStatus: quote.status, toStatus: quote.status, actorKind: actor.kind, actorId: actor.id, actorName: actor.name, note, at });
}
