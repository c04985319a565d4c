/**
 * The test-ride loop of a bike: its rides, a report of what the bike did, and each ride's change
 * made, judged and (when worse) taken back. Anyone signed in reaches their own bikes' rides; desk
 * and admin reach every customer's, as with the bike routes.
 */
import { testRideOutcomeSchema, testRideReportSchema } from '../../shared/schemas/damping.schema';
import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/auth';
import { TestRidesService } from '../services/test-rides.service';
import { idParam } from './params';
import { anyRole, RouteSpec } from './route-table';
import { parseInput } from './validate';

export function testRideRoutes(ctx: AppContext): RouteSpec[] {
  const rides = new TestRidesService(ctx);
  return [
    {
      method: 'get',
      path: '/bikes/:id/test-rides',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await rides.list(currentUser(req), idParam(req)));
      },
    },
    {
      method: 'post',
      path: '/bikes/:id/test-rides',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = await parseInput(testRideReportSchema, req.body);
        res.status(201).json(await rides.report(currentUser(req), id, input));
      },
    },
    {
      method: 'post',
      path: '/test-rides/:id/made',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await rides.made(currentUser(req), idParam(req)));
      },
    },
    {
      method: 'post',
      path: '/test-rides/:id/outcome',
      access: anyRole,
      handler: async (req, res) => {
        const id = idParam(req);
        const input = await parseInput(testRideOutcomeSchema, req.body);
        res.json(await rides.judge(currentUser(req), id, input));
      },
    },
    {
      method: 'post',
      path: '/test-rides/:id/undo',
      access: anyRole,
      handler: async (req, res) => {
        res.json(await rides.undo(currentUser(req), idParam(req)));
      },
    },
  ];
}
