import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import type { QuoteStatus, QuoteStatusEventView } from '../../shared/types/quote';

/** One change of a quote's status: from, to, who and when. */
@Entity({ name: 'quote_status_event' })
@Index('idx_quote_status_event_quote', ['quoteId', 'id'])
export class QuoteStatusEvent {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id!: number;

  @Column({ type: 'integer' })
  quoteId!: number;

  @Column({ type: 'text', nullable: true })
  fromStatus!: QuoteStatus | null;

  @Column({ type: 'text' })
  toStatus!: QuoteStatus;

  @Column({ type: 'text' })
  actorKind!: QuoteStatusEventView['actor']['kind'];

  @Column({ type: 'integer', nullable: true })
  actorId!: number | null;

  @Column({ type: 'text' })
  actorName!: string;

  @Column({ type: 'text', default: '' })
  note!: string;

  @Column({ type: 'datetime' })
  at!: Date;
}
