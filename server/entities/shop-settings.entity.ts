import { Column, Entity, PrimaryColumn } from 'typeorm';
import type { DepositRule } from '../../shared/money/quote-totals';
import type { LabourOperation } from '../../shared/types/quote';

/** The shop's terms for quotes, one row (id 1): labour rate, tax, deposit rule, operations, validity; and its public address. */
@Entity({ name: 'shop_settings' })
export class ShopSettings {
  @PrimaryColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  labourRateCentsPerHour!: number;

  /** 2000 = 20 %. */
  @Column({ type: 'integer' })
  taxBasisPoints!: number;

  @Column({ type: 'simple-json' })
  deposit!: DepositRule;

  @Column({ type: 'simple-json' })
  operations!: LabourOperation[];

  @Column({ type: 'integer' })
  quoteValidityDays!: number;

  /** Shown on every quote: what the rider should know before a spring swap. */
  @Column({ type: 'text', default: '' })
  cautions!: string;

  /** Where riders reach the web app (scheme, host, port): links in mails are built on it. */
  @Column({ type: 'text', nullable: true })
  publicUrl!: string | null;

  @Column({ type: 'integer', nullable: true })
  updatedById!: number | null;

  @Column({ type: 'datetime' })
  updatedAt!: Date;
}
