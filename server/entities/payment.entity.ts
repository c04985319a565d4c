import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A deposit taken by card, or its refund. One row per payment intent: the unique intent id makes recording it idempotent. */
@Entity({ name: 'payment' })
@Index('idx_payment_quote', ['quoteId', 'id'])
export class Payment {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  quoteId!: number;

  @Column({ type: 'text' })
  kind!: 'deposit' | 'refund';

  @Index('uq_payment_intent', { unique: true })
  @Column({ type: 'text' })
  providerId!: string;

  @Column({ type: 'integer' })
  amountCents!: number;

  @Column({ type: 'text', length: 3 })
  currency!: string;

  @Column({ type: 'text' })
  method!: string;

  @Column({ type: 'text', nullable: true })
  last4!: string | null;

  @Column({ type: 'datetime' })
  at!: Date;
}
