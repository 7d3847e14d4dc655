import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A provider event already handled: its id is the key, so a replay is recognised and ignored. */
@Entity({ name: 'payment_events' })
export class PaymentEvent {
  @PrimaryColumn({ type: 'text' })
  provider: string;

  @PrimaryColumn({ name: 'event_id', type: 'text' })
  eventId: string;

  @Column({ type: 'text' })
  type: string;

  @Column({ name: 'payment_id', type: 'uuid', nullable: true })
  paymentId: string | null;

  @Column({ name: 'received_at', type: 'timestamptz' })
  receivedAt: Date;
}
