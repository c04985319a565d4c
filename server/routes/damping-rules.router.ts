/** The symptom-to-change table: the desk and the admin read it and add the shop's own rows; the admin edits any row. */
import { dampingRuleCreateSchema, dampingRulePatchSchema } from '../../shared/schemas/damping.schema';
import type { DampingRuleAnswer, DampingRuleList } from '../../shared/types/test-ride';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { DampingRulesService } from '../services/damping-rules.service';
import { idParam } from './params';
import { RouteSpec, signedIn } from './route-table';
import { parseInput } from './validate';

export function dampingRuleRoutes(ctx: AppContext): RouteSpec[] {
  const rules = new DampingRulesService(ctx);
  return [
    {
      method: 'get',
      path: '/damping-rules',
      access: signedIn('desk', 'admin'),
      handler: async (_req, res) => {
        const answer: DampingRuleList = { rules: await rules.list() };
        res.json(answer);
      },
    },
    {
      method: 'post',
      path: '/damping-rules',
      access: signedIn('desk', 'admin'),
      handler: async (req, res) => {
        const input = await parseInput(dampingRuleCreateSchema, req.body);
        const answer: DampingRuleAnswer = { rule: await rules.create(currentUser(req), input) };
        res.status(201).json(answer);
      },
    },
    {
      method: 'patch',
      path: '/damping-rules/:id',
      access: signedIn('admin'),
      handler: async (req, res) => {
        const id = idParam(req);
        const patch = await parseInput(dampingRulePatchSchema, req.body);
        const answer: DampingRuleAnswer = { rule: await rules.update(currentUser(req), id, patch) };
        res.json(answer);
      },
    },
  ];
}
