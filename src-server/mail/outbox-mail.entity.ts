import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type OutboxStatus = 'pending' | 'sent' | 'failed';

/** A message waiting for, or done with, SMTP delivery; mail is never lost when the relay is down. */
@Entity({ name: 'mail_outbox' })
export class OutboxMail {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Column({ name: 'to_addresses', type: 'json' })
  toAddresses: string[];

  @Column({ type: 'varchar', length: 200 })
  subject: string;

  @Column({ type: 'mediumtext' })
  body: string;

  /** The body holds a single-use link and is blanked once the message is no longer pending. */
  @Column({ name: 'carries_link_token', type: 'boolean', default: false })
  carriesLinkToken: boolean;

  @Column({ type: 'enum', enum: ['pending', 'sent', 'failed'], default: 'pending' })
  status: OutboxStatus;

  @Column({ type: 'int', unsigned: true, default: 0 })
  attempts: number;

  @Column({ name: 'next_attempt_at', type: 'datetime', precision: 3 })
  nextAttemptAt: Date;

  @Column({ name: 'claimed_until', type: 'datetime', precision: 3, nullable: true })
  claimedUntil: Date | null;

  @Column({ name: 'last_error', type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ name: 'sent_at', type: 'datetime', precision: 3, nullable: true })
  sentAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
