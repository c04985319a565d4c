/** The garage. A rider reaches only their own bikes; desk and admin reach any customer's (`?riderId=` to list one's garage). */
import { bikeCreateSchema, bikeFormSchema } from '../../shared/schemas/bike.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { BikeCreateInput, BikesService, BikeUpdateInput } from '../services/bikes.service';
import { idParam, riderQuery } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function bikeRoutes(ctx: AppContext): RouteSpec[] {
  const bikes = new BikesService(ctx);
  return [
    {
      method: 'get',
      path: '/bikes',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ bikes: await bikes.garage(currentUser(req), await riderQuery(req)) });
      },
    },
    {
      method: 'post',
      path: '/bikes',
      access: anyRole,
      handler: async (req, res) => {
        const input = (await parseInput(bikeCreateSchema, req.body)) as unknown as BikeCreateInput;
        res.status(201).json({ bike: await bikes.create(currentUser(req), input) });
      },
    },
    {
      method: 'get',
      path: '/bikes/:id',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ bike: await bikes.get(currentUser(req), idParam(req)) });
      },
    },
    {
      method: 'put',
      path: '/bikes/:id',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = (await parseInput(bikeFormSchema, req.body)) as unknown as BikeUpdateInput;
        res.json({ bike: await bikes.update(currentUser(req), id, input) });
      },
    },
    {
      method: 'delete',
      path: '/bikes/:id',
      access: anyRole,
      handler: async (req, res) => {
        await bikes.delete(currentUser(req), idParam(req));
        res.status(204).end();
      },
    },
  ];
}
