/**
 * CSV exports, streamed a page at a time so a large catalogue or ledger never sits in memory whole:
 * the catalogue (its header is the import's, so exporting and importing back changes nothing), the
 * stock movements, and the re-order sheet of springs below their reorder point (also readable by
 * the import: its extra columns are ignored).
 */
import type { Response } from 'express';
import type { SpringKind } from '../../shared/types/catalogue';
import type { AppContext } from '../app-context';
import { CATALOGUE_COLUMNS } from './catalogue-csv';
import { CatalogueService } from './catalogue.service';
import { sendCsv, type CsvCells } from './csv-export';
import { StockService, type MovementFilter } from './stock.service';

/** A raw spring_rate row (SQLite answers a boolean as 0 or 1) as the import reads it back. */
function catalogueCells(row: Record<string, string | number | null>): CsvCells {
  const cells: CsvCells = {};
  for (const { header, field } of CATALOGUE_COLUMNS) cells[header] = field === 'active' ? String(row.active === 1) : row[field];
  return cells;
}

const MOVEMENT_COLUMNS = [
  'id',
  'at',
  'sku',
  'kind',
  'on_hand_delta',
  'reserved_delta',
  'on_hand_after',
  'reserved_after',
  'user',
  'reason',
  'quote_id',
  'import_batch_id',
  'hold_id',
];

const REORDER_COLUMNS = [
  'supplier',
  'supplier_code',
  'sku',
  'kind',
  'family',
  'rate_n_mm',
  'on_hand',
  'reserved',
  'available',
  'reorder_point',
  'shortfall',
  'cost_cents',
  'bin',
];

function today(ctx: Pick<AppContext, 'now'>): string {
  return ctx.now().toISOString().slice(0, 10);
}

export class CatalogueExportService {
  constructor(private readonly ctx: Pick<AppContext, 'db' | 'now' | 'sizingData'>) {}

  /** Every spring, active or not, in the order they were added. */
  async catalogue(res: Response): Promise<void> {
    const read = this.ctx.db.read;
    const columns = ['id', ...CATALOGUE_COLUMNS.map((c) => c.field)].map((c) => `"${c}"`).join(', ');
    // Raw rows, a page at a time by id: no entity hydration for what only becomes text.
    async function* rows(): AsyncGenerator<CsvCells> {
      let afterId = 0;
      for (;;) {
        const page: Record<string, string | number | null>[] = await read.query(`SELECT ${columns} FROM "spring_rate" WHERE "id" > ? ORDER BY "id" LIMIT 2000`, [afterId]);
        if (!page.length) return;
        yield* page.map(catalogueCells);
        afterId = Number(page[page.length - 1].id);
      }
    }
    await sendCsv(res, `catalogue-${today(this.ctx)}.csv`, CATALOGUE_COLUMNS.map((c) => c.header), rows());
  }

  async movements(res: Response, filter: MovementFilter): Promise<void> {
    const source = new StockService(this.ctx).each(this.ctx.db.read.manager, filter);
    async function* rows(): AsyncGenerator<CsvCells> {
      for await (const m of source) {
        yield {
          id: m.id,
          at: m.at,
          sku: m.sku,
          kind: m.kind,
          on_hand_delta: m.onHandDelta,
          reserved_delta: m.reservedDelta,
          on_hand_after: m.onHandAfter,
          reserved_after: m.reservedAfter,
          user: m.user?.name ?? null,
          reason: m.reason,
          quote_id: m.quoteId,
          import_batch_id: m.importBatchId,
          hold_id: m.holdId,
        };
      }
    }
    await sendCsv(res, `stock-movements-${today(this.ctx)}.csv`, MOVEMENT_COLUMNS, rows());
  }

  async reorderSheet(res: Response, kind?: SpringKind): Promise<void> {
    const lines = await new CatalogueService(this.ctx).lowStock(kind);
    const rows = lines.map(({ spring, shortfall }) => ({
      supplier: spring.supplier,
      supplier_code: spring.supplierCode,
      sku: spring.sku,
      kind: spring.kind,
      family: spring.family,
      rate_n_mm: spring.rateNmm,
      on_hand: spring.onHand,
      reserved: spring.reserved,
      available: spring.onHand - spring.reserved,
      reorder_point: spring.reorderPoint,
      shortfall,
      cost_cents: spring.costCents,
      bin: spring.bin,
    }));
    await sendCsv(res, `reorder-${today(this.ctx)}.csv`, REORDER_COLUMNS, rows);
  }
}
