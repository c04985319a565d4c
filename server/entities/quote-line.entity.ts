import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { EndKind } from '../../shared/types/sizing';

/** One line of a quote: a spring from the catalogue, or an operation from the shop's list at its standard time. */
@Entity({ name: 'quote_line' })
@Index('idx_quote_line_quote', ['quoteId', 'position'])
export class QuoteLine {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  quoteId!: number;

  @Column({ type: 'integer' })
  position!: number;

  @Column({ type: 'text' })
  kind!: 'spring' | 'labour';

  @Column({ type: 'text', nullable: true })
  end!: EndKind | null;

  @Column({ type: 'integer', nullable: true })
  springId!: number | null;

  @Column({ type: 'text', nullable: true })
  sku!: string | null;

  @Column({ type: 'text', nullable: true })
  operationCode!: string | null;

  @Column({ type: 'text' })
  description!: string;

  @Column({ type: 'integer' })
  quantity!: number;

  /** Standard time of one operation, for labour lines. */
  @Column({ type: 'integer', nullable: true })
  minutes!: number | null;

  /** A spring's price, or the labour rate per hour for labour lines. */
  @Column({ type: 'integer' })
  unitPriceCents!: number;

  @Column({ type: 'integer' })
  lineCents!: number;
}
