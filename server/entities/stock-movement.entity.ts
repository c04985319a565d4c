import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { MovementKind } from '../../shared/types/catalogue';

/**
 * One change to a spring's stock: who, when, how many and why. A spring's onHand and reserved
 * always equal the sums of its rows' deltas; the running balance after each row is kept beside
 * them so a history page reads without summing.
 */
@Entity({ name: 'stock_movement' })
@Index('idx_stock_movement_spring', ['springId', 'id'])
export class StockMovement {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  springId!: number;

  @Column({ type: 'text' })
  kind!: MovementKind;

  @Column({ type: 'integer' })
  onHandDelta!: number;

  @Column({ type: 'integer' })
  reservedDelta!: number;

  @Column({ type: 'integer' })
  onHandAfter!: number;

  @Column({ type: 'integer' })
  reservedAfter!: number;

  /** Null for stock recorded by the system itself (opening stock). */
  @Column({ type: 'integer', nullable: true })
  userId!: number | null;

  @Index('idx_stock_movement_at')
  @Column({ type: 'datetime' })
  at!: Date;

  @Column({ type: 'text' })
  reason!: string;

  /** The service desk's quote the units were reserved, released or fitted for. */
  @Column({ type: 'integer', nullable: true })
  quoteId!: number | null;

  /** The CSV import whose on-hand column made this count correction. */
  @Column({ type: 'integer', nullable: true })
  importBatchId!: number | null;

  /** The hold a reserve, release or fit moved (stock_hold); null before holds were recorded. */
  @Column({ type: 'integer', nullable: true })
  holdId!: number | null;
}
