/**
 * An invented spring catalogue of any size for the scale benchmarks, the same on every run (a
 * fixed seed): fork fits by outer diameter and free length, shock fits by inner diameter and free
 * length, five invented suppliers each offering a ladder of rates in every fit. The generated
 * fits include the demo's (F37x320, S56x150, ...), so a sizing of a demo bike reads a full fit.
 * It goes into a database in one transaction, or out as a CSV file in the import's columns.
 */
import { stringify } from 'csv-stringify/sync';
import type { Database } from '../../server/data-source';
import { CATALOGUE_COLUMNS } from '../../server/services/catalogue-csv';
import type { ImportableSpring } from '../../server/services/catalogue-import.service';
import { chunk, toSqliteDatetime } from '../../server/services/stock.service';

export interface GeneratedSpring extends ImportableSpring {
  onHand: number;
}

/** Mulberry32: a small, fast PRNG with a 32-bit state, good enough to vary invented stock. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export const CATALOGUE_SEED = 20261202;

const SUPPLIERS = [
  { name: 'Tarnwell Coilworks', prefix: 'TW' },
  { name: 'Quillmere Coil Supply', prefix: 'QM' },
  { name: 'Brackenford Wireform', prefix: 'BW' },
  { name: 'Velmont Spring Works', prefix: 'VS' },
  { name: 'Ashgrove Coils', prefix: 'AC' },
] as const;

const RATES_PER_SUPPLIER = 50;

interface Fit {
  kind: 'fork' | 'shock';
  family: string;
  freeLengthMm: number;
  /** Fork springs are known by their outer diameter, shock springs by their inner one. */
  fitDiameterMm: number;
  firstRateNmm: number;
  rateStepNmm: number;
}

function fits(): Fit[] {
  const list: Fit[] = [];
  for (const diameter of [35, 36, 37, 38, 39, 41, 43, 45, 46, 47, 48, 50]) {
    for (let length = 260; length <= 450; length += 10) {
      list.push({ kind: 'fork', family: `F${diameter}x${length}`, freeLengthMm: length, fitDiameterMm: diameter, firstRateNmm: 4, rateStepNmm: 0.2 });
    }
  }
  for (const diameter of [52, 54, 56, 58, 60, 61, 63, 65]) {
    for (let length = 120; length <= 310; length += 10) {
      list.push({ kind: 'shock', family: `S${diameter}x${length}`, freeLengthMm: length, fitDiameterMm: diameter, firstRateNmm: 40, rateStepNmm: 5 });
    }
  }
  return list;
}

const round2 = (value: number) => Math.round(value * 100) / 100;

/** `count` springs (up to 100,000: 400 fits × 5 suppliers × 50 rates), the same for the same seed. */
export function generateSprings(count: number, seed = CATALOGUE_SEED): GeneratedSpring[] {
  const random = seededRandom(seed);
  const pick = (n: number) => Math.floor(random() * n);
  const springs: GeneratedSpring[] = [];
  for (const fit of fits()) {
    for (const supplier of SUPPLIERS) {
      for (let step = 0; step < RATES_PER_SUPPLIER; step += 1) {
        if (springs.length === count) return springs;
        const rateNmm = round2(fit.firstRateNmm + step * fit.rateStepNmm);
        const wireMm = round2((fit.kind === 'fork' ? 3.2 : 8) + step * (fit.kind === 'fork' ? 0.04 : 0.08));
        // About one fork spring in ten is dual-rate, as progressive fork kits are common (common practice, no source).
        const dual = fit.kind === 'fork' && pick(10) === 0;
        const maxDeflectionMm = round2(fit.freeLengthMm * (fit.kind === 'fork' ? 0.6 : 0.45));
        springs.push({
          sku: `${supplier.prefix}-${fit.family}-${String(Math.round(rateNmm * 100)).padStart(5, '0')}`,
          kind: fit.kind,
          family: fit.family,
          rateNmm,
          secondRateNmm: dual ? round2(rateNmm * 1.3) : null,
          breakMm: dual ? round2(maxDeflectionMm * 0.6) : null,
          freeLengthMm: fit.freeLengthMm,
          innerDiameterMm: fit.kind === 'fork' ? round2(fit.fitDiameterMm - 2 * wireMm) : fit.fitDiameterMm,
          outerDiameterMm: fit.kind === 'fork' ? fit.fitDiameterMm : round2(fit.fitDiameterMm + 2 * wireMm),
          wireDiameterMm: wireMm,
          maxDeflectionMm,
          supplier: supplier.name,
          supplierCode: `${supplier.prefix}${String(100000 + pick(900000))}`,
          costCents: 2500 + pick(6000),
          priceCents: 6000 + pick(12000),
          bin: `${fit.kind === 'fork' ? 'F' : 'S'}${String(1 + pick(40)).padStart(2, '0')}-${String(1 + pick(30)).padStart(2, '0')}`,
          // A quarter of the lines out of stock, the rest a few on the shelf; one line in five kept
          // at a reorder point, so about one in twenty is low (common practice, no source).
          onHand: pick(4) === 0 ? 0 : 1 + pick(6),
          reorderPoint: pick(5) === 0 ? 1 : 0,
          active: pick(40) !== 0,
        });
      }
    }
  }
  if (springs.length < count) throw new RangeError(`the generated catalogue has at most ${springs.length} springs`);
  return springs;
}

const SPRING_COLUMNS = [
  'sku', 'kind', 'family', 'rateNmm', 'secondRateNmm', 'breakMm', 'freeLengthMm', 'innerDiameterMm', 'outerDiameterMm', 'wireDiameterMm',
  'maxDeflectionMm', 'supplier', 'supplierCode', 'costCents', 'priceCents', 'bin', 'onHand', 'reorderPoint', 'active',
] as const satisfies readonly (keyof GeneratedSpring)[];

// SQLite allows 32,766 bound parameters in a statement since 3.32.
const ROWS_PER_INSERT = Math.floor(32_000 / SPRING_COLUMNS.length);

/**
 * Adds the springs and, for those on the shelf, their opening `receive` movements (so stock equals
 * the sum of its movements, as everywhere else), in one transaction of multi-row INSERTs.
 */
export async function insertSprings(db: Database, springs: readonly GeneratedSpring[], at: Date): Promise<void> {
  await db.write(async (manager) => {
    const row = `(${SPRING_COLUMNS.map(() => '?').join(', ')})`;
    for (const part of chunk([...springs], ROWS_PER_INSERT)) {
      await manager.query(
        `INSERT INTO "spring_rate" (${SPRING_COLUMNS.map((c) => `"${c}"`).join(', ')}) VALUES ${part.map(() => row).join(', ')}`,
        part.flatMap((spring) => SPRING_COLUMNS.map((c) => (typeof spring[c] === 'boolean' ? Number(spring[c]) : spring[c]))),
      );
    }
    const skus = new Set(springs.map((s) => s.sku));
    const stocked: { id: number; sku: string; onHand: number }[] = await manager.query(`SELECT "id", "sku", "onHand" FROM "spring_rate" WHERE "onHand" > 0`);
    const opening = stocked.filter((s) => skus.has(s.sku));
    for (const part of chunk(opening, Math.floor(32_000 / 5))) {
      await manager.query(
        `INSERT INTO "stock_movement" ("springId", "kind", "onHandDelta", "reservedDelta", "onHandAfter", "reservedAfter", "at", "reason") VALUES ${part
          .map(() => `(?, 'receive', ?, 0, ?, 0, ?, 'Opening stock')`)
          .join(', ')}`,
        part.flatMap((s) => [s.id, s.onHand, s.onHand, toSqliteDatetime(at)]),
      );
    }
  });
}

/** The springs as the import reads them: the export's header and columns, rates in N/mm. */
export function springsToCsv(springs: readonly GeneratedSpring[]): Buffer {
  const header = CATALOGUE_COLUMNS.map((c) => c.header);
  const rows = springs.map((spring) => CATALOGUE_COLUMNS.map((c) => spring[c.field]));
  return Buffer.from(stringify([header, ...rows], { cast: { boolean: (value) => (value ? 'true' : 'false') } }));
}
