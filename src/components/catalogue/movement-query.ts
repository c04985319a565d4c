/** The ledger's filters as the screen holds them, and the query string GET /stock/movements (and its CSV) reads. */
import type { MovementKind } from '@shared/types/catalogue';

export type MovementFilters = {
  kind?: MovementKind;
  /** Calendar days as typed, YYYY-MM-DD; empty means no bound. */
  from: string;
  to: string;
  importBatchId?: number;
  spring?: { id: number; sku: string };
  page: number;
};

export const MOVEMENTS_PAGE_SIZE = 25;

export const NO_MOVEMENT_FILTERS: MovementFilters = { from: '', to: '', page: 1 };

const DAY = /^\d{4}-\d{2}-\d{2}$/;

/** A typed day, or undefined when it is empty or no real date (2025-02-30). */
export function parseDay(text: string): string | undefined {
  const day = text.trim();
  if (!DAY.test(day)) return undefined;
  const date = new Date(`${day}T00:00:00Z`);
  return Number.isNaN(date.getTime()) || date.toISOString().slice(0, 10) !== day ? undefined : day;
}

const nextDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);

/**
 * The filters in use, without paging: what the CSV export takes. Days are whole UTC days, as the
 * ledger's times are UTC; the server's `to` is exclusive, so the "to" day is sent as the next midnight.
 */
export function buildMovementFilterQuery(filters: MovementFilters): URLSearchParams {
  const params = new URLSearchParams();
  if (filters.spring) params.set('springId', String(filters.spring.id));
  if (filters.kind) params.set('kind', filters.kind);
  if (filters.importBatchId) params.set('importBatchId', String(filters.importBatchId));
  const from = parseDay(filters.from);
  const to = parseDay(filters.to);
  if (from) params.set('from', `${from}T00:00:00Z`);
  if (to) params.set('to', `${nextDay(to)}T00:00:00Z`);
  return params;
}

/** The list's query: the filters and the page. */
export function buildMovementQuery(filters: MovementFilters): string {
  const params = buildMovementFilterQuery(filters);
  params.set('page', String(filters.page));
  params.set('pageSize', String(MOVEMENTS_PAGE_SIZE));
  return params.toString();
}
