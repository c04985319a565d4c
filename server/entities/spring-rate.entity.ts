import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { SpringKind } from '../../shared/types/catalogue';

export type { SpringKind };

/**
 * One spring the shop stocks or can order. Lengths in mm, rates in N/mm, money in integer cents.
 * onHand and reserved are the sums of the spring's stock movements: only the stock service
 * changes them, in the transaction that records the movement.
 */
@Entity({ name: 'spring_rate' })
@Index('idx_spring_rate_fit', ['kind', 'family', 'rateNmm', 'sku'])
export class SpringRate {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Index('uq_spring_rate_sku', { unique: true })
  @Column({ type: 'text' })
  sku!: string;

  @Column({ type: 'text' })
  kind!: SpringKind;

  /** The fit: fork springs by outer diameter x length, shock springs by inner diameter x free length, or the shop's own fit code. */
  @Column({ type: 'text' })
  family!: string;

  @Column({ type: 'real' })
  rateNmm!: number;

  /** Dual-rate springs: the rate above the break point, with the break point itself. */
  @Column({ type: 'real', nullable: true })
  secondRateNmm!: number | null;

  /** Spring compression where the second rate starts. */
  @Column({ type: 'real', nullable: true })
  breakMm!: number | null;

  @Column({ type: 'real' })
  freeLengthMm!: number;

  @Column({ type: 'real', nullable: true })
  innerDiameterMm!: number | null;

  @Column({ type: 'real', nullable: true })
  outerDiameterMm!: number | null;

  @Column({ type: 'real', nullable: true })
  wireDiameterMm!: number | null;

  /** Deflection from free length to coil bind. */
  @Column({ type: 'real' })
  maxDeflectionMm!: number;

  @Column({ type: 'text', nullable: true })
  supplier!: string | null;

  /** The supplier's own part code. */
  @Column({ type: 'text', nullable: true })
  supplierCode!: string | null;

  @Column({ type: 'integer', nullable: true })
  costCents!: number | null;

  @Column({ type: 'integer', nullable: true })
  priceCents!: number | null;

  /** Where it sits on the shelves. */
  @Column({ type: 'text', nullable: true })
  bin!: string | null;

  @Column({ type: 'integer', default: 0 })
  onHand!: number;

  @Column({ type: 'integer', default: 0 })
  reserved!: number;

  /** Re-order when fewer than this many are available (on hand less reserved); 0 for a spring not kept in stock. */
  @Column({ type: 'integer', default: 0 })
  reorderPoint!: number;

  @Column({ type: 'boolean', default: true })
  active!: boolean;
}
