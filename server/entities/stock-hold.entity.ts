import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { HoldStatus } from '../../shared/types/catalogue';

export type HoldKind = 'quote' | 'manual';

/**
 * Reserved units and who holds them: a quote (made by its acceptance) or a hold made by name at
 * the counter. A spring's `reserved` is the sum of `quantity` over its open holds; each reserve,
 * release or fit of held units names its hold on the stock movement. A closed hold stays, with
 * how it closed, so the ledger's hold ids keep their meaning.
 */
@Entity({ name: 'stock_hold' })
export class StockHold {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  springId!: number;

  @Column({ type: 'text' })
  kind!: HoldKind;

  /** The holding quote; null for a hold made at the counter. */
  @Column({ type: 'integer', nullable: true })
  quoteId!: number | null;

  /** Who or what a hold made at the counter is for; null for a quote's. */
  @Column({ type: 'text', nullable: true })
  name!: string | null;

  @Column({ type: 'text' })
  reason!: string;

  /** Units held when it was made. */
  @Column({ type: 'integer' })
  heldQuantity!: number;

  /** Units still held; 0 once closed. */
  @Column({ type: 'integer' })
  quantity!: number;

  @Column({ type: 'text' })
  status!: HoldStatus;

  /** Null for holds the system made itself (carried over by the migration). */
  @Column({ type: 'integer', nullable: true })
  createdById!: number | null;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'integer', nullable: true })
  closedById!: number | null;

  @Column({ type: 'datetime', nullable: true })
  closedAt!: Date | null;
}
