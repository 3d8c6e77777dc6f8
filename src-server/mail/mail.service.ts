import { Inject, Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import nodemailer, { Transporter } from 'nodemailer';
import { DataSource, EntityManager } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { OutboxMail } from './outbox-mail.entity';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
  /** A single-use sign-in or reset link: the body is removed from the outbox once the relay has it (or gave up). */
  carriesLinkToken?: boolean;
}

export const REMOVED_BODY = '(removed after delivery: it carried a single-use link)';

export const MAX_DELIVERY_ATTEMPTS = 12;
const POLL_MS = 2000;
const CLAIM_SECONDS = 60;

/** Seconds to wait before attempt n+1: 2, 4, 8 … capped at ten minutes. */
export const retryDelaySeconds = (attempts: number): number => Math.min(2 ** attempts, 600);

/**
 * Mail goes through an outbox table: sending writes a row (inside the caller's transaction when one is
 * given), then delivery is tried at once and retried with back-off until the SMTP relay takes it.
 */
@Injectable()
export class MailService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;
  private timer: NodeJS.Timeout | undefined;
  private draining = false;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {
    this.transport = nodemailer.createTransport({
      host: config.smtp.host,
      port: config.smtp.port,
      secure: false,
      ignoreTLS: config.nodeEnv !== 'production',
      connectionTimeout: 5000,
      greetingTimeout: 5000,
    });
  }

  onApplicationBootstrap(): void {
    this.timer = setInterval(() => void this.deliverDue(), POLL_MS);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    clearInterval(this.timer);
  }

  /** Whether the SMTP relay answers (connect and greeting); used by /api/health. */
  async isUp(): Promise<boolean> {
    return this.transport.verify().then(
      () => true,
      () => false,
    );
  }

  /** Queues the message; with a manager it commits or rolls back together with the caller's change. */
  async send(mail: OutgoingMail, manager?: EntityManager): Promise<void> {
    const to = Array.isArray(mail.to) ? mail.to : [mail.to];
    if (to.length === 0) return;
    const result = await (manager ?? this.dataSource.manager).insert(OutboxMail, {
      toAddresses: to,
      subject: mail.subject.slice(0, 200),
      body: mail.text,
      carriesLinkToken: mail.carriesLinkToken ?? false,
      nextAttemptAt: new Date(),
    });
    const id = String(result.identifiers[0].id);
    if (!manager) await this.deliver(id);
  }

  /** Delivers every due message; safe to run from several app instances at once. */
  async deliverDue(): Promise<void> {
    if (this.draining) return;
    this.draining = true;
    try {
      const due: { id: string }[] = await this.dataSource.query(
        "SELECT id FROM mail_outbox WHERE status = 'pending' AND next_attempt_at <= NOW(3) AND (claimed_until IS NULL OR claimed_until < NOW(3)) ORDER BY id LIMIT 50",
      );
      for (const { id } of due) await this.deliver(String(id));
    } catch (error) {
      this.logger.warn(`outbox check failed: ${(error as Error).message}`);
    } finally {
      this.draining = false;
    }
  }

  private async deliver(id: string): Promise<void> {
    // Claiming the row first means two instances never send the same message.
    const claim = await this.dataSource.query(
      `UPDATE mail_outbox SET claimed_until = NOW(3) + INTERVAL ${CLAIM_SECONDS} SECOND
       WHERE id = ? AND status = 'pending' AND (claimed_until IS NULL OR claimed_until < NOW(3))`,
      [id],
    );
    if ((claim.affectedRows ?? claim[1]) !== 1) return;
    const row = await this.dataSource.getRepository(OutboxMail).findOneByOrFail({ id });
    try {
      await this.transport.sendMail({ from: this.config.smtp.from, to: row.toAddresses, subject: row.subject, text: row.body });
      await this.dataSource.getRepository(OutboxMail).update(
        { id },
        {
          status: 'sent',
          sentAt: new Date(),
          attempts: row.attempts + 1,
          claimedUntil: null,
          lastError: null,
          ...(row.carriesLinkToken ? { body: REMOVED_BODY } : {}),
        },
      );
    } catch (error) {
      const attempts = row.attempts + 1;
      const failed = attempts >= MAX_DELIVERY_ATTEMPTS;
      this.logger.warn(`mail ${id} "${row.subject}" not delivered (attempt ${attempts}): ${(error as Error).message}`);
      await this.dataSource.getRepository(OutboxMail).update(
        { id },
        {
          status: failed ? 'failed' : 'pending',
          attempts,
          claimedUntil: null,
          lastError: (error as Error).message.slice(0, 500),
          nextAttemptAt: new Date(Date.now() + retryDelaySeconds(attempts) * 1000),
          ...(failed && row.carriesLinkToken ? { body: REMOVED_BODY } : {}),
        },
      );
    }
  }
}
