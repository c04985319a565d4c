/**
 * What the catalogue, stock and import routes answer. Rates are stored and sent in N/mm; each
 * answer that shows rates also carries them in the unit the caller asked for (`unit`).
 * Desk and rider accounts get `SpringSummary` (rates and availability); the parts counter and the
 * admin get `SpringDetail`, with stock, cost, supplier and bin.
 */
import type { SpringMaterial } from '../sizing/helical-spring';
import type { RateUnit } from '../units';
import type { QuoteStatus } from './quote';

export const SPRING_KINDS = ['fork', 'shock'] as const;
export type SpringKind = (typeof SPRING_KINDS)[number];

export const RATE_UNITS: readonly RateUnit[] = ['N/mm', 'kgf/mm', 'lbf/in'];

/** receive and correction change what is on the shelf; reserve and release what is promised; fit consumes. */
export const MOVEMENT_KINDS = ['receive', 'correction', 'reserve', 'release', 'fit'] as const;
export type MovementKind = (typeof MOVEMENT_KINDS)[number];

export const SPRING_SORTS = ['sku', 'rate', 'family', 'onHand', 'available'] as const;
export type SpringSort = (typeof SPRING_SORTS)[number];

export interface SpringSummary {
  id: number;
  sku: string;
  kind: SpringKind;
  family: string;
  rateNmm: number;
  secondRateNmm: number | null;
  breakMm: number | null;
  /** rateNmm and secondRateNmm in the answer's unit. */
  rateInUnit: number;
  secondRateInUnit: number | null;
  freeLengthMm: number;
  innerDiameterMm: number | null;
  outerDiameterMm: number | null;
  wireDiameterMm: number | null;
  maxDeflectionMm: number;
  priceCents: number | null;
  /** On hand less reserved. */
  available: number;
  active: boolean;
}

export interface SpringDetail extends SpringSummary {
  onHand: number;
  reserved: number;
  reorderPoint: number;
  /** Fewer available than the reorder point. */
  belowReorderPoint: boolean;
  costCents: number | null;
  supplier: string | null;
  supplierCode: string | null;
  bin: string | null;
}

export type SpringView = SpringSummary | SpringDetail;

export interface SpringPage {
  springs: SpringView[];
  total: number;
  page: number;
  pageSize: number;
  unit: RateUnit;
}

export interface MovementUser {
  id: number;
  name: string;
}

export interface StockMovementView {
  id: number;
  springId: number;
  sku: string;
  kind: MovementKind;
  onHandDelta: number;
  reservedDelta: number;
  onHandAfter: number;
  reservedAfter: number;
  /** ISO 8601. */
  at: string;
  /** Null for stock the system recorded itself (opening stock). */
  user: MovementUser | null;
  reason: string;
  quoteId: number | null;
  importBatchId: number | null;
  /** The hold a reserve, release or fit moved. */
  holdId: number | null;
}

export interface MovementPage {
  movements: StockMovementView[];
  total: number;
  page: number;
  pageSize: number;
}

/** GET /catalogue/springs/:id: staff get the history beside the spring. */
export interface SpringAnswer {
  spring: SpringView;
  unit: RateUnit;
  movements?: MovementPage;
}

/**
 * Who holds reserved units: a quote (from its acceptance until it is cancelled, expires or is
 * fitted) or a hold made by name at the counter. A spring's `reserved` is the sum of its open holds.
 */
export const HOLD_STATUSES = ['open', 'released', 'fitted'] as const;
export type HoldStatus = (typeof HOLD_STATUSES)[number];

export type HoldHolder =
  | { kind: 'manual'; name: string }
  | { kind: 'quote'; quoteId: number; number: string; version: number; status: QuoteStatus; riderName: string };

export interface StockHoldView {
  id: number;
  springId: number;
  holder: HoldHolder;
  /** Units still held. */
  quantity: number;
  /** Units held when it was made. */
  heldQuantity: number;
  status: HoldStatus;
  reason: string;
  /** ISO 8601. */
  createdAt: string;
  /** Null for holds the system made (carried over from before holds were recorded). */
  createdBy: MovementUser | null;
}

/** GET /stock/:id/holds: the spring's open holds, oldest first. */
export interface StockHoldList {
  holds: StockHoldView[];
}

/** The answer of every stock route: the spring as it now stands and the row just written (a count that matched writes a row of 0). */
export interface StockAnswer {
  spring: SpringView;
  movement: StockMovementView;
  /** The hold a reserve, release or fit moved, as it now stands. */
  hold?: StockHoldView;
}

export interface FamilySummary {
  kind: SpringKind;
  family: string;
  /** Active springs of the fit. */
  springs: number;
  available: number;
}

export interface RateMatch {
  spring: SpringView;
  /** Spring rate less the target, N/mm. */
  differenceNmm: number;
  differencePct: number;
}

export interface RatesForFit {
  kind: SpringKind;
  family: string;
  targetNmm: number;
  targetInUnit: number;
  unit: RateUnit;
  matches: RateMatch[];
}

export interface LowStockLine {
  spring: SpringDetail;
  /** Units that bring availability back up to the reorder point. */
  shortfall: number;
}

export interface IdentifyAnswer {
  material: SpringMaterial;
  shearModulusMpa: number;
  meanDiameterMm: number;
  activeCoils: number;
  springIndex: number;
  rateNmm: number;
  rateRangeNmm: [number, number];
  rateInUnit: number;
  rateRangeInUnit: [number, number];
  unit: RateUnit;
  notes: string[];
  /** The nearest active catalogue rates, of the kind and family asked for when given. */
  matches: RateMatch[];
}

export type ImportOutcome = 'new' | 'updated' | 'unchanged' | 'error';

export interface ImportCellError {
  /** The column as the file's header names it. */
  column: string;
  message: string;
}

export interface ImportRowReport {
  /** Line in the file where the row starts; the header is line 1. */
  line: number;
  sku: string;
  outcome: ImportOutcome;
  /** Fields an update changes. */
  changes?: string[];
  /** A count correction from the on-hand column. */
  stock?: { from: number; to: number };
  errors?: ImportCellError[];
}

export interface ImportCounts {
  rows: number;
  new: number;
  updated: number;
  unchanged: number;
  errors: number;
  /** Count-correction movements the on-hand column makes. */
  stockCorrections: number;
}

export interface ImportDryRun {
  /** Send it back with the same file to confirm; null while any row has an error. */
  token: string | null;
  fileName: string;
  contentSha256: string;
  /** The file's columns that were read, and those that were not (unknown names). */
  columns: string[];
  ignoredColumns: string[];
  counts: ImportCounts;
  rows: ImportRowReport[];
}

export interface ImportBatchView {
  id: number;
  /** ISO 8601. */
  at: string;
  user: MovementUser | null;
  fileName: string;
  contentSha256: string;
  rows: number;
  created: number;
  updated: number;
  unchanged: number;
  stockCorrections: number;
}

export interface ImportBatchPage {
  batches: ImportBatchView[];
  total: number;
  page: number;
  pageSize: number;
}

export interface ImportConfirmAnswer {
  batch: ImportBatchView;
  counts: ImportCounts;
}
