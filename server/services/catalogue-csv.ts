/**
 * The catalogue's CSV columns: the header the export writes and the names the import recognises.
 * Headers are matched loosely (case, spaces, brackets, camelCase: "Rate (kgf/mm)", "rate_kgf_mm"
 * and "rateKgfMm" are one column); a rate column may name its unit, otherwise a `unit` column or
 * the upload's unit applies, N/mm when neither is given.
 */
import type { RateUnit } from '../../shared/units';

export type ImportField =
  | 'sku'
  | 'kind'
  | 'family'
  | 'rateNmm'
  | 'secondRateNmm'
  | 'breakMm'
  | 'freeLengthMm'
  | 'innerDiameterMm'
  | 'outerDiameterMm'
  | 'wireDiameterMm'
  | 'maxDeflectionMm'
  | 'supplier'
  | 'supplierCode'
  | 'costCents'
  | 'priceCents'
  | 'bin'
  | 'onHand'
  | 'reorderPoint'
  | 'active'
  | 'unit';

/** How a cell is read: money either as integer cents or as an amount like 12.50. */
export type CellType = 'text' | 'kind' | 'length' | 'rate' | 'cents' | 'amount' | 'count' | 'boolean' | 'unit';

export interface ColumnBinding {
  index: number;
  /** As the file wrote it, for messages. */
  header: string;
  field: ImportField;
  type: CellType;
  /** A rate column whose header names its unit. */
  unit?: RateUnit;
}

/** The export's columns in order; each is read back by the import unchanged. */
export const CATALOGUE_COLUMNS: readonly { header: string; field: Exclude<ImportField, 'unit'> }[] = [
  { header: 'sku', field: 'sku' },
  { header: 'kind', field: 'kind' },
  { header: 'family', field: 'family' },
  { header: 'rate_n_mm', field: 'rateNmm' },
  { header: 'second_rate_n_mm', field: 'secondRateNmm' },
  { header: 'break_mm', field: 'breakMm' },
  { header: 'free_length_mm', field: 'freeLengthMm' },
  { header: 'inner_diameter_mm', field: 'innerDiameterMm' },
  { header: 'outer_diameter_mm', field: 'outerDiameterMm' },
  { header: 'wire_diameter_mm', field: 'wireDiameterMm' },
  { header: 'max_deflection_mm', field: 'maxDeflectionMm' },
  { header: 'supplier', field: 'supplier' },
  { header: 'supplier_code', field: 'supplierCode' },
  { header: 'cost_cents', field: 'costCents' },
  { header: 'price_cents', field: 'priceCents' },
  { header: 'bin', field: 'bin' },
  { header: 'on_hand', field: 'onHand' },
  { header: 'reorder_point', field: 'reorderPoint' },
  { header: 'active', field: 'active' },
];

/** The header a message names for a field the file has no column for. */
export const CANONICAL_HEADER: Record<ImportField, string> = {
  ...(Object.fromEntries(CATALOGUE_COLUMNS.map((c) => [c.field, c.header])) as Record<Exclude<ImportField, 'unit'>, string>),
  unit: 'unit',
};

const RATE_UNIT_NAMES: Record<string, RateUnit> = {
  n_mm: 'N/mm',
  nmm: 'N/mm',
  kgf_mm: 'kgf/mm',
  kg_mm: 'kgf/mm',
  kgfmm: 'kgf/mm',
  lbf_in: 'lbf/in',
  lb_in: 'lbf/in',
  lbs_in: 'lbf/in',
  lbfin: 'lbf/in',
};

const mm = (name: string) => [name, `${name}_mm`];

const NAMED_COLUMNS: [string[], ImportField, CellType][] = [
  [['sku'], 'sku', 'text'],
  [['kind'], 'kind', 'kind'],
  [['family', 'fit'], 'family', 'text'],
  [[...mm('break'), ...mm('break_point')], 'breakMm', 'length'],
  [mm('free_length'), 'freeLengthMm', 'length'],
  [mm('inner_diameter'), 'innerDiameterMm', 'length'],
  [mm('outer_diameter'), 'outerDiameterMm', 'length'],
  [mm('wire_diameter'), 'wireDiameterMm', 'length'],
  [mm('max_deflection'), 'maxDeflectionMm', 'length'],
  [['supplier'], 'supplier', 'text'],
  [['supplier_code', 'supplier_part', 'supplier_part_code'], 'supplierCode', 'text'],
  [['cost_cents'], 'costCents', 'cents'],
  [['cost'], 'costCents', 'amount'],
  [['price_cents', 'sale_price_cents'], 'priceCents', 'cents'],
  [['price', 'sale_price'], 'priceCents', 'amount'],
  [['bin', 'bin_location', 'location'], 'bin', 'text'],
  [['on_hand', 'onhand', 'stock'], 'onHand', 'count'],
  [['reorder_point', 'reorder'], 'reorderPoint', 'count'],
  [['active'], 'active', 'boolean'],
  [['unit', 'rate_unit'], 'unit', 'unit'],
];

const COLUMN_BY_NAME = new Map<string, { field: ImportField; type: CellType }>(
  NAMED_COLUMNS.flatMap(([names, field, type]) => names.map((name) => [name, { field, type }] as const)),
);

/** "Rate (kgf/mm)" → "rate_kgf_mm"; "freeLengthMm" → "free_length_mm". */
export function normaliseName(text: string): string {
  return text
    .trim()
    .replace(/([a-z0-9])([A-Z])/g, '$1_$2')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '_')
    .replace(/^_+|_+$/g, '');
}

export function readRateUnit(text: string): RateUnit | undefined {
  return RATE_UNIT_NAMES[normaliseName(text)];
}

function recogniseRate(name: string): { field: ImportField; unit?: RateUnit } | undefined {
  for (const [base, field] of [
    ['second_rate', 'secondRateNmm'],
    ['rate', 'rateNmm'],
  ] as const) {
    if (name === base) return { field };
    if (name.startsWith(`${base}_`)) {
      const unit = RATE_UNIT_NAMES[name.slice(base.length + 1)];
      if (unit) return { field, unit };
    }
  }
  return undefined;
}

export interface HeaderBinding {
  bindings: ColumnBinding[];
  /** Headers not recognised; their cells are not read. */
  ignored: string[];
  /** Two columns for one field. */
  duplicates: { field: ImportField; headers: [string, string] }[];
}

export function bindHeader(headers: readonly string[]): HeaderBinding {
  const bindings: ColumnBinding[] = [];
  const ignored: string[] = [];
  const duplicates: HeaderBinding['duplicates'] = [];
  headers.forEach((header, index) => {
    const name = normaliseName(header);
    const rate = recogniseRate(name);
    const known = rate ? { field: rate.field, type: 'rate' as const, unit: rate.unit } : COLUMN_BY_NAME.get(name);
    if (!known) {
      if (header.trim()) ignored.push(header);
      return;
    }
    const earlier = bindings.find((b) => b.field === known.field);
    if (earlier) duplicates.push({ field: known.field, headers: [earlier.header, header] });
    else bindings.push({ index, header, ...known });
  });
  return { bindings, ignored, duplicates };
}
