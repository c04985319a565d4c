import { EntityManager } from 'typeorm';
import { SpringRate, SpringKind } from '../entities/spring-rate.entity';

/**
 * The invented spring catalogue of the demo workshop: two fork fits and two shock fits, a rate
 * ladder in each, stock that varies from rate to rate so some picks must be ordered.
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
}

export const demoLadders: Ladder[] = [
  { kind: 'fork', family: 'F37x320', code: 'KF37', fromNmm: 5.5, toNmm: 11, stepNmm: 0.5, freeLengthMm: 320, maxDeflectionMm: 190 },
  { kind: 'fork', family: 'F43x290', code: 'KF43', fromNmm: 6.5, toNmm: 12, stepNmm: 0.5, freeLengthMm: 290, maxDeflectionMm: 175 },
  { kind: 'shock', family: 'S56x150', code: 'KS56', fromNmm: 60, toNmm: 140, stepNmm: 5, freeLengthMm: 150, maxDeflectionMm: 68 },
  { kind: 'shock', family: 'S61x170', code: 'KS61', fromNmm: 70, toNmm: 150, stepNmm: 5, freeLengthMm: 170, maxDeflectionMm: 80 },
];

/** A fixed, uneven stock pattern: the same every time the demo loads. */
const stockPattern = [2, 0, 3, 1, 4, 0, 2, 2, 1, 0, 3];

export function demoSprings(): Partial<SpringRate>[] {
  const springs: Partial<SpringRate>[] = [];
  for (const ladder of demoLadders) {
    const steps = Math.round((ladder.toNmm - ladder.fromNmm) / ladder.stepNmm);
    for (let i = 0; i <= steps; i += 1) {
      const rateNmm = Math.round((ladder.fromNmm + i * ladder.stepNmm) * 100) / 100;
      springs.push({
        sku: `${ladder.code}-${String(Math.round(rateNmm * 10)).padStart(4, '0')}`,
        kind: ladder.kind,
        family: ladder.family,
        rateNmm,
        freeLengthMm: ladder.freeLengthMm,
        maxDeflectionMm: ladder.maxDeflectionMm,
        onHand: stockPattern[i % stockPattern.length] * (ladder.kind === 'fork' ? 2 : 1),
        reserved: 0,
        active: true,
      });
    }
  }
  return springs;
}

export async function seedDemoCatalogue(manager: EntityManager): Promise<void> {
  await manager.getRepository(SpringRate).insert(demoSprings());
}
