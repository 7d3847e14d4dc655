import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A failed sign-in, kept in PostgreSQL so every server instance counts the same failures. */
@Entity({ name: 'login_failures' })
@Index('login_failures_email_idx', ['emailKey', 'createdAt'])
@Index('login_failures_ip_idx', ['ip', 'createdAt'])
export class LoginFailure {
  @PrimaryGeneratedColumn('increment', { type: 'bigint' })
  id: string;

  @Column({ name: 'email_key', type: 'text' })
  emailKey: string;

  @Column({ type: 'text' })
  ip: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
