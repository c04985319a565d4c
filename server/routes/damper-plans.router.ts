/** A bike's damping adjusters back to the maker's standard or the rider's baseline: the plans, and either one put on the bike. */
import { damperPlanApplySchema } from '../../shared/schemas/damping.schema';
import { DAMPER_PLAN_TARGETS, type DamperPlanTarget } from '../../shared/types/test-ride';
import type { AppContext } from '../app-context';
import { NotFoundError } from '../errors';
import { currentUser } from '../middleware/auth';
import { DamperPlansService } from '../services/damper-plans.service';
import { idParam } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

/** A target the path cannot name answers like an unknown path. */
function targetParam(value: unknown): DamperPlanTarget {
  const target = DAMPER_PLAN_TARGETS.find((known) => known === value);
  if (!target) throw new NotFoundError();
  return target;
}

export function damperPlanRoutes(ctx: AppContext): RouteSpec[] {
  const plans = new DamperPlansService(ctx);
  return [
    {
      method: 'get',
      path: '/bikes/:id/damper-plans',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await plans.plans(currentUser(req), idParam(req)));
      },
    },
    {
      method: 'post',
      path: '/bikes/:id/damper-plans/:target',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const target = targetParam(req.params.target);
        const { end } = await parseInput(damperPlanApplySchema, req.body);
        res.status(201).json(await plans.apply(currentUser(req), id, target, end));
      },
    },
  ];
}
