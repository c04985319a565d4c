/** The measuring flow's draft of one bike: read, saved at every step (idempotent), started afresh, deleted. */
import { draftStartSchema } from '../../shared/schemas/draft.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { DraftsService } from '../services/drafts.service';
import { idParam } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function draftRoutes(ctx: AppContext): RouteSpec[] {
  const drafts = new DraftsService(ctx);
  return [
    {
      method: 'get',
      path: '/bikes/:id/draft',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ draft: await drafts.get(currentUser(req), idParam(req)) });
      },
    },
    {
      method: 'put',
      path: '/bikes/:id/draft',
      access: anyRole,
      handler: async (req, res) => {
        res.json({ draft: await drafts.save(currentUser(req), idParam(req), req.body) });
      },
    },
    {
      method: 'post',
      path: '/bikes/:id/draft',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const { remeasure } = await parseInput(draftStartSchema, req.body);
        res.status(201).json({ draft: await drafts.start(currentUser(req), id, remeasure) });
      },
    },
    {
      method: 'delete',
      path: '/bikes/:id/draft',
      access: anyRole,
      handler: async (req, res) => {
        await drafts.delete(currentUser(req), idParam(req));
        res.status(204).end();
      },
    },
  ];
}
