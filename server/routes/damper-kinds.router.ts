/** The shop's damping adjuster kinds: every signed-in account reads them (to describe a bike), the admin adds to them. */
import { damperKindCreateSchema } from '../../shared/schemas/damper-kind.schema';
import type { DamperKind } from '../../shared/types/damping';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { DamperKindsService } from '../services/damper-kinds.service';
import { anyRole, RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

export function damperKindRoutes(ctx: AppContext): RouteSpec[] {
  const kinds = new DamperKindsService(ctx);
  return [
    {
      method: 'get',
      path: '/damper-kinds',
      access: anyRole,
      handler: async (_req, res) => {
        res.json({ kinds: await kinds.list() });
      },
    },
    {
      method: 'post',
      path: '/damper-kinds',
      access: signedIn('admin'),
      handler: async (req, res) => {
        const input = (await parseInput(damperKindCreateSchema, req.body)) as DamperKind;
        res.status(201).json({ kind: await kinds.create(currentUser(req), input) });
      },
    },
  ];
}
