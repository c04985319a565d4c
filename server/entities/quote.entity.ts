import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { QuoteStatus, ShopIdentity } from '../../shared/types/quote';

/**
 * A spring-swap quote built from one sizing record. Its totals are stored as computed by
 * shared/money when its lines last changed; the shop's identity, rates and deposit are copied in,
 * so a later change of settings does not rewrite a quote already sent.
 */
@Entity({ name: 'quote' })
@Index('idx_quote_status', ['status', 'id'])
@Index('idx_quote_rider', ['riderId', 'id'])
export class Quote {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  /** Q-2026-0001: the year and its sequence; versions share the number. */
  @Column({ type: 'text' })
  number!: string;

  @Column({ type: 'integer' })
  year!: number;

  @Column({ type: 'integer' })
  sequence!: number;

  @Column({ type: 'integer' })
  version!: number;

  @Column({ type: 'integer', nullable: true })
  previousId!: number | null;

  @Column({ type: 'integer', nullable: true })
  supersededById!: number | null;

  @Column({ type: 'text' })
  status!: QuoteStatus;

  @Column({ type: 'integer' })
  riderId!: number;

  @Column({ type: 'integer', nullable: true })
  bikeId!: number | null;

  @Column({ type: 'integer' })
  sizingRecordId!: number;

  @Column({ type: 'integer', nullable: true })
  createdById!: number | null;

  @Column({ type: 'text', length: 3 })
  currency!: string;

  @Column({ type: 'simple-json' })
  shop!: ShopIdentity;

  @Column({ type: 'text', default: '' })
  cautions!: string;

  @Column({ type: 'integer' })
  labourRateCentsPerHour!: number;

  @Column({ type: 'integer' })
  taxBasisPoints!: number;

  @Column({ type: 'integer' })
  partsCents!: number;

  @Column({ type: 'integer' })
  labourCents!: number;

  @Column({ type: 'integer' })
  subtotalCents!: number;

  @Column({ type: 'integer' })
  taxCents!: number;

  @Column({ type: 'integer' })
  totalCents!: number;

  @Column({ type: 'integer' })
  depositDueCents!: number;

  @Column({ type: 'integer', default: 0 })
  paidCents!: number;

  @Column({ type: 'integer', default: 0 })
  refundedCents!: number;

  @Column({ type: 'datetime' })
  validUntil!: Date;

  /** SHA-256 (hex) of the customer link's token; the token itself is only in the mail. */
  @Column({ type: 'text', nullable: true })
  tokenHash!: string | null;

  @Column({ type: 'datetime', nullable: true })
  sentAt!: Date | null;

  @Column({ type: 'datetime', nullable: true })
  fittingAt!: Date | null;

  @Column({ type: 'datetime' })
  createdAt!: Date;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
