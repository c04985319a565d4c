import { validateSizingRequest } from '../../shared/schemas/sizing.schema';
import type { AppContext } from '../app-context';
import { ValidationError } from '../errors';
import { runSizing } from '../services/sizing.service';
import { anyRole, RouteSpec } from './route-table';

export function sizingRoutes(ctx: AppContext): RouteSpec[] {
  return [
    {
      method: 'post',
      path: '/sizing',
      access: anyRole,
      handler: async (req, res) => {
        const checked = validateSizingRequest(req.body);
        if (!checked.ok) throw new ValidationError(checked.fields);
        res.json(await runSizing(ctx.sizingData, checked.value));
      },
    },
    {
      method: 'get',
      path: '/target-profiles',
      access: anyRole,
      handler: async (_req, res) => {
        res.json({ profiles: [...(await ctx.sizingData.profileList()).values()] });
      },
    },
  ];
}
