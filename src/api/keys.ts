/**
 * SWR cache keys, all in one place so a mutation can revalidate exactly what it changed.
 * A key is the API path it is fetched from, so the fetcher needs nothing else.
 */
import type { UserSearchInput } from '@shared/schemas/auth.schema';

const USERS_PATH = '/users';

export const keys = {
  health: '/health',
  /** One page of one search of the admin's user list. */
  users: ({ q, page, pageSize }: UserSearchInput) =>
    `${USERS_PATH}?${new URLSearchParams({ q, page: String(page), pageSize: String(pageSize) })}`,
  /** Every page of every search: what a change to an account makes stale. */
  isUsers: (key: unknown) => typeof key === 'string' && key.startsWith(`${USERS_PATH}?`),
  outbox: '/dev/outbox',
  outboxMail: (id: string) => `/dev/outbox/${encodeURIComponent(id)}`,
} as const;

/** The rider's side: units, weigh-in, garage, drafts, passes and the setup log. */
export const riderKeys = {
  units: '/me/units',
  weighIn: '/weigh-in',
  bikes: '/bikes',
  bike: (id: number) => `/bikes/${id}`,
  draft: (bikeId: number) => `/bikes/${bikeId}/draft`,
  bikeRecords: (bikeId: number) => `/bikes/${bikeId}/sizing-records`,
  record: (id: number) => `/sizing-records/${id}`,
  setupLog: (bikeId: number) => `/bikes/${bikeId}/setup-log`,
  backToBaseline: (bikeId: number) => `/bikes/${bikeId}/setup-log/back-to-baseline`,
  loadCases: (bikeId: number) => `/bikes/${bikeId}/load-cases`,
  loadCase: (bikeId: number) => `/bikes/${bikeId}/load-case`,
  bikeModels: '/bike-models',
  bikeModel: (id: number) => `/bike-models/${id}`,
  targetProfiles: '/target-profiles',
  damperKinds: '/damper-kinds',
} as const;

/** The parts counter: the spring catalogue, its stock and its imports. */
export const counterKeys = {
  springs: (query: string) => `/catalogue/springs?${query}`,
  spring: (id: number, query: string) => `/catalogue/springs/${id}?${query}`,
  /** Who holds a spring's reserved units. */
  holds: (id: number) => `/stock/${id}/holds`,
  /** Every list page and every detail: what a stock change or an import makes stale. */
  isCatalogue: (key: unknown) => typeof key === 'string' && key.startsWith('/catalogue/'),
  families: '/catalogue/families',
  ratesForFit: (query: string) => `/catalogue/rates-for-fit?${query}`,
  lowStock: (query: string) => `/catalogue/low-stock?${query}`,
  imports: (page: number) => `/imports?page=${page}&pageSize=20`,
  isImports: (key: unknown) => typeof key === 'string' && key.startsWith('/imports?'),
  springsCsv: '/catalogue/springs.csv',
  movementsCsv: '/stock/movements.csv',
  lowStockCsv: '/catalogue/low-stock.csv',
} as const;

/** The admin's shop data. */
export const shopDataKeys = {
  engineSettings: '/engine-settings',
  audit: (entity: string | undefined, page: number) =>
    `/audit?${new URLSearchParams({ ...(entity && { entity }), page: String(page), pageSize: '25' })}`,
} as const;

/** The service desk: shop settings, customers and quotes, and the customer's quote link. */
export const deskKeys = {
  shopSettings: '/shop-settings',
  customers: (q: string, page: number) =>
    `/customers?${new URLSearchParams({ q, page: String(page), pageSize: '20' })}`,
  riderBikes: (riderId: number) => `/bikes?riderId=${riderId}`,
  quotes: (status: string) =>
    `/quotes?${new URLSearchParams({ ...(status && { status }), page: '1', pageSize: '100' })}`,
  /** Every list of quotes: what a change to any quote makes stale. */
  isQuotes: (key: unknown) => typeof key === 'string' && key.startsWith('/quotes?'),
  quote: (id: number) => `/quotes/${id}`,
  springOptions: (id: number) => `/quotes/${id}/spring-options`,
  customerQuote: (token: string) => `/customer-quotes/${encodeURIComponent(token)}`,
} as const;

/** The test-ride loop's symptom-to-change table (desk and admin). */
export const dampingRuleKeys = {
  rules: '/damping-rules',
  rule: (id: number) => `/damping-rules/${id}`,
} as const;

/**
 * The test-ride loop of one bike and its damping adjusters' way back to the maker's standard or the
 * baseline. Staff work a customer's bike through the same paths: the server checks ownership.
 */
export const testRideKeys = {
  rides: (bikeId: number) => `/bikes/${bikeId}/test-rides`,
  made: (rideId: number) => `/test-rides/${rideId}/made`,
  outcome: (rideId: number) => `/test-rides/${rideId}/outcome`,
  undo: (rideId: number) => `/test-rides/${rideId}/undo`,
  damperPlans: (bikeId: number) => `/bikes/${bikeId}/damper-plans`,
  /** `target` is 'standard' or 'baseline'. */
  applyDamperPlan: (bikeId: number, target: string) => `/bikes/${bikeId}/damper-plans/${target}`,
  /** The desk's lists of a customer's bikes, which show the settings a change moves. */
  isCustomerBikes: (key: unknown) => typeof key === 'string' && key.startsWith(`${riderKeys.bikes}?riderId=`),
} as const;
