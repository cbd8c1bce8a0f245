import { type AddressInfo } from 'node:net';
import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { type AddressObject, simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { APP_CONFIG, type ResolvedConfig } from '../../config/config.module.js';
import { MailRepository } from './mail.repository.js';

const maxMessageBytes = 10 * 1024 * 1024;

function addresses(field: AddressObject | AddressObject[] | undefined): string[] {
  return [field ?? []].flat().flatMap((group) => group.value.map((entry) => entry.address ?? entry.name).filter((value): value is string => Boolean(value)));
}

/**
 * With no SMTP_URL, outgoing mail goes over real SMTP to this in-process server on loopback,
 * which stores each message so admins can read it in the app.
 */
@Injectable()
export class MailCatcherService implements OnApplicationShutdown {
  private readonly logger = new Logger('MailCatcher');
  private server: SMTPServer | undefined;
  private starting: Promise<number> | undefined;

  constructor(
    @Inject(APP_CONFIG) private readonly config: ResolvedConfig,
    private readonly repository: MailRepository,
  ) {}

  get enabled(): boolean {
    return !this.config.smtpUrl;
  }

  /** Starts once; resolves to the port it listens on. */
  port(): Promise<number> {
    this.starting ??= this.start();
    return this.starting;
  }

  private start(): Promise<number> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      size: maxMessageBytes,
      onData: (stream, session, callback) => {
        let sizeBytes = 0;
        stream.on('data', (chunk: Buffer) => (sizeBytes += chunk.length));
        simpleParser(stream)
          .then(async (parsed) => {
            const recipients = session.envelope.rcptTo.map((rcpt) => rcpt.address);
            await this.repository.insert({
              from: addresses(parsed.from)[0] ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
              to: recipients.length > 0 ? recipients : addresses(parsed.to),
              subject: parsed.subject ?? '',
              text: parsed.text ?? '',
              html: typeof parsed.html === 'string' ? parsed.html : null,
              sizeBytes,
            });
            callback();
          })
          .catch((error: unknown) => {
            this.logger.error(`Could not store a caught message: ${String(error)}`);
            callback(new Error('Message could not be stored'));
          });
      },
    });
    this.server = server;
    return new Promise((resolve, reject) => {
      server.server.once('error', reject);
      server.listen(0, '127.0.0.1', () => {
        const { port } = server.server.address() as AddressInfo;
        this.logger.log(`No SMTP_URL set: catching outgoing mail on 127.0.0.1:${port}; admins read it under Mail.`);
        resolve(port);
      });
    });
  }

  async onApplicationShutdown(): Promise<void> {
    const server = this.server;
    if (!server) return;
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
