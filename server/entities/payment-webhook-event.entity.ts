import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A payment webhook already handled, by its event id, so a repeated delivery changes nothing. */
@Entity({ name: 'payment_webhook_event' })
export class PaymentWebhookEvent {
  @PrimaryColumn({ type: 'text' })
  eventId!: string;

  @Column({ type: 'text' })
  type!: string;

  @Column({ type: 'datetime' })
  receivedAt!: Date;
}
