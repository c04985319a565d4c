/** A bike's load cases: the settings each needs on its fitted spring, and the switch between them. */
import { loadCaseSwitchSchema } from '../../shared/schemas/setup-log.schema';
import type { LoadCaseSwitchInput } from '../../shared/types/load-case';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { LoadCasesService } from '../services/load-cases.service';
import { idParam } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function loadCaseRoutes(ctx: AppContext): RouteSpec[] {
  const loadCases = new LoadCasesService(ctx);
  return [
    {
      method: 'get',
      path: '/bikes/:id/load-cases',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await loadCases.list(currentUser(req), idParam(req)));
      },
    },
    {
      method: 'post',
      path: '/bikes/:id/load-case',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = (await parseInput(loadCaseSwitchSchema, req.body)) as LoadCaseSwitchInput;
        res.status(201).json(await loadCases.switchTo(currentUser(req), id, input.name));
      },
    },
  ];
}
