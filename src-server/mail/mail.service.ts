import { Inject, Injectable, Logger } from '@nestjs/common';
import nodemailer, { Transporter } from 'nodemailer';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { DomainError } from '../common/domain-error';

export interface OutgoingMail {
  to: string | string[];
  subject: string;
  text: string;
}

@Injectable()
export class MailService {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {
    this.transport = nodemailer.createTransport({
      host: config.smtp.host,
      port: config.smtp.port,
      secure: false,
      ignoreTLS: config.nodeEnv !== 'production',
      connectionTimeout: 5000,
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    try {
      await this.transport.sendMail({ from: this.config.smtp.from, to: mail.to, subject: mail.subject, text: mail.text });
    } catch (error) {
      this.logger.error(`sending "${mail.subject}" failed: ${(error as Error).message}`);
      throw new DomainError('MAIL_UNAVAILABLE', 'The e-mail could not be sent; try again shortly', 503);
    }
  }
}
