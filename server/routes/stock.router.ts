/**
 * Stock movements over HTTP: receive and count for the parts counter and the admin; reserve,
 * release and fit also for the service desk, through the same movement service its quote flows use.
 * Each answers the spring as it now stands and the movement written.
 */
import { Request } from 'express';
import { EntityManager } from 'typeorm';
import { AnySchema, InferType } from 'yup';
import { countSchema, fitSchema, movementListSchema, receiveSchema, releaseSchema, reserveSchema, unitQuerySchema } from '../../shared/schemas/catalogue.schema';
import type { StockAnswer } from '../../shared/types/catalogue';
import { AppContext } from '../context';
import { currentUser } from '../middleware/auth';
import { CatalogueExportService } from '../services/catalogue-export.service';
import { toSpringView } from '../services/catalogue.service';
import { MovementResult, StockService, toMovementViews, writeCatalogue } from '../services/stock.service';
import { catalogueStaff, springId } from './catalogue.router';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

const stockAndDesk = signedIn('counter', 'admin', 'desk');

export function stockRoutes(ctx: AppContext): RouteSpec[] {
  const stock = new StockService(ctx);
  const exports = new CatalogueExportService(ctx);

  /** Parses the body, runs one movement in its own write, answers the spring as the caller may see it. */
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
        const answer = await writeCatalogue(ctx, async (manager) => {
          const result = await move(manager, input, id, user.id);
          const [movement] = await toMovementViews(manager, [result.movement]);
          return { spring: toSpringView(result.spring, unit, user.role), movement } satisfies StockAnswer;
        });
        res.status(201).json(answer);
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
      stock.reserve(m, { springId: id, quantity: input.quantity, userId, reason: input.reason, quoteId: input.quoteId }),
    ),
    movementRoute('/stock/:id/release', stockAndDesk, releaseSchema, (m, input, id, userId) =>
      stock.release(m, { springId: id, quantity: input.quantity, userId, reason: input.reason, quoteId: input.quoteId }),
    ),
    movementRoute('/stock/:id/fit', stockAndDesk, fitSchema, (m, input, id, userId) =>
      stock.fit(m, { springId: id, quantity: input.quantity, userId, reason: input.reason, quoteId: input.quoteId, fromReserved: input.fromReserved }),
    ),
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
