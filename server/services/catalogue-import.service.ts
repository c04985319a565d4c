/**
 * CSV import of the catalogue. A dry run reads the file against the catalogue and reports every
 * row (new, updated, unchanged, or an error with its line and column) and writes nothing. Its
 * token is a SHA-256 over the file, the unit chosen and every planned change together with the
 * catalogue rows it touches; the clerk confirms by sending the same file back with that token.
 * The confirmation plans again inside the write transaction and writes only when the token is the
 * same, so what is written is exactly what the clerk saw; otherwise it answers 409 and writes
 * nothing. The server keeps nothing between the two requests.
 *
 * Built for 100,000 rows: the file is parsed once, the catalogue rows it names are loaded in a few
 * chunked queries, and the writes are multi-row statements in one transaction.
 */
import { createHash } from 'node:crypto';
import { parse, type InfoRecord } from 'csv-parse/sync';
import { EntityManager } from 'typeorm';
import {
  checkSpringNumber,
  checkSpringText,
  findSpringConflicts,
  MAX_STOCK_QUANTITY,
  SPRING_FIELD_LABELS,
  type SpringNumberField,
  type SpringTextField,
} from '../../shared/schemas/catalogue.schema';
import {
  SPRING_KINDS,
  type ImportBatchPage,
  type ImportBatchView,
  type ImportCellError,
  type ImportConfirmAnswer,
  type ImportCounts,
  type ImportDryRun,
  type ImportRowReport,
  type SpringKind,
} from '../../shared/types/catalogue';
import { parseUserNumber, toSi, type RateUnit } from '../../shared/units';
import type { AppContext } from '../app-context';
import { pauseForFault } from '../db/fault-pause';
import { ImportBatch } from '../entities/import-batch.entity';
import { User } from '../entities/user.entity';
import { BadRequestError, ConflictError, HttpError, NotFoundError } from '../errors';
import { bindHeader, CANONICAL_HEADER, readRateUnit, type ColumnBinding, type HeaderBinding, type ImportField } from './catalogue-csv';
import { unguardCell } from './csv-export';
import { chunk, StockService, writeCatalogue, type BulkCorrection } from './stock.service';

/** The catalogue fields a row sets, in the order of the INSERT and UPDATE statements. */
const IMPORTABLE = [
  'sku',
  'kind',
  'family',
  'rateNmm',
  'secondRateNmm',
  'breakMm',
  'freeLengthMm',
  'innerDiameterMm',
  'outerDiameterMm',
  'wireDiameterMm',
  'maxDeflectionMm',
  'supplier',
  'supplierCode',
  'costCents',
  'priceCents',
  'bin',
  'reorderPoint',
  'active',
] as const;

type ImportableField = (typeof IMPORTABLE)[number];

export type ImportableSpring = {
  sku: string;
  kind: SpringKind;
  family: string;
  rateNmm: number;
  secondRateNmm: number | null;
  breakMm: number | null;
  freeLengthMm: number;
  innerDiameterMm: number | null;
  outerDiameterMm: number | null;
  wireDiameterMm: number | null;
  maxDeflectionMm: number;
  supplier: string | null;
  supplierCode: string | null;
  costCents: number | null;
  priceCents: number | null;
  bin: string | null;
  reorderPoint: number;
  active: boolean;
};

interface ExistingSpring extends ImportableSpring {
  id: number;
  onHand: number;
  reserved: number;
}

const REQUIRED: readonly ImportableField[] = ['kind', 'family', 'rateNmm', 'freeLengthMm', 'maxDeflectionMm'];

const NEW_SPRING_DEFAULTS: Omit<ImportableSpring, 'sku' | 'kind' | 'family' | 'rateNmm' | 'freeLengthMm' | 'maxDeflectionMm'> = {
  secondRateNmm: null,
  breakMm: null,
  innerDiameterMm: null,
  outerDiameterMm: null,
  wireDiameterMm: null,
  supplier: null,
  supplierCode: null,
  costCents: null,
  priceCents: null,
  bin: null,
  reorderPoint: 0,
  active: true,
};

export interface Upload {
  buffer: Buffer;
  fileName: string;
}

export interface ParsedFile {
  contentSha256: string;
  headers: string[];
  header: HeaderBinding;
  rows: { line: number; cells: string[] }[];
}

interface PlannedRow {
  report: ImportRowReport;
  create?: ImportableSpring;
  update?: { id: number; values: ImportableSpring };
  stock?: { sku: string; springId: number | null; from: number; to: number; reserved: number };
}

export interface ImportPlan {
  rows: PlannedRow[];
  counts: ImportCounts;
  token: string;
}

const SQLITE_PARAMETERS = 30_000;

function readText(buffer: Buffer): string {
  if (buffer.includes(0)) throw new HttpError(415, 'not-csv', 'The file is not text: save it as CSV (UTF-8) and upload it again.');
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw new HttpError(415, 'not-csv', 'The file is not UTF-8 text: save it as "CSV UTF-8" and upload it again.');
  }
}

/** Comma, semicolon (spreadsheets set to a decimal comma) or tab, whichever the header line uses most. */
function detectDelimiter(text: string): string {
  const firstLine = text.slice(0, text.indexOf('\n') === -1 ? text.length : text.indexOf('\n'));
  let best = ',';
  let most = 0;
  for (const delimiter of [',', ';', '\t']) {
    const count = firstLine.split(delimiter).length - 1;
    if (count > most) [best, most] = [delimiter, count];
  }
  return best;
}

function countNewlines(cell: string): number {
  let count = 0;
  for (let i = cell.indexOf('\n'); i !== -1; i = cell.indexOf('\n', i + 1)) count++;
  return count;
}

export function parseCatalogueCsv(buffer: Buffer): ParsedFile {
  const text = readText(buffer);
  let records: { record: string[]; info: InfoRecord }[];
  try {
    // With `info` each record comes with where it ends in the file; the typings do not model that option.
    records = parse(text, { bom: true, delimiter: detectDelimiter(text), relax_column_count: true, skip_empty_lines: true, info: true }) as unknown as typeof records;
  } catch (err) {
    const { message, lines } = err as { message: string; lines?: number };
    throw new BadRequestError(`The file is not well-formed CSV${lines ? ` near line ${lines}` : ''}: ${message.replace(/^[A-Za-z ]+: /, '')}`, 'csv-malformed');
  }
  if (!records.length) throw new BadRequestError('The file is empty: it needs a header row and at least one spring.', 'csv-empty');
  const [first, ...data] = records;
  const headers = first.record.map((h) => h.trim());
  const header = bindHeader(headers);
  if (header.duplicates.length) {
    const [{ field, headers: pair }] = header.duplicates;
    throw new BadRequestError(`Columns "${pair[0]}" and "${pair[1]}" both give the ${SPRING_FIELD_LABELS[field]?.toLowerCase() ?? field}: keep one.`, 'csv-duplicate-column');
  }
  if (!header.bindings.some((b) => b.field === 'sku')) {
    throw new BadRequestError('The header has no sku column: the first row must name the columns, one of them sku.', 'csv-no-sku');
  }
  const rows = data
    .filter(({ record }) => record.some((cell) => cell.trim() !== ''))
    .map(({ record, info }) => ({ line: info.lines - record.reduce((n, cell) => n + countNewlines(cell), 0), cells: record }));
  if (!rows.length) throw new BadRequestError('The file has a header but no springs.', 'csv-empty');
  return { contentSha256: createHash('sha256').update(buffer).digest('hex'), headers, header, rows };
}

type Cell = { value: unknown } | { error: string } | null;

const WHOLE = /^\d+$/;
const AMOUNT = /^\d+([.,]\d{1,2})?$/;
const YES = new Set(['true', 'yes', 'y', '1']);
const NO = new Set(['false', 'no', 'n', '0']);

function checked(problem: string | undefined, value: unknown): Cell {
  return problem ? { error: problem } : { value };
}

/** A cell's value (null for an empty optional cell), an error, or null for "leave it as it is". */
function readCell(binding: ColumnBinding, raw: string, rowUnit: RateUnit): Cell {
  const text = raw.trim();
  const field = binding.field;
  const label = SPRING_FIELD_LABELS[field] ?? field;
  switch (binding.type) {
    case 'text': {
      if (text === '') return { value: null };
      const written = unguardCell(text);
      return checked(checkSpringText(field as SpringTextField, written), written);
    }
    case 'kind': {
      const kind = text.toLowerCase();
      if (text === '') return { value: null };
      return SPRING_KINDS.includes(kind as SpringKind) ? { value: kind } : { error: 'Kind must be fork or shock.' };
    }
    case 'length':
    case 'rate': {
      if (text === '') return { value: null };
      const number = parseUserNumber(text);
      if (number === undefined) return { error: `${label} must be a number, like 12.5.` };
      const si = binding.type === 'rate' ? toSi(number, binding.unit ?? rowUnit) : number;
      return checked(checkSpringNumber(field as SpringNumberField, si), si);
    }
    case 'cents':
      if (text === '') return { value: null };
      if (!WHOLE.test(text)) return { error: `${label} must be a whole number of cents, like 1250.` };
      return checked(checkSpringNumber(field as SpringNumberField, Number(text)), Number(text));
    case 'amount': {
      if (text === '') return { value: null };
      if (!AMOUNT.test(text)) return { error: `${label} must be an amount like 12.50.` };
      const cents = Math.round(Number(text.replace(',', '.')) * 100);
      return checked(checkSpringNumber(field as SpringNumberField, cents), cents);
    }
    case 'count': {
      if (text === '') return field === 'reorderPoint' ? { value: 0 } : null;
      if (!WHOLE.test(text) || Number(text) > MAX_STOCK_QUANTITY) return { error: `${label} must be a whole number from 0 to ${MAX_STOCK_QUANTITY}.` };
      return { value: Number(text) };
    }
    case 'boolean': {
      if (text === '') return null;
      const word = text.toLowerCase();
      if (YES.has(word)) return { value: true };
      if (NO.has(word)) return { value: false };
      return { error: 'Active must be true or false (yes/no, 1/0 also do).' };
    }
    case 'unit':
      return null;
  }
}

/** The spring as the row leaves it: each field from its cell when the file gives one, else as it was. */
function mergeSpring(base: Partial<ImportableSpring> & { sku: string }, given: Map<ImportField, unknown>): ImportableSpring {
  const pick = <K extends ImportableField>(field: K): ImportableSpring[K] =>
    (given.has(field) ? given.get(field) : base[field]) as ImportableSpring[K];
  return {
    sku: base.sku,
    kind: pick('kind'),
    family: pick('family'),
    rateNmm: pick('rateNmm'),
    secondRateNmm: pick('secondRateNmm'),
    breakMm: pick('breakMm'),
    freeLengthMm: pick('freeLengthMm'),
    innerDiameterMm: pick('innerDiameterMm'),
    outerDiameterMm: pick('outerDiameterMm'),
    wireDiameterMm: pick('wireDiameterMm'),
    maxDeflectionMm: pick('maxDeflectionMm'),
    supplier: pick('supplier'),
    supplierCode: pick('supplierCode'),
    costCents: pick('costCents'),
    priceCents: pick('priceCents'),
    bin: pick('bin'),
    reorderPoint: pick('reorderPoint'),
    active: pick('active'),
  };
}

/** Every field of a spring as one line of text, for the token. */
function fingerprint(s: ImportableSpring): string {
  return [
    s.sku, s.kind, s.family, s.rateNmm, s.secondRateNmm, s.breakMm, s.freeLengthMm, s.innerDiameterMm, s.outerDiameterMm,
    s.wireDiameterMm, s.maxDeflectionMm, s.supplier, s.supplierCode, s.costCents, s.priceCents, s.bin, s.reorderPoint, s.active,
  ].join('\u001f');
}

function sameValue(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') return a === b || Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
  return a === b;
}

/** In place: adding a field to a spread copy takes V8's slow path, a few µs a row over 100,000 rows. */
function toExisting(row: Record<string, unknown>): ExistingSpring {
  row.active = Boolean(row.active);
  return row as unknown as ExistingSpring;
}

async function loadExisting(query: (sql: string, parameters: unknown[]) => Promise<Record<string, unknown>[]>, skus: string[]): Promise<Map<string, ExistingSpring>> {
  const found = new Map<string, ExistingSpring>();
  const columns = ['id', 'onHand', 'reserved', ...IMPORTABLE].map((c) => `"${c}"`).join(', ');
  for (const part of chunk(skus, SQLITE_PARAMETERS)) {
    const rows = await query(`SELECT ${columns} FROM "spring_rate" WHERE "sku" IN (${part.map(() => '?').join(', ')})`, part);
    for (const row of rows) found.set(row.sku as string, toExisting(row));
  }
  return found;
}

function skusOf(file: ParsedFile): string[] {
  const sku = file.header.bindings.find((b) => b.field === 'sku');
  if (!sku) return [];
  return [...new Set(file.rows.map((row) => unguardCell((row.cells[sku.index] ?? '').trim())).filter(Boolean))];
}

interface RowReading {
  given: Map<ImportField, unknown>;
  errors: ImportCellError[];
  fail: (field: ImportField, message: string) => void;
}

/** The cells of one row, read and checked one by one; a cell left out or empty where that means "as it is" is not in `given`. */
function readRow(file: ParsedFile, cells: string[], defaultUnit: RateUnit, columnOf: (field: ImportField) => string): RowReading {
  const errors: ImportCellError[] = [];
  const fail = (field: ImportField, message: string) => errors.push({ column: columnOf(field), message });
  if (cells.length > file.headers.length && cells.slice(file.headers.length).some((c) => c.trim() !== '')) {
    errors.push({ column: '', message: `This row has ${cells.length} cells but the header names ${file.headers.length} columns: check for a stray delimiter.` });
  }
  const unitBinding = file.header.bindings.find((b) => b.field === 'unit');
  let rowUnit = defaultUnit;
  if (unitBinding && (cells[unitBinding.index] ?? '').trim() !== '') {
    const unit = readRateUnit(cells[unitBinding.index]);
    if (unit) rowUnit = unit;
    else fail('unit', 'Unit must be N/mm, kgf/mm or lbf/in.');
  }
  // A Map, not an object with a key per column: keyed stores and `in` on such an object made
  // V8 fall back to slow property lookups, most of the planning time of a large file.
  const given = new Map<ImportField, unknown>();
  for (const binding of file.header.bindings) {
    const cell = readCell(binding, cells[binding.index] ?? '', rowUnit);
    if (cell === null) continue;
    if ('error' in cell) fail(binding.field, cell.error);
    else given.set(binding.field, cell.value);
  }
  return { given, errors, fail };
}

/** Works out what each row would do against the catalogue as it stands; pure, so the dry run and the confirmation agree. */
export function planImport(file: ParsedFile, existing: Map<string, ExistingSpring>, defaultUnit: RateUnit): ImportPlan {
  const columnOf = (field: ImportField) => file.header.bindings.find((b) => b.field === field)?.header ?? CANONICAL_HEADER[field];
  const hash = createHash('sha256').update(`${file.contentSha256}\n${defaultUnit}\n`);
  const counts: ImportCounts = { rows: 0, new: 0, updated: 0, unchanged: 0, errors: 0, stockCorrections: 0 };
  const firstLineOf = new Map<string, number>();
  const rows: PlannedRow[] = [];
  const pending: string[] = [];

  for (const { line, cells } of file.rows) {
    const { given, errors, fail } = readRow(file, cells, defaultUnit, columnOf);
    const flagged = (field: ImportField) => errors.some((e) => e.column === columnOf(field));
    const givenSku = given.get('sku');
    const sku = typeof givenSku === 'string' ? givenSku : '';
    if (!sku && !flagged('sku')) fail('sku', 'SKU is missing: every row needs one.');
    const earlierLine = sku ? firstLineOf.get(sku) : undefined;
    if (earlierLine !== undefined) fail('sku', `This SKU is also on line ${earlierLine}: keep one row per spring.`);
    else if (sku) firstLineOf.set(sku, line);

    const before = sku ? existing.get(sku) : undefined;
    const merged = mergeSpring(before ?? { sku, ...NEW_SPRING_DEFAULTS }, given);
    for (const field of REQUIRED) {
      if (merged[field] != null) continue;
      if (given.has(field)) fail(field, `${SPRING_FIELD_LABELS[field]} cannot be empty.`);
      else if (!flagged(field)) fail(field, `A new spring needs its ${SPRING_FIELD_LABELS[field].toLowerCase()}: add a ${columnOf(field)} column or fill it in.`);
    }
    for (const [field, message] of Object.entries(findSpringConflicts(merged))) {
      if (!flagged(field as ImportField)) fail(field as ImportField, message as string);
    }
    let stock: PlannedRow['stock'];
    const onHand = given.get('onHand');
    if (typeof onHand === 'number') {
      const from = before?.onHand ?? 0;
      const reserved = before?.reserved ?? 0;
      if (onHand < reserved) fail('onHand', `${reserved} are reserved for quotes, more than the ${onHand} on hand given: release them first.`);
      else if (onHand !== from) stock = { sku, springId: before?.id ?? null, from, to: onHand, reserved };
    }

    const report: ImportRowReport = { line, sku, outcome: 'unchanged' };
    const planned: PlannedRow = { report };
    counts.rows++;
    if (errors.length) {
      report.outcome = 'error';
      report.errors = errors;
      counts.errors++;
    } else {
      if (before) {
        const changes = IMPORTABLE.filter((field) => !sameValue(before[field], merged[field]));
        if (changes.length) {
          report.changes = changes;
          planned.update = { id: before.id, values: merged };
        }
        report.outcome = changes.length || stock ? 'updated' : 'unchanged';
      } else {
        report.outcome = 'new';
        planned.create = merged;
      }
      if (stock) {
        report.stock = { from: stock.from, to: stock.to };
        planned.stock = stock;
        counts.stockCorrections++;
      }
      counts[report.outcome]++;
    }
    // What the clerk is shown, and the catalogue row it is measured against.
    pending.push(
      `${line}\t${sku}\t${report.outcome}\t${report.changes?.join(',') ?? ''}\t${stock ? `${stock.from}>${stock.to}` : ''}\t${fingerprint(merged)}\t${
        before ? `${before.id}:${before.onHand}:${before.reserved}:${fingerprint(before)}` : ''
      }\n`,
    );
    if (pending.length === 1000) hash.update(pending.splice(0).join(''));
    rows.push(planned);
  }
  hash.update(pending.join(''));
  return { rows, counts, token: hash.digest('hex') };
}

export function toImportBatchView(batch: ImportBatch, user: Pick<User, 'id' | 'name'> | null): ImportBatchView {
  return {
    id: batch.id,
    at: batch.at.toISOString(),
    user: user ? { id: user.id, name: user.name } : null,
    fileName: batch.fileName,
    contentSha256: batch.contentSha256,
    rows: batch.rowCount,
    created: batch.createdCount,
    updated: batch.updatedCount,
    unchanged: batch.unchangedCount,
    stockCorrections: batch.movementCount,
  };
}

function rowErrorFields(plan: ImportPlan): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const { report } of plan.rows) {
    for (const error of report.errors ?? []) fields[`line ${report.line}${error.column ? `: ${error.column}` : ''}`] = error.message;
  }
  return fields;
}

function toSqlValue(value: unknown): unknown {
  return typeof value === 'boolean' ? Number(value) : value;
}

export class CatalogueImportService {
  private readonly stock: StockService;

  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData'>) {
    this.stock = new StockService(ctx);
  }

  async dryRun(upload: Upload, unit: RateUnit): Promise<ImportDryRun> {
    const file = parseCatalogueCsv(upload.buffer);
    const existing = await loadExisting((sql, p) => this.ctx.db.read.query(sql, p), skusOf(file));
    const plan = planImport(file, existing, unit);
    return {
      token: plan.counts.errors ? null : plan.token,
      fileName: upload.fileName,
      contentSha256: file.contentSha256,
      columns: file.header.bindings.map((b) => b.header),
      ignoredColumns: file.header.ignored,
      counts: plan.counts,
      rows: plan.rows.map((r) => r.report),
    };
  }

  /** Writes the dry run's plan in one transaction, recorded as one batch; refuses a token that no longer matches. */
  async confirm(upload: Upload, unit: RateUnit, token: string, userId: number): Promise<ImportConfirmAnswer> {
    const file = parseCatalogueCsv(upload.buffer);
    return writeCatalogue(this.ctx, async (manager) => {
      const runner = manager.queryRunner;
      if (!runner) throw new Error('the import needs the manager of a transaction');
      const existing = await loadExisting((sql, p) => runner.query(sql, p), skusOf(file));
      const plan = planImport(file, existing, unit);
      if (plan.counts.errors) {
        throw new HttpError(400, 'import-has-errors', `${plan.counts.errors} rows have errors; nothing was imported. Run the dry run to see them.`, rowErrorFields(plan));
      }
      if (plan.token !== token) {
        throw new ConflictError('The file or the catalogue changed since the dry run; nothing was imported. Run the dry run again and check it.', 'import-changed');
      }
      const batch = await manager.save(
        manager.create(ImportBatch, {
          userId,
          at: this.ctx.now(),
          fileName: upload.fileName,
          contentSha256: file.contentSha256,
          rowCount: plan.counts.rows,
          createdCount: plan.counts.new,
          updatedCount: plan.counts.updated,
          unchangedCount: plan.counts.unchanged,
          movementCount: plan.counts.stockCorrections,
        }),
      );
      const newIds = await this.insertSprings(manager, plan.rows.flatMap((r) => (r.create ? [r.create] : [])));
      await this.updateSprings(manager, plan.rows.flatMap((r) => (r.update ? [r.update] : [])));
      const corrections: BulkCorrection[] = plan.rows.flatMap(({ stock }) =>
        stock ? [{ springId: stock.springId ?? (newIds.get(stock.sku) as number), from: stock.from, to: stock.to, reserved: stock.reserved }] : [],
      );
      await this.stock.correctInBulk(manager, corrections, {
        userId,
        reason: `Count from import ${batch.id} (${upload.fileName})`,
        importBatchId: batch.id,
      });
      this.ctx.sizingData.invalidate();
      await pauseForFault('import-written', `import ${batch.id}`);
      const user = await manager.findOne(User, { select: { id: true, name: true }, where: { id: userId } });
      return { batch: toImportBatchView(batch, user), counts: plan.counts };
    });
  }

  async list(page: number, pageSize: number): Promise<ImportBatchPage> {
    const [batches, total] = await this.ctx.db.read
      .getRepository(ImportBatch)
      .findAndCount({ order: { id: 'DESC' }, skip: (page - 1) * pageSize, take: pageSize });
    const users = await this.usersOf(batches);
    return { batches: batches.map((b) => toImportBatchView(b, b.userId === null ? null : (users.get(b.userId) ?? null))), total, page, pageSize };
  }

  async find(id: number): Promise<ImportBatchView> {
    const batch = await this.ctx.db.read.getRepository(ImportBatch).findOneBy({ id });
    if (!batch) throw new NotFoundError('There is no such import.');
    const users = await this.usersOf([batch]);
    return toImportBatchView(batch, batch.userId === null ? null : (users.get(batch.userId) ?? null));
  }

  private async usersOf(batches: ImportBatch[]): Promise<Map<number, User>> {
    const ids = [...new Set(batches.map((b) => b.userId).filter((id): id is number => id !== null))];
    if (!ids.length) return new Map();
    const users = await this.ctx.db.read.getRepository(User).find({ select: { id: true, name: true }, where: ids.map((id) => ({ id })) });
    return new Map(users.map((u) => [u.id, u]));
  }

  /** Multi-row INSERTs; answers the new ids by SKU, read back in one query. */
  private async insertSprings(manager: EntityManager, springs: ImportableSpring[]): Promise<Map<string, number>> {
    const ids = new Map<string, number>();
    if (!springs.length) return ids;
    const runner = manager.queryRunner!;
    const [{ maxId }] = await runner.query(`SELECT coalesce(max("id"), 0) AS "maxId" FROM "spring_rate"`);
    const columns = IMPORTABLE.map((c) => `"${c}"`).join(', ');
    const row = `(${IMPORTABLE.map(() => '?').join(', ')})`;
    for (const part of chunk(springs, Math.floor(SQLITE_PARAMETERS / IMPORTABLE.length))) {
      await runner.query(
        `INSERT INTO "spring_rate" (${columns}) VALUES ${part.map(() => row).join(', ')}`,
        part.flatMap((spring) => IMPORTABLE.map((field) => toSqlValue(spring[field]))),
      );
    }
    const created: { id: number; sku: string }[] = await runner.query(`SELECT "id", "sku" FROM "spring_rate" WHERE "id" > ?`, [maxId]);
    for (const { id, sku } of created) ids.set(sku, id);
    return ids;
  }

  /** UPDATE ... FROM (VALUES ...): one statement per chunk of changed springs. */
  private async updateSprings(manager: EntityManager, updates: { id: number; values: ImportableSpring }[]): Promise<void> {
    const runner = manager.queryRunner!;
    const width = IMPORTABLE.length + 1;
    const aliases = ['id', ...IMPORTABLE].map((c, i) => `column${i + 1} AS "${c}"`).join(', ');
    const assignments = IMPORTABLE.map((c) => `"${c}" = v."${c}"`).join(', ');
    for (const part of chunk(updates, Math.floor(SQLITE_PARAMETERS / width))) {
      const values = part.map(() => `(${new Array(width).fill('?').join(', ')})`).join(', ');
      await runner.query(
        `UPDATE "spring_rate" SET ${assignments} FROM (SELECT ${aliases} FROM (VALUES ${values})) AS v WHERE "spring_rate"."id" = v."id"`,
        part.flatMap(({ id, values: spring }) => [id, ...IMPORTABLE.map((field) => toSqlValue(spring[field]))]),
      );
    }
  }
}
