/** The desk's quotes (board, detail, create, lines, send, revise, book, fitted, cancel) and the signed-in rider's own. */
import { payDepositSchema, quoteBookSchema, quoteCreateSchema, quoteLinesSchema, quoteListQuerySchema, quoteNoteSchema, type QuoteLineInput } from '../../shared/schemas/quote.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { PaymentsService } from '../services/payments.service';
import { QuoteMailService } from '../services/quote-mail.service';
import { actorOf, QuotesService } from '../services/quotes.service';
import { idParam } from './params';
import { anyRole, RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

export function quoteRoutes(ctx: AppContext): RouteSpec[] {
  const quotes = new QuotesService(ctx);
  const mail = new QuoteMailService(ctx, quotes);
  const payments = new PaymentsService(ctx);
  const desk = signedIn('desk', 'admin');
  return [
    {
      method: 'get',
      path: '/quotes',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await quotes.list(currentUser(req), await parseInput(quoteListQuerySchema, req.query)));
      },
    },
    {
      method: 'post',
      path: '/quotes',
      access: desk,
      handler: async (req, res) => {
        const input = await parseInput(quoteCreateSchema, req.body);
        res.status(201).json({ quote: await quotes.create(currentUser(req), { sizingRecordId: input.sizingRecordId, lines: input.lines as QuoteLineInput[] | undefined }) });
      },
    },
    {
      method: 'post',
      path: '/sizing-records/:id/quote-request',
      access: anyRole,
      handler: async (req, res) => {
        const { quote, created } = await quotes.requestForRecord(currentUser(req), idParam(req));
        res.status(created ? 201 : 200).json({ quote, created });
      },
    },
    {
      method: 'get',
      path: '/quotes/:id',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ quote: await quotes.get(currentUser(req), idParam(req)) });
      },
    },
    {
      method: 'get',
      path: '/quotes/:id/spring-options',
      access: desk,
      handler: async (req, res) => {
        res.json(await quotes.springOptions(currentUser(req), idParam(req)));
      },
    },
    {
      method: 'put',
      path: '/quotes/:id/lines',
      access: desk,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = await parseInput(quoteLinesSchema, req.body);
        res.json({ quote: await quotes.updateLines(currentUser(req), id, input.lines as QuoteLineInput[]) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/send',
      access: desk,
      handler: async (req, res) => {
        // The address first: refused while unknown, before the quote is marked sent.
        const baseUrl = await ctx.publicAddress.forLinks();
        res.json(await mail.send(currentUser(req), idParam(req), baseUrl));
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/revise',
      access: desk,
      handler: async (req, res) => {
        res.status(201).json({ quote: await quotes.revise(currentUser(req), idParam(req)) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/book',
      access: desk,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = await parseInput(quoteBookSchema, req.body);
        res.json({ quote: await quotes.book(currentUser(req), id, new Date(input.fittingAt)) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/fitted',
      access: desk,
      handler: async (req, res) => {
        res.json({ quote: await quotes.markFitted(currentUser(req), idParam(req)) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/cancel',
      access: desk,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = await parseInput(quoteNoteSchema, req.body);
        res.json({ quote: await quotes.cancel(currentUser(req), id, input.reason) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/accept',
      access: anyRole,
      handler: async (req, res) => {
        const user = currentUser(req);
        res.json({ quote: await quotes.accept(actorOf(user), idParam(req), user) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/decline',
      access: anyRole,
      handler: async (req, res) => {
        const user = currentUser(req);
        const id = idParam(req);
        const input = await parseInput(quoteNoteSchema, req.body);
        res.json({ quote: await quotes.decline(actorOf(user), id, input.reason, user) });
      },
    },
    {
      method: 'post',
      path: '/quotes/:id/pay-deposit',
      access: anyRole,
      handler: async (req, res) => {
        const user = currentUser(req);
        const id = idParam(req);
        const input = await parseInput(payDepositSchema, req.body);
        res.json(await payments.payDeposit(actorOf(user), id, input.paymentMethod, user));
      },
    },
  ];
}
