import type { AppContext } from '../app-context';
import { authRoutes } from './auth.router';
import { bikeModelRoutes } from './bike-models.router';
import { bikeRoutes } from './bikes.router';
import { draftRoutes } from './drafts.router';
import { loadCaseRoutes } from './load-cases.router';
import { profileRoutes } from './profile.router';
import { setupLogRoutes } from './setup-log.router';
import { shopDataRoutes } from './shop-data.router';
import { sizingRecordRoutes } from './sizing-records.router';
import { catalogueRoutes } from './catalogue.router';
import { devRoutes } from './dev.router';
import { healthRoutes } from './health.router';
import { importRoutes } from './imports.router';
import { RouteSpec } from './route-table';
import { sizingRoutes } from './sizing.router';
import { stockRoutes } from './stock.router';
import { userRoutes } from './users.router';
import { customerQuoteRoutes } from './customer-quote.router';
import { customerRoutes } from './customers.router';
import { paymentRoutes } from './payments.router';
import { quoteRoutes } from './quotes.router';
import { shopSettingsRoutes } from './shop-settings.router';
import { damperKindRoutes } from './damper-kinds.router';
import { dampingRuleRoutes } from './damping-rules.router';
import { testRideRoutes } from './test-rides.router';
import { damperPlanRoutes } from './damper-plans.router';

/** The whole API, in one table. */
export function apiRoutes(ctx: AppContext): RouteSpec[] {
  return [...healthRoutes(ctx), ...authRoutes(ctx), ...userRoutes(ctx), ...sizingRoutes(ctx), ...devRoutes(ctx), ...catalogueRoutes(ctx), ...stockRoutes(ctx), ...importRoutes(ctx), ...bikeModelRoutes(ctx), ...bikeRoutes(ctx), ...profileRoutes(ctx), ...draftRoutes(ctx), ...sizingRecordRoutes(ctx), ...setupLogRoutes(ctx), ...loadCaseRoutes(ctx), ...shopDataRoutes(ctx), ...shopSettingsRoutes(ctx), ...customerRoutes(ctx), ...quoteRoutes(ctx), ...customerQuoteRoutes(ctx), ...paymentRoutes(ctx), ...damperKindRoutes(ctx), ...dampingRuleRoutes(ctx), ...testRideRoutes(ctx), ...damperPlanRoutes(ctx)];
}
