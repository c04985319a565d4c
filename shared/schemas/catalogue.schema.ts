/**
 * Input of the catalogue, stock and identify routes, checked alike by the counter's forms and the
 * server. The field rules live in plain tables and check functions so the CSV import applies the
 * very same rules to 100,000 rows without building a Yup schema per row. Bodies are in SI (mm,
 * N/mm) like the sizing API; query filters take a rate `unit`.
 */
import { boolean, InferType, mixed, number, object, string, type TestContext } from 'yup';
import { SHEAR_MODULUS, SPRING_MATERIALS, type SpringMaterial } from '../sizing/helical-spring';
import { MOVEMENT_KINDS, RATE_UNITS, SPRING_KINDS, SPRING_SORTS, type MovementKind, type SpringKind, type SpringSort } from '../types/catalogue';
import type { RateUnit } from '../units';

export const MAX_PAGE_SIZE = 200;
export const MAX_STOCK_QUANTITY = 1_000_000;

interface NumberRule {
  label: string;
  unit: string;
  min: number;
  /** The minimum itself is refused (a rate of 0). */
  aboveMin?: boolean;
  max: number;
  integer?: boolean;
}

export const SPRING_NUMBER_RULES = {
  rateNmm: { label: 'Rate', unit: ' N/mm', min: 0, aboveMin: true, max: 1000 },
  secondRateNmm: { label: 'Second rate', unit: ' N/mm', min: 0, aboveMin: true, max: 1000 },
  breakMm: { label: 'Break point', unit: ' mm', min: 0, aboveMin: true, max: 1000 },
  freeLengthMm: { label: 'Free length', unit: ' mm', min: 0, aboveMin: true, max: 1000 },
  innerDiameterMm: { label: 'Inner diameter', unit: ' mm', min: 0, aboveMin: true, max: 300 },
  outerDiameterMm: { label: 'Outer diameter', unit: ' mm', min: 0, aboveMin: true, max: 300 },
  wireDiameterMm: { label: 'Wire diameter', unit: ' mm', min: 0, aboveMin: true, max: 50 },
  maxDeflectionMm: { label: 'Maximum deflection', unit: ' mm', min: 0, aboveMin: true, max: 1000 },
  costCents: { label: 'Cost', unit: ' cents', min: 0, max: 100_000_000, integer: true },
  priceCents: { label: 'Sale price', unit: ' cents', min: 0, max: 100_000_000, integer: true },
  reorderPoint: { label: 'Reorder point', unit: '', min: 0, max: MAX_STOCK_QUANTITY, integer: true },
} satisfies Record<string, NumberRule>;

export type SpringNumberField = keyof typeof SPRING_NUMBER_RULES;

export const SPRING_TEXT_RULES = {
  sku: { label: 'SKU', max: 40 },
  family: { label: 'Family', max: 60 },
  supplier: { label: 'Supplier', max: 80 },
  supplierCode: { label: "Supplier's code", max: 60 },
  bin: { label: 'Bin', max: 30 },
} satisfies Record<string, { label: string; max: number }>;

export type SpringTextField = keyof typeof SPRING_TEXT_RULES;

/** Fields a spring must have; the rest may be left empty. */
export const REQUIRED_SPRING_FIELDS = ['sku', 'kind', 'family', 'rateNmm', 'freeLengthMm', 'maxDeflectionMm'] as const;

export const SPRING_FIELD_LABELS: Record<string, string> = {
  kind: 'Kind',
  active: 'Active',
  ...Object.fromEntries(Object.entries(SPRING_NUMBER_RULES).map(([key, rule]) => [key, rule.label])),
  ...Object.fromEntries(Object.entries(SPRING_TEXT_RULES).map(([key, rule]) => [key, rule.label])),
};

/** The message for a number outside its rule, or undefined when it is fine. */
export function checkSpringNumber(field: SpringNumberField, value: number): string | undefined {
  const rule: NumberRule = SPRING_NUMBER_RULES[field];
  if (!Number.isFinite(value)) return `${rule.label} must be a number.`;
  if (rule.integer && !Number.isInteger(value)) return `${rule.label} must be a whole number${rule.unit}.`;
  const low = rule.aboveMin ? value <= rule.min : value < rule.min;
  if (low || value > rule.max) {
    return `${rule.label} must be ${rule.aboveMin ? 'above' : 'at least'} ${rule.min} and at most ${rule.max}${rule.unit}.`;
  }
  return undefined;
}

// A leading = + - @ makes a spreadsheet read the cell as a formula when the exports are opened.
const FORMULA_START = /^[=+\-@]/;
const CONTROL_CHARACTER = /[\u0000-\u001f\u007f]/;

/** The message for a text outside its rule, or undefined when it is fine; the text is already trimmed. */
export function checkSpringText(field: SpringTextField, value: string): string | undefined {
  const rule = SPRING_TEXT_RULES[field];
  if (value.length > rule.max) return `${rule.label} must be at most ${rule.max} characters.`;
  return checkPlainText(rule.label, value);
}

function checkPlainText(label: string, value: string): string | undefined {
  if (CONTROL_CHARACTER.test(value)) return `${label} must not contain tabs, line breaks or other control characters.`;
  if (FORMULA_START.test(value)) return `${label} must not start with =, +, - or @: spreadsheets would read it as a formula.`;
  return undefined;
}

export interface SpringShape {
  rateNmm?: number | null;
  secondRateNmm?: number | null;
  breakMm?: number | null;
  freeLengthMm?: number | null;
  innerDiameterMm?: number | null;
  outerDiameterMm?: number | null;
  wireDiameterMm?: number | null;
  maxDeflectionMm?: number | null;
}

const given = (value: number | null | undefined): value is number => typeof value === 'number' && Number.isFinite(value);

/** Rules between fields, one message per field at fault; the whole spring (after an update) is checked. */
export function findSpringConflicts(spring: SpringShape): Partial<Record<keyof SpringShape, string>> {
  const problems: Partial<Record<keyof SpringShape, string>> = {};
  if (given(spring.secondRateNmm) && !given(spring.breakMm)) {
    problems.breakMm = 'A second rate needs its break point: give the compression where the second rate starts.';
  }
  if (given(spring.breakMm) && !given(spring.secondRateNmm)) {
    problems.secondRateNmm = 'A break point needs the second rate: give the rate above it.';
  }
  if (given(spring.breakMm) && given(spring.maxDeflectionMm) && spring.breakMm >= spring.maxDeflectionMm) {
    problems.breakMm = 'The break point must come before coil bind: make it less than the maximum deflection.';
  }
  if (given(spring.maxDeflectionMm) && given(spring.freeLengthMm) && spring.maxDeflectionMm >= spring.freeLengthMm) {
    problems.maxDeflectionMm = 'The maximum deflection must be less than the free length.';
  }
  if (given(spring.innerDiameterMm) && given(spring.outerDiameterMm) && spring.innerDiameterMm >= spring.outerDiameterMm) {
    problems.innerDiameterMm = 'The inner diameter must be less than the outer diameter.';
  }
  if (given(spring.wireDiameterMm) && given(spring.outerDiameterMm) && 2 * spring.wireDiameterMm >= spring.outerDiameterMm) {
    problems.wireDiameterMm = 'Two wire diameters must fit inside the outer diameter.';
  }
  return problems;
}

function numberField(field: SpringNumberField) {
  const { label } = SPRING_NUMBER_RULES[field];
  return number()
    .typeError(`${label} must be a number.`)
    .test('rule', function (value) {
      const problem = value == null ? undefined : checkSpringNumber(field, value);
      return problem ? this.createError({ message: problem }) : true;
    });
}

/** Empty text is stored as none. */
function textField(field: SpringTextField) {
  return string()
    .typeError(`${SPRING_TEXT_RULES[field].label} must be text.`)
    .trim()
    .transform((value: unknown) => (value === '' ? null : value))
    .test('rule', function (value) {
      const problem = value == null ? undefined : checkSpringText(field, value);
      return problem ? this.createError({ message: problem }) : true;
    });
}

const kindField = mixed<SpringKind>().oneOf(SPRING_KINDS, 'Kind must be fork or shock.');

/** Stock only moves through receive, count, reserve, release and fit, each recorded. */
function noDirectStock(field: 'onHand' | 'reserved') {
  return mixed().test('no-direct-stock', function (value) {
    if (value === undefined) return true;
    const how = field === 'onHand' ? 'receive the springs or record a count' : 'reserve or release them';
    return this.createError({ message: `Stock is not edited here: ${how}, so the change is recorded.`, path: field });
  });
}

function conflictsTest(this: TestContext, spring: SpringShape | undefined) {
  if (!spring) return true;
  const problems = Object.entries(findSpringConflicts(spring));
  if (!problems.length) return true;
  const [field, message] = problems[0];
  return this.createError({ path: field, message });
}

const springFields = {
  sku: textField('sku'),
  kind: kindField,
  family: textField('family'),
  rateNmm: numberField('rateNmm'),
  secondRateNmm: numberField('secondRateNmm').nullable(),
  breakMm: numberField('breakMm').nullable(),
  freeLengthMm: numberField('freeLengthMm'),
  innerDiameterMm: numberField('innerDiameterMm').nullable(),
  outerDiameterMm: numberField('outerDiameterMm').nullable(),
  wireDiameterMm: numberField('wireDiameterMm').nullable(),
  maxDeflectionMm: numberField('maxDeflectionMm'),
  supplier: textField('supplier').nullable(),
  supplierCode: textField('supplierCode').nullable(),
  costCents: numberField('costCents').nullable(),
  priceCents: numberField('priceCents').nullable(),
  bin: textField('bin').nullable(),
  reorderPoint: numberField('reorderPoint'),
  onHand: noDirectStock('onHand'),
  reserved: noDirectStock('reserved'),
};

export const springCreateSchema = object({
  ...springFields,
  sku: springFields.sku.required('Give the SKU the shop files this spring under.'),
  kind: springFields.kind.required('Kind is missing: fork or shock.'),
  family: springFields.family.required('Family is missing: the fit, such as S56x150 for a 56 mm shock spring 150 mm long.'),
  rateNmm: springFields.rateNmm.required('Rate is missing: give it in N/mm.'),
  freeLengthMm: springFields.freeLengthMm.required('Free length is missing: give it in mm.'),
  maxDeflectionMm: springFields.maxDeflectionMm.required('Maximum deflection is missing: the compression from free length to coil bind, in mm.'),
  secondRateNmm: springFields.secondRateNmm.default(null),
  breakMm: springFields.breakMm.default(null),
  innerDiameterMm: springFields.innerDiameterMm.default(null),
  outerDiameterMm: springFields.outerDiameterMm.default(null),
  wireDiameterMm: springFields.wireDiameterMm.default(null),
  supplier: springFields.supplier.default(null),
  supplierCode: springFields.supplierCode.default(null),
  costCents: springFields.costCents.default(null),
  priceCents: springFields.priceCents.default(null),
  bin: springFields.bin.default(null),
  reorderPoint: springFields.reorderPoint.default(0),
}).test('conflicts', conflictsTest);

/** Every field optional; the server checks the conflicts on the spring as it will be after the change. */
export const springUpdateSchema = object({
  ...springFields,
  sku: springFields.sku.nonNullable('The SKU cannot be removed.'),
  kind: springFields.kind.nonNullable('Kind cannot be removed: fork or shock.'),
  family: springFields.family.nonNullable('The family cannot be removed.'),
  rateNmm: springFields.rateNmm.nonNullable('The rate cannot be removed.'),
  freeLengthMm: springFields.freeLengthMm.nonNullable('The free length cannot be removed.'),
  maxDeflectionMm: springFields.maxDeflectionMm.nonNullable('The maximum deflection cannot be removed.'),
  reorderPoint: springFields.reorderPoint.nonNullable('The reorder point cannot be removed: give 0 for a spring not kept in stock.'),
});

function quantityField(label: string, min: number) {
  return number()
    .typeError(`${label} must be a whole number.`)
    .integer(`${label} must be a whole number.`)
    .min(min, `${label} must be at least ${min}.`)
    .max(MAX_STOCK_QUANTITY, `${label} must be at most ${MAX_STOCK_QUANTITY}.`)
    .required(`${label} is missing.`);
}

const reasonField = string()
  .typeError('The reason must be text.')
  .trim()
  .max(200, 'Keep the reason to 200 characters.')
  .required('Say why, for the stock history: a delivery note, a quote, a count.')
  .test('plain', function (value) {
    const problem = value ? checkPlainText('The reason', value) : undefined;
    return problem ? this.createError({ message: problem }) : true;
  });

const holdIdField = number().typeError('Choose the hold: its number.').integer('Choose the hold: its number.').min(1, 'Choose the hold: its number.');

/** Who or what a hold made at the counter is for, as the counter will read it in the list of holds. */
const holdNameField = string()
  .typeError('The name must be text.')
  .trim()
  .max(100, 'Keep the name to 100 characters.')
  .required('Say who or what the springs are held for: a name, a job, a bike.')
  .test('plain', function (value) {
    const problem = value ? checkPlainText('The name', value) : undefined;
    return problem ? this.createError({ message: problem }) : true;
  });

export const receiveSchema = object({ quantity: quantityField('Quantity', 1), reason: reasonField });

export const countSchema = object({ counted: quantityField('The counted quantity', 0), reason: reasonField });

/** A named hold made at the counter; a quote's holds are made only by its acceptance. */
export const reserveSchema = object({ quantity: quantityField('Quantity', 1), name: holdNameField, reason: reasonField });

/** Releases one hold made at the counter, all of what it holds unless a quantity is given. */
export const releaseSchema = object({
  holdId: holdIdField.required('Choose the hold to release: a release names what it releases.'),
  quantity: quantityField('Quantity', 1).optional(),
  reason: reasonField,
});

/** The counter's override: takes back a quote's hold, and the quote moves to springs-released. */
export const overrideReleaseSchema = object({
  holdId: holdIdField.required("Choose the quote's hold to release."),
  reason: reasonField,
});

export const fitSchema = object({
  quantity: quantityField('Quantity', 1),
  reason: reasonField,
  /** The counter's hold the units come from; without one they come from what is available. */
  holdId: holdIdField.optional(),
});

const unitField = mixed<RateUnit>().oneOf(RATE_UNITS, 'Unit must be N/mm, kgf/mm or lbf/in.').default('N/mm');
const pageField = number().typeError('Page must be a whole number.').integer('Page must be a whole number.').min(1, 'Page starts at 1.').default(1);

function pageSizeField(fallback: number, max = MAX_PAGE_SIZE) {
  return number()
    .typeError('Page size must be a whole number.')
    .integer('Page size must be a whole number.')
    .min(1, 'Page size must be at least 1.')
    .max(max, `Page size must be at most ${max}.`)
    .default(fallback);
}

const rateFilter = (label: string) => number().typeError(`${label} must be a number.`).min(0, `${label} cannot be negative.`);
const flag = (label: string) => boolean().typeError(`${label} must be true or false.`).default(false);

export const springListSchema = object({
  q: string().trim().max(100, 'Keep the search to 100 characters.').default(''),
  kind: kindField,
  family: string().trim().max(60),
  rateMin: rateFilter('The lowest rate'),
  rateMax: rateFilter('The highest rate'),
  unit: unitField,
  inStock: flag('inStock'),
  belowReorder: flag('belowReorder'),
  status: mixed<'active' | 'inactive' | 'all'>().oneOf(['active', 'inactive', 'all'], 'Status must be active, inactive or all.').default('active'),
  sort: mixed<SpringSort>().oneOf(SPRING_SORTS, `Sort by one of: ${SPRING_SORTS.join(', ')}.`).default('sku'),
  order: mixed<'asc' | 'desc'>().oneOf(['asc', 'desc'], 'Order must be asc or desc.').default('asc'),
  page: pageField,
  pageSize: pageSizeField(50),
}).test('rate-range', function (query) {
  if (query && query.rateMin != null && query.rateMax != null && query.rateMin > query.rateMax) {
    return this.createError({ path: 'rateMax', message: 'The highest rate must not be below the lowest.' });
  }
  return true;
});

export const springDetailSchema = object({ unit: unitField, page: pageField, pageSize: pageSizeField(20) });

export const unitQuerySchema = object({ unit: unitField, kind: kindField });

export const ratesForFitSchema = object({
  kind: kindField.required('Kind is missing: fork or shock.'),
  family: string().trim().max(60).required('Family is missing: the fit to look in.'),
  rate: number().typeError('The target rate must be a number.').moreThan(0, 'The target rate must be above 0.').required('Give the target rate.'),
  unit: unitField,
  inStock: flag('inStock'),
  limit: number().typeError('Limit must be a whole number.').integer().min(1).max(50, 'Limit must be at most 50.').default(5),
});

const coilsField = (label: string, min: number) =>
  number().typeError(`${label} must be a number.`).moreThan(min, `${label} must be above ${min}.`).max(500, `${label} must be at most 500.`);

export const identifySchema = object({
  wireDiameterMm: number()
    .typeError('The wire diameter must be a number, in mm.')
    .moreThan(0, 'The wire diameter must be above 0 mm.')
    .max(50, 'The wire diameter must be at most 50 mm.')
    .required('Measure the wire diameter with a micrometer, in mm.'),
  outerDiameterMm: number()
    .typeError('The outer diameter must be a number, in mm.')
    .moreThan(0, 'The outer diameter must be above 0 mm.')
    .max(400, 'The outer diameter must be at most 400 mm.')
    .required('Measure the outer diameter across the coils, in mm.'),
  activeCoils: coilsField('Active coils', 0),
  /** Closed-and-ground ends: two of them are dead. */
  totalCoils: coilsField('Total coils', 2),
  material: mixed<SpringMaterial>()
    .oneOf(SPRING_MATERIALS, `Material must be one of: ${SPRING_MATERIALS.join(', ')}.`)
    .required(`Say what the wire is: ${SPRING_MATERIALS.map((m) => SHEAR_MODULUS[m].label.toLowerCase()).join(', ')}; it sets the rate.`),
  kind: kindField,
  family: string().trim().max(60),
  unit: unitField,
  limit: number().typeError('Limit must be a whole number.').integer().min(1).max(50, 'Limit must be at most 50.').default(5),
}).test('coils', function (body) {
  if (!body) return true;
  if (body.activeCoils == null && body.totalCoils == null) {
    return this.createError({ path: 'activeCoils', message: 'Count the coils: give the active coils, or the total coils of a spring with closed-and-ground ends.' });
  }
  if (body.activeCoils != null && body.totalCoils != null) {
    return this.createError({ path: 'totalCoils', message: 'Give the active coils or the total coils, not both.' });
  }
  if (body.wireDiameterMm != null && body.outerDiameterMm != null && 2 * body.wireDiameterMm >= body.outerDiameterMm) {
    return this.createError({ path: 'outerDiameterMm', message: 'The outer diameter must be more than two wire diameters: measure across the whole coil.' });
  }
  return true;
});

const idFilter = (label: string) => number().typeError(`${label} must be a number.`).integer().min(1);

export const movementListSchema = object({
  springId: idFilter('The spring'),
  kind: mixed<MovementKind>().oneOf(MOVEMENT_KINDS, `Kind must be one of: ${MOVEMENT_KINDS.join(', ')}.`),
  importBatchId: idFilter('The import'),
  quoteId: idFilter('The quote'),
  from: string().datetime({ message: 'From must be an ISO 8601 date and time, like 2025-01-31T00:00:00Z.' }),
  to: string().datetime({ message: 'To must be an ISO 8601 date and time, like 2025-01-31T00:00:00Z.' }),
  page: pageField,
  pageSize: pageSizeField(50),
});

export const lowStockSchema = object({ kind: kindField, unit: unitField });

export const pageSchema = object({ page: pageField, pageSize: pageSizeField(20) });

/** The text fields of the upload form beside the file. */
export const importFormSchema = object({
  /** The unit of rate columns whose header names none, for rows without a unit cell. */
  unit: unitField,
  token: string().trim().max(200),
});

export type SpringCreateInput = InferType<typeof springCreateSchema>;
export type SpringUpdateInput = InferType<typeof springUpdateSchema>;
export type ReceiveInput = InferType<typeof receiveSchema>;
export type CountInput = InferType<typeof countSchema>;
export type ReserveInput = InferType<typeof reserveSchema>;
export type ReleaseInput = InferType<typeof releaseSchema>;
export type OverrideReleaseInput = InferType<typeof overrideReleaseSchema>;
export type FitInput = InferType<typeof fitSchema>;
export type SpringListInput = InferType<typeof springListSchema>;
export type RatesForFitInput = InferType<typeof ratesForFitSchema>;
export type IdentifyInput = InferType<typeof identifySchema>;
export type MovementListInput = InferType<typeof movementListSchema>;
