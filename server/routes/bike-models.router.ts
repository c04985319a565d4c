/** The shop's bike models: every signed-in account reads them (to make a bike from one), the admin writes them. */
import { bikeModelSchema } from '../../shared/schemas/bike.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { BikeModelInput, BikeModelsService } from '../services/bike-models.service';
import { idParam } from './params';
import { anyRole, RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

const adminOnly = signedIn('admin');

export function bikeModelRoutes(ctx: AppContext): RouteSpec[] {
  const models = new BikeModelsService(ctx);
  const parseModel = async (body: unknown) => (await parseInput(bikeModelSchema, body)) as unknown as BikeModelInput;
  return [
    {
      method: 'get',
      path: '/bike-models',
      access: anyRole,
      handler: async (_req, res) => {
        res.json({ models: await models.list() });
      },
    },
    {
      method: 'get',
      path: '/bike-models/:id',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ model: await models.get(idParam(req)) });
      },
    },
    {
      method: 'post',
      path: '/bike-models',
      access: adminOnly,
      handler: async (req, res) => {
        res.status(201).json({ model: await models.create(currentUser(req), await parseModel(req.body)) });
      },
    },
    {
      method: 'put',
      path: '/bike-models/:id',
      access: adminOnly,
      handler: async (req, res) => {
        const id = idParam(req);
        res.json({ model: await models.update(currentUser(req), id, await parseModel(req.body)) });
      },
    },
    {
      method: 'delete',
      path: '/bike-models/:id',
      access: adminOnly,
      handler: async (req, res) => {
        await models.delete(currentUser(req), idParam(req));
        res.status(204).end();
      },
    },
  ];
}
