import { EntityManager, In } from 'typeorm';
import { computeHelicalSpringRate, SHEAR_MODULUS } from '../../shared/sizing/helical-spring';
import { SpringKind, SpringRate } from '../entities/spring-rate.entity';
import { StockMovement } from '../entities/stock-movement.entity';

/**
 * The invented spring catalogue of the demo workshop: two fork fits and two shock fits, a rate
 * ladder in each, stock that varies from rate to rate so some picks must be ordered and some fall
 * below their reorder point. Suppliers, codes, bins and prices are invented too. The wire
 * diameters are worked back from each rate with the helical-spring formula, so identifying a demo
 * spring from its measurements finds it again.
 */
interface Ladder {
  kind: SpringKind;
  family: string;
  code: string;
  fromNmm: number;
  toNmm: number;
  stepNmm: number;
  freeLengthMm: number;
  maxDeflectionMm: number;
  /** Fork springs are known by their outer diameter, shock springs by their inner one. */
  fitDiameterMm: number;
  activeCoils: number;
  supplier: string;
  supplierPrefix: string;
  bin: string;
  costCents: number;
  priceCents: number;
  reorderPoint: number;
}

export const demoLadders: Ladder[] = [
  {
    kind: 'fork', family: 'F37x320', code: 'KF37', fromNmm: 5.5, toNmm: 11, stepNmm: 0.5, freeLengthMm: 320, maxDeflectionMm: 190,
    fitDiameterMm: 37, activeCoils: 30, supplier: 'Tarnwell Coilworks', supplierPrefix: 'TW', bin: 'FA', costCents: 4600, priceCents: 8900, reorderPoint: 2,
  },
  {
    kind: 'fork', family: 'F43x290', code: 'KF43', fromNmm: 6.5, toNmm: 12, stepNmm: 0.5, freeLengthMm: 290, maxDeflectionMm: 175,
    fitDiameterMm: 43, activeCoils: 26, supplier: 'Tarnwell Coilworks', supplierPrefix: 'TW', bin: 'FB', costCents: 5100, priceCents: 9600, reorderPoint: 2,
  },
  {
    kind: 'shock', family: 'S56x150', code: 'KS56', fromNmm: 60, toNmm: 140, stepNmm: 5, freeLengthMm: 150, maxDeflectionMm: 68,
    fitDiameterMm: 56, activeCoils: 8, supplier: 'Quillmere Coil Supply', supplierPrefix: 'QM', bin: 'SA', costCents: 7200, priceCents: 13900, reorderPoint: 1,
  },
  {
    kind: 'shock', family: 'S61x170', code: 'KS61', fromNmm: 70, toNmm: 150, stepNmm: 5, freeLengthMm: 170, maxDeflectionMm: 80,
    fitDiameterMm: 61, activeCoils: 9, supplier: 'Quillmere Coil Supply', supplierPrefix: 'QM', bin: 'SB', costCents: 7900, priceCents: 14900, reorderPoint: 1,
  },
];

/** Two dual-rate fork springs: the label rate up to the break point, the second rate above it. */
const dualRates = [
  { ladder: 'F43x290', rateNmm: 7.5, secondRateNmm: 10, breakMm: 110 },
  { ladder: 'F43x290', rateNmm: 8.5, secondRateNmm: 11.5, breakMm: 110 },
];

/** A fixed, uneven stock pattern: the same every time the demo loads. */
const stockPattern = [2, 0, 3, 1, 4, 0, 2, 2, 1, 0, 3];

const DEMO_MATERIAL = SHEAR_MODULUS['chrome-silicon'];

/** The wire that gives this rate at the ladder's fit diameter and coils, to 0.01 mm (bisection: the rate rises with the wire). */
function wireDiameterFor(ladder: Ladder, rateNmm: number): number {
  const meanDiameter = (d: number) => (ladder.kind === 'fork' ? ladder.fitDiameterMm - d : ladder.fitDiameterMm + d);
  const rateAt = (d: number) =>
    computeHelicalSpringRate({ wireDiameterMm: d, meanDiameterMm: meanDiameter(d), activeCoils: ladder.activeCoils, shearModulusMpa: DEMO_MATERIAL.shearModulusMpa });
  let [low, high] = [0.5, ladder.kind === 'fork' ? ladder.fitDiameterMm / 3 : 20];
  for (let i = 0; i < 60; i++) {
    const mid = (low + high) / 2;
    if (rateAt(mid) < rateNmm) low = mid;
    else high = mid;
  }
  return Math.round(low * 100) / 100;
}

function demoSpring(ladder: Ladder, rateNmm: number, sku: string, stock: { onHand: number; bin: string }, dual?: { secondRateNmm: number; breakMm: number }): Partial<SpringRate> {
  const wire = wireDiameterFor(ladder, rateNmm);
  const round = (mm: number) => Math.round(mm * 100) / 100;
  return {
    sku,
    kind: ladder.kind,
    family: ladder.family,
    rateNmm,
    secondRateNmm: dual?.secondRateNmm ?? null,
    breakMm: dual?.breakMm ?? null,
    freeLengthMm: ladder.freeLengthMm,
    innerDiameterMm: ladder.kind === 'fork' ? round(ladder.fitDiameterMm - 2 * wire) : ladder.fitDiameterMm,
    outerDiameterMm: ladder.kind === 'fork' ? ladder.fitDiameterMm : round(ladder.fitDiameterMm + 2 * wire),
    wireDiameterMm: wire,
    maxDeflectionMm: ladder.maxDeflectionMm,
    supplier: ladder.supplier,
    supplierCode: `${ladder.supplierPrefix}-${ladder.family.replace(/\D+/g, '')}-${sku.slice(sku.indexOf('-') + 1)}`,
    costCents: ladder.costCents,
    priceCents: ladder.priceCents,
    bin: stock.bin,
    onHand: stock.onHand,
    reserved: 0,
    reorderPoint: ladder.reorderPoint,
    active: true,
  };
}

export function demoSprings(): Partial<SpringRate>[] {
  const springs: Partial<SpringRate>[] = [];
  for (const ladder of demoLadders) {
    const steps = Math.round((ladder.toNmm - ladder.fromNmm) / ladder.stepNmm);
    for (let i = 0; i <= steps; i += 1) {
      const rateNmm = Math.round((ladder.fromNmm + i * ladder.stepNmm) * 100) / 100;
      const sku = `${ladder.code}-${String(Math.round(rateNmm * 10)).padStart(4, '0')}`;
      const onHand = stockPattern[i % stockPattern.length] * (ladder.kind === 'fork' ? 2 : 1);
      springs.push(demoSpring(ladder, rateNmm, sku, { onHand, bin: `${ladder.bin}-${String(i + 1).padStart(2, '0')}` }));
    }
  }
  for (const [n, dual] of dualRates.entries()) {
    const ladder = demoLadders.find((l) => l.family === dual.ladder)!;
    const sku = `${ladder.code}-D${String(Math.round(dual.rateNmm * 10)).padStart(3, '0')}`;
    springs.push(demoSpring(ladder, dual.rateNmm, sku, { onHand: 2, bin: `${ladder.bin}-D${n + 1}` }, dual));
  }
  return springs;
}

/** The springs, and their stock as opening movements so on hand equals the sum of movements from the start. */
export async function seedDemoCatalogue(manager: EntityManager): Promise<void> {
  const springs = demoSprings();
  await manager.getRepository(SpringRate).insert(springs);
  const stocked = await manager.find(SpringRate, { where: { sku: In(springs.map((s) => s.sku!)) } });
  const at = new Date();
  await manager.getRepository(StockMovement).insert(
    stocked
      .filter((s) => s.onHand > 0)
      .map((s) => ({
        springId: s.id,
        kind: 'receive' as const,
        onHandDelta: s.onHand,
        reservedDelta: 0,
        onHandAfter: s.onHand,
        reservedAfter: 0,
        userId: null,
        at,
        reason: 'Opening stock of the demo workshop',
        quoteId: null,
        importBatchId: null,
      })),
  );
}
