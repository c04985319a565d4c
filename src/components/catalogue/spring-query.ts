/** The catalogue's filters as the screen holds them, and the query string GET /catalogue/springs reads. */
import type { SpringKind, SpringSort } from '@shared/types/catalogue';
import type { RateUnit } from '@shared/units';

export type SpringFilters = {
  q: string;
  kind?: SpringKind;
  family?: string;
  /** Typed text in the person's rate unit; empty means no bound. */
  rateMin: string;
  rateMax: string;
  inStock: boolean;
  belowReorder: boolean;
  sort: SpringSort;
  order: 'asc' | 'desc';
  page: number;
};

export const PAGE_SIZE = 25;

export const NO_FILTERS: SpringFilters = {
  q: '',
  rateMin: '',
  rateMax: '',
  inStock: false,
  belowReorder: false,
  sort: 'sku',
  order: 'asc',
  page: 1,
};

/** A typed rate, point or comma, or undefined when it is empty or not a number. */
export function parseRate(text: string): number | undefined {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) && value >= 0 ? value : undefined;
}

/** Only the filters in use travel, so the same search always makes the same cache key. */
export function buildSpringQuery(filters: SpringFilters, unit: RateUnit): string {
  const params = new URLSearchParams();
  if (filters.q.trim()) params.set('q', filters.q.trim());
  if (filters.kind) params.set('kind', filters.kind);
  if (filters.family) params.set('family', filters.family);
  const rateMin = parseRate(filters.rateMin);
  const rateMax = parseRate(filters.rateMax);
  if (rateMin !== undefined) params.set('rateMin', String(rateMin));
  if (rateMax !== undefined) params.set('rateMax', String(rateMax));
  if (filters.inStock) params.set('inStock', 'true');
  if (filters.belowReorder) params.set('belowReorder', 'true');
  params.set('unit', unit);
  params.set('sort', filters.sort);
  params.set('order', filters.order);
  params.set('page', String(filters.page));
  params.set('pageSize', String(PAGE_SIZE));
  return params.toString();
}
