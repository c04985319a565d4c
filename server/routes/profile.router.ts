/** The rider's profile: the units preference (every account, its own) and the current weigh-in (desk and admin: `?riderId=`). */
import { unitsPreferenceSchema, weighInSchema } from '../../shared/schemas/weigh-in.schema';
import type { WeighIn } from '../../shared/types/garage';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { ProfileService } from '../services/profile.service';
import { riderQuery } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function profileRoutes(ctx: AppContext): RouteSpec[] {
  const profiles = new ProfileService(ctx);
  return [
    {
      method: 'get',
      path: '/me/units',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ units: await profiles.units(currentUser(req).id) });
      },
    },
    {
      method: 'put',
      path: '/me/units',
      access: anyRole,
      handler: async (req, res) => {
        const input = await parseInput(unitsPreferenceSchema, req.body);
        res.json({ units: await profiles.setUnits(currentUser(req).id, input) });
      },
    },
    {
      method: 'get',
      path: '/weigh-in',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await profiles.weighIn(currentUser(req), await riderQuery(req)));
      },
    },
    {
      method: 'put',
      path: '/weigh-in',
      access: anyRole,
      handler: async (req, res) => {
        const riderId = await riderQuery(req);
        const weighIn = (await parseInput(weighInSchema, req.body)) as WeighIn;
        res.json(await profiles.setWeighIn(currentUser(req), weighIn, riderId));
      },
    },
  ];
}
