import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type SpringKind = 'fork' | 'shock';

/** One spring the shop stocks or can order. Lengths in mm, rates in N/mm. */
@Entity({ name: 'spring_rate' })
@Index('idx_spring_rate_fit', ['kind', 'family', 'rateNmm'])
export class SpringRate {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Index('uq_spring_rate_sku', { unique: true })
  @Column({ type: 'text' })
  sku!: string;

  @Column({ type: 'text' })
  kind!: SpringKind;

  /** The fit: fork springs by outer diameter x length, shock springs by inner diameter x free length. */
  @Column({ type: 'text' })
  family!: string;

  @Column({ type: 'real' })
  rateNmm!: number;

  @Column({ type: 'real' })
  freeLengthMm!: number;

  @Column({ type: 'real' })
  maxDeflectionMm!: number;

  @Column({ type: 'integer', default: 0 })
  onHand!: number;

  @Column({ type: 'integer', default: 0 })
  reserved!: number;

  @Column({ type: 'boolean', default: true })
  active!: boolean;
}
