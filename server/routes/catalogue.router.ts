/**
 * The spring catalogue: search and detail for every signed-in role (the desk and riders see rates
 * and availability only), changes for the parts counter and the admin, the fits and their nearest
 * rates, the low-stock list and the CSV exports, and identifying a spring from its measurements.
 */
import { Request } from 'express';
import {
  identifySchema,
  lowStockSchema,
  ratesForFitSchema,
  springCreateSchema,
  springDetailSchema,
  springListSchema,
  springUpdateSchema,
  unitQuerySchema,
} from '../../shared/schemas/catalogue.schema';
import type { LowStockLine, RatesForFit, SpringAnswer } from '../../shared/types/catalogue';
import { toSi } from '../../shared/units';
import type { AppContext } from '../app-context';
import { NotFoundError } from '../errors';
import { currentUser } from '../middleware/auth';
import { CatalogueExportService } from '../services/catalogue-export.service';
import { CATALOGUE_STAFF, CatalogueService, seesStockDetail, toSpringDetail, toSpringView } from '../services/catalogue.service';
import { identifyCatalogueSpring } from '../services/spring-identify.service';
import { StockService } from '../services/stock.service';
import { anyRole, RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

export const catalogueStaff = signedIn(...CATALOGUE_STAFF);

export function springId(req: Request): number {
  const id = Number(req.params.id);
  if (!Number.isSafeInteger(id) || id < 1) throw new NotFoundError('There is no such spring in the catalogue.');
  return id;
}

export function catalogueRoutes(ctx: AppContext): RouteSpec[] {
  const catalogue = new CatalogueService(ctx);
  const stock = new StockService(ctx);
  const exports = new CatalogueExportService(ctx);
  return [
    {
      method: 'get',
      path: '/catalogue/springs',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await catalogue.list(await parseInput(springListSchema, req.query), currentUser(req).role));
      },
    },
    {
      method: 'get',
      path: '/catalogue/springs.csv',
      access: catalogueStaff,
      handler: async (_req, res) => {
        await exports.catalogue(res);
      },
    },
    {
      method: 'get',
      path: '/catalogue/springs/:id',
      access: anyRole,
      handler: async (req, res) => {
        const { role } = currentUser(req);
        const { unit, page, pageSize } = await parseInput(springDetailSchema, req.query);
        const spring = await catalogue.find(springId(req), role);
        const answer: SpringAnswer = { spring: toSpringView(spring, unit, role), unit };
        if (seesStockDetail(role)) answer.movements = await stock.list(ctx.db.read.manager, { springId: spring.id }, page, pageSize);
        res.json(answer);
      },
    },
    {
      method: 'post',
      path: '/catalogue/springs',
      access: catalogueStaff,
      handler: async (req, res) => {
        const spring = await catalogue.create(await parseInput(springCreateSchema, req.body));
        res.status(201).json({ spring: toSpringDetail(spring, 'N/mm'), unit: 'N/mm' });
      },
    },
    {
      method: 'patch',
      path: '/catalogue/springs/:id',
      access: catalogueStaff,
      handler: async (req, res) => {
        const id = springId(req);
        const spring = await catalogue.update(id, await parseInput(springUpdateSchema, req.body));
        res.json({ spring: toSpringDetail(spring, 'N/mm'), unit: 'N/mm' });
      },
    },
    {
      method: 'post',
      path: '/catalogue/springs/:id/deactivate',
      access: catalogueStaff,
      handler: async (req, res) => {
        res.json({ spring: toSpringDetail(await catalogue.setActive(springId(req), false), 'N/mm'), unit: 'N/mm' });
      },
    },
    {
      method: 'post',
      path: '/catalogue/springs/:id/reactivate',
      access: catalogueStaff,
      handler: async (req, res) => {
        res.json({ spring: toSpringDetail(await catalogue.setActive(springId(req), true), 'N/mm'), unit: 'N/mm' });
      },
    },
    {
      method: 'get',
      path: '/catalogue/families',
      access: anyRole,
      handler: async (req, res) => {
        const { kind } = await parseInput(unitQuerySchema, req.query);
        res.json({ families: await catalogue.families(kind) });
      },
    },
    {
      method: 'get',
      path: '/catalogue/rates-for-fit',
      access: anyRole,
      handler: async (req, res) => {
        const { role } = currentUser(req);
        const query = await parseInput(ratesForFitSchema, req.query);
        const targetNmm = toSi(query.rate, query.unit);
        const matches = await catalogue.nearestRates(targetNmm, { kind: query.kind, family: query.family, limit: query.limit, inStockOnly: query.inStock });
        const answer: RatesForFit = {
          kind: query.kind,
          family: query.family,
          targetNmm,
          targetInUnit: query.rate,
          unit: query.unit,
          matches: matches.map((m) => ({ spring: toSpringView(m.spring, query.unit, role), differenceNmm: m.differenceNmm, differencePct: m.differencePct })),
        };
        res.json(answer);
      },
    },
    {
      method: 'get',
      path: '/catalogue/low-stock',
      access: catalogueStaff,
      handler: async (req, res) => {
        const { kind, unit } = await parseInput(lowStockSchema, req.query);
        const lines: LowStockLine[] = (await catalogue.lowStock(kind)).map(({ spring, shortfall }) => ({ spring: toSpringDetail(spring, unit), shortfall }));
        res.json({ lines, unit });
      },
    },
    {
      method: 'get',
      path: '/catalogue/low-stock.csv',
      access: catalogueStaff,
      handler: async (req, res) => {
        const { kind } = await parseInput(lowStockSchema, req.query);
        await exports.reorderSheet(res, kind);
      },
    },
    {
      method: 'post',
      path: '/catalogue/identify',
      access: signedIn('counter', 'admin', 'desk'),
      handler: async (req, res) => {
        const input = await parseInput(identifySchema, req.body);
        res.json(await identifyCatalogueSpring(catalogue, input, currentUser(req).role));
      },
    },
  ];
}

