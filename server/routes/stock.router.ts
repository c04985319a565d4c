/**
 * Stock movements over HTTP: receive and count for the parts counter and the admin; holds made by
 * name, released by their id and fitted from also for the service desk, through the same movement
 * service its quote flows use; the override that takes a quote's hold, for the counter and the
 * admin only. Each answers the spring as it now stands, the movement written and the hold it moved.
 */
import { Request } from 'express';
import { EntityManager } from 'typeorm';
import { AnySchema, InferType } from 'yup';
import {
  countSchema,
  fitSchema,
  movementListSchema,
  overrideReleaseSchema,
  receiveSchema,
  releaseSchema,
  reserveSchema,
  unitQuerySchema,
} from '../../shared/schemas/catalogue.schema';
import type { StockAnswer, StockHoldList } from '../../shared/types/catalogue';
import type { Role } from '../../shared/types/roles';
import type { RateUnit } from '../../shared/units';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { CatalogueExportService } from '../services/catalogue-export.service';
import { toSpringView } from '../services/catalogue.service';
import { QuotesService } from '../services/quotes.service';
import { MovementResult, StockService, toHoldViews, toMovementViews, writeCatalogue } from '../services/stock.service';
import { catalogueStaff, springId } from './catalogue.router';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

const stockAndDesk = signedIn('counter', 'admin', 'desk');

export function stockRoutes(ctx: AppContext): RouteSpec[] {
  const stock = new StockService(ctx);
  const quotes = new QuotesService(ctx);
  const exports = new CatalogueExportService(ctx);

  /** The answer of a movement: the spring as the caller may see it, the movement and the hold it moved. */
  async function answerOf(manager: EntityManager, result: MovementResult, role: Role, unit: RateUnit): Promise<StockAnswer> {
    const [movement] = await toMovementViews(manager, [result.movement]);
    const [hold] = result.hold ? await toHoldViews(manager, [result.hold]) : [];
    return { spring: toSpringView(result.spring, unit, role), movement, ...(hold && { hold }) };
  }

  /** Parses the body, runs one movement in its own write, answers it. */
  function movementRoute<S extends AnySchema>(
    path: string,
    access: RouteSpec['access'],
    schema: S,
    move: (manager: EntityManager, input: InferType<S>, springId: number, userId: number) => Promise<MovementResult>,
  ): RouteSpec {
    return {
      method: 'post',
      path,
      access,
      handler: async (req: Request, res) => {
        const user = currentUser(req);
        const id = springId(req);
        const { unit } = await parseInput(unitQuerySchema, req.query);
        const input = await parseInput(schema, req.body);
        res.status(201).json(await writeCatalogue(ctx, async (manager) => answerOf(manager, await move(manager, input, id, user.id), user.role, unit)));
      },
    };
  }

  return [
    movementRoute('/stock/:id/receive', catalogueStaff, receiveSchema, (m, input, id, userId) =>
      stock.receive(m, { springId: id, quantity: input.quantity, userId, reason: input.reason }),
    ),
    movementRoute('/stock/:id/count', catalogueStaff, countSchema, (m, input, id, userId) =>
      stock.correct(m, { springId: id, counted: input.counted, userId, reason: input.reason }),
    ),
    movementRoute('/stock/:id/reserve', stockAndDesk, reserveSchema, (m, input, id, userId) =>
      stock.reserve(m, { springId: id, quantity: input.quantity, userId, reason: input.reason, holder: { kind: 'manual', name: input.name } }),
    ),
    movementRoute('/stock/:id/release', stockAndDesk, releaseSchema, (m, input, id, userId) =>
      stock.release(m, { springId: id, holdId: input.holdId, quantity: input.quantity, userId, reason: input.reason }),
    ),
    movementRoute('/stock/:id/fit', stockAndDesk, fitSchema, (m, input, id, userId) =>
      stock.fit(m, { springId: id, quantity: input.quantity, userId, reason: input.reason, holdId: input.holdId }),
    ),
    {
      method: 'post',
      path: '/stock/:id/override-release',
      access: catalogueStaff,
      handler: async (req, res) => {
        const user = currentUser(req);
        const id = springId(req);
        const { unit } = await parseInput(unitQuerySchema, req.query);
        const input = await parseInput(overrideReleaseSchema, req.body);
        const result = await quotes.releaseOverQuote(user, { springId: id, holdId: input.holdId, reason: input.reason });
        res.status(201).json(await answerOf(ctx.db.read.manager, result, user.role, unit));
      },
    },
    {
      method: 'get',
      path: '/stock/:id/holds',
      access: stockAndDesk,
      handler: async (req, res) => {
        res.json({ holds: await stock.holdsOf(ctx.db.read.manager, springId(req)) } satisfies StockHoldList);
      },
    },
    {
      method: 'get',
      path: '/stock/movements',
      access: catalogueStaff,
      handler: async (req, res) => {
        const { page, pageSize, ...filter } = await parseInput(movementListSchema, req.query);
        res.json(await stock.list(ctx.db.read.manager, filter, page, pageSize));
      },
    },
    {
      method: 'get',
      path: '/stock/movements.csv',
      access: catalogueStaff,
      handler: async (req, res) => {
        const { page: _page, pageSize: _pageSize, ...filter } = await parseInput(movementListSchema, req.query);
        await exports.movements(res, filter);
      },
    },
  ];
}
