/**
 * What the parts counter asks of a large catalogue, shared by the benchmark (over HTTP) and the
 * query-plan report (in process): searches of GET /api/catalogue/springs as the counter's screen
 * sends them, and the reads the sizing makes for a fit.
 */
export interface SearchScenario {
  name: string;
  /** The query string of GET /api/catalogue/springs. */
  query: string;
}

export const SEARCH_SCENARIOS: readonly SearchScenario[] = [
  { name: 'first page by SKU', query: '' },
  { name: 'fit, by rate', query: 'kind=fork&family=F43x290&sort=rate' },
  { name: 'rate range in stock', query: 'kind=shock&rateMin=80&rateMax=90&unit=N%2Fmm&inStock=true&sort=rate' },
  { name: 'text: fit fragment', query: 'q=x320&sort=rate' },
  { name: 'text: SKU start', query: 'q=QM-F43' },
  { name: 'text: supplier code', query: 'q=TW4312' },
  { name: 'text: no match', query: 'q=zz9' },
  { name: 'low stock, by available', query: 'belowReorder=true&sort=available' },
  { name: 'fit in stock, most available first', query: 'kind=shock&family=S56x150&inStock=true&sort=available&order=desc' },
  { name: 'page 40 by family', query: 'sort=family&page=40' },
];

/** A fit the generated catalogue fills (250 springs) and the demo has too, for the sizing's candidate read. */
export const CANDIDATE_FIT = { kind: 'fork', family: 'F43x290' } as const;

/** GET /api/catalogue/rates-for-fit: the nearest rates of a fit, what the counter offers beside a recommendation. */
export const RATES_FOR_FIT_QUERY = `kind=${CANDIDATE_FIT.kind}&family=${CANDIDATE_FIT.family}&rate=9.3&unit=N%2Fmm&limit=5`;
