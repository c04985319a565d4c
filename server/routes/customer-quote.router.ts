/** The customer's quote page: every route is opened by the link's token alone, for its one quote. */
import { Response } from 'express';
import { payDepositSchema, quoteNoteSchema } from '../../shared/schemas/quote.schema';
import type { AppContext } from '../app-context';
import { PaymentsService } from '../services/payments.service';
import { QuoteActor } from '../services/quote-rules';
import { QuotesService } from '../services/quotes.service';
import { quoteTokenAccess, RouteSpec } from './route-table';
import { parseInput } from './validate';

const LINK_ACTOR: QuoteActor = { kind: 'customer-link', id: null, name: 'Rider, by the quote link' };

function linkedQuote(res: Response): number {
  return res.locals.quoteId as number;
}

export function customerQuoteRoutes(ctx: AppContext): RouteSpec[] {
  const quotes = new QuotesService(ctx);
  const payments = new PaymentsService(ctx);
  return [
    {
      method: 'get',
      path: '/customer-quotes/:token',
      access: quoteTokenAccess,
      handler: async (_req, res) => {
        res.json({ quote: await quotes.getForLink(linkedQuote(res)) });
      },
    },
    {
      method: 'post',
      path: '/customer-quotes/:token/accept',
      access: quoteTokenAccess,
      handler: async (_req, res) => {
        res.json({ quote: await quotes.accept(LINK_ACTOR, linkedQuote(res)) });
      },
    },
    {
      method: 'post',
      path: '/customer-quotes/:token/decline',
      access: quoteTokenAccess,
      handler: async (req, res) => {
        const input = await parseInput(quoteNoteSchema, req.body);
        res.json({ quote: await quotes.decline(LINK_ACTOR, linkedQuote(res), input.reason) });
      },
    },
    {
      method: 'post',
      path: '/customer-quotes/:token/pay-deposit',
      access: quoteTokenAccess,
      handler: async (req, res) => {
        const input = await parseInput(payDepositSchema, req.body);
        res.json(await payments.payDeposit(LINK_ACTOR, linkedQuote(res), input.paymentMethod));
      },
    },
  ];
}
