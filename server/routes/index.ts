import { AppContext } from '../context';
import { healthRoutes } from './health.router';
import { RouteSpec } from './route-table';

/** The whole API, in one table. */
export function apiRoutes(ctx: AppContext): RouteSpec[] {
  return [...healthRoutes(ctx)];
}
