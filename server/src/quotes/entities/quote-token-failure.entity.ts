import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A request with a quote-link token that matches no link, counted per address (see WrongTokenThrottle). */
@Entity({ name: 'quote_token_failures' })
@Index('quote_token_failures_ip_idx', ['ip', 'createdAt'])
export class QuoteTokenFailure {
  @PrimaryGeneratedColumn('increment', { type: 'bigint' })
  id: string;

  @Column({ type: 'text' })
  ip: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
