/** A bike's setup log: the entries with the baseline, a change as the rider reports it, and the way back to the baseline. */
import { setupChangeSchema } from '../../shared/schemas/setup-log.schema';
import type { SetupChangeInput } from '../../shared/types/setup-log';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { SetupLogService } from '../services/setup-log.service';
import { idParam } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function setupLogRoutes(ctx: AppContext): RouteSpec[] {
  const log = new SetupLogService(ctx);
  return [
    {
      method: 'get',
      path: '/bikes/:id/setup-log',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await log.list(currentUser(req), idParam(req)));
      },
    },
    {
      method: 'post',
      path: '/bikes/:id/setup-log',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const change = (await parseInput(setupChangeSchema, req.body)) as SetupChangeInput;
        res.status(201).json(await log.change(currentUser(req), id, change));
      },
    },
    {
      method: 'get',
      path: '/bikes/:id/setup-log/back-to-baseline',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await log.backToBaseline(currentUser(req), idParam(req)));
      },
    },
  ];
}
