import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { type CapturedMail, type CapturedMailList, type PageQuery } from '@limitbook/contracts';
import { toMail, toMailSummary } from './dto/captured-mail.dto.js';
import { MailCatcherService } from './mail-catcher.service.js';
import { MailException } from './mail.exception.js';
import { MailRepository } from './mail.repository.js';
import { type MailContent } from './templates/layout.js';

export interface OutgoingMail extends MailContent {
  to: string;
}

@Injectable()
export class MailService implements OnApplicationShutdown {
  private readonly logger = new Logger('Mail');
  private transporter: Promise<Transporter> | undefined;
  private readonly pending = new Set<Promise<void>>();

  constructor(
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
    private readonly catcher: MailCatcherService,
    private readonly repository: MailRepository,
  ) {}

  async listCaptured(query: PageQuery): Promise<CapturedMailList> {
    const { rows, total } = await this.repository.list(query.limit, query.offset);
    return { items: rows.map(toMailSummary), total };
  }

  async getCaptured(id: string): Promise<CapturedMail> {
    const row = await this.repository.find(id);
    if (!row) throw MailException.notFound();
    return toMail(row);
  }

  async send(mail: OutgoingMail): Promise<void> {
    const transporter = await this.transport();
    await transporter.sendMail({ from: this.config.mailFrom, to: mail.to, subject: mail.subject, text: mail.text, html: mail.html });
  }

  /**
   * Sends without making the caller wait, so a response does not take longer when a mail
   * goes out (which would tell an attacker whether an account exists). Failures are logged.
   */
  dispatch(mail: OutgoingMail): void {
    const sending = this.send(mail)
      .catch((error: unknown) => this.logger.error(`Sending "${mail.subject}" failed: ${String(error)}`))
      .finally(() => this.pending.delete(sending));
    this.pending.add(sending);
  }

  /** Waits for dispatched mail; tests and shutdown use it. */
  async flush(): Promise<void> {
    while (this.pending.size > 0) await Promise.all([...this.pending]);
  }

  private transport(): Promise<Transporter> {
    this.transporter ??= this.createTransport();
    return this.transporter;
  }

  private async createTransport(): Promise<Transporter> {
    if (this.config.smtpUrl) return nodemailer.createTransport(this.config.smtpUrl);
    const port = await this.catcher.port();
    return nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
  }

  async onApplicationShutdown(): Promise<void> {
    await this.flush();
    if (this.transporter) (await this.transporter).close();
  }
}
