import { AppContext } from '../context';
import { authRoutes } from './auth.router';
import { devRoutes } from './dev.router';
import { healthRoutes } from './health.router';
import { RouteSpec } from './route-table';
import { sizingRoutes } from './sizing.router';
import { userRoutes } from './users.router';

/** The whole API, in one table. */
export function apiRoutes(ctx: AppContext): RouteSpec[] {
  return [...healthRoutes(ctx), ...authRoutes(ctx), ...userRoutes(ctx), ...sizingRoutes(ctx), ...devRoutes(ctx)];
}
