import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { DataSource } from 'typeorm';
import { MailboxMessage } from './entities/mailbox-message.entity.js';

/**
 * An SMTP server on loopback that keeps what it receives, in place of a hosted mail service for
 * the demo and the tests. Lockstep sends to it through nodemailer exactly as to a real server.
 */
@Injectable()
export class MailCatcherService implements OnModuleDestroy {
  private readonly logger = new Logger('MailCatcher');
  private server: SMTPServer | null = null;
  private starting: Promise<number> | null = null;

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Starts once, on first use; answers the loopback port to send to. */
  port(): Promise<number> {
    this.starting ??= this.start();
    return this.starting;
  }

  private start(): Promise<number> {
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS'],
      logger: false,
      size: 1024 * 1024,
      onData: (stream, _session, callback) => {
        simpleParser(stream)
          .then((mail) => this.keep(mail.to, mail.subject ?? '', mail.text ?? ''))
          .then(() => callback())
          .catch((error: Error) => callback(error));
      },
    });
    this.server = server;
    return new Promise((resolve, reject) => {
      server.once('error', reject);
      server.listen(0, '127.0.0.1', () => {
        const address = server.server.address();
        if (!address || typeof address === 'string') return reject(new Error('The mail catcher has no port'));
        this.logger.log(`Catching e-mail on smtp://127.0.0.1:${address.port} (see the admin Mailbox)`);
        resolve(address.port);
      });
    });
  }

  private async keep(to: unknown, subject: string, text: string): Promise<void> {
    const addresses = (Array.isArray(to) ? to : [to])
      .flatMap((entry) => (entry as { value?: { address?: string }[] } | undefined)?.value ?? [])
      .map((value) => value.address ?? '')
      .filter(Boolean)
      .join(', ');
    // Through the transaction queue, so it never lands inside (or is rolled back with) a request’s transaction.
    await this.dataSource.transaction((manager) =>
      manager.insert(MailboxMessage, { to: addresses, subject, text: text.trim(), at: new Date() }),
    );
  }

  onModuleDestroy(): Promise<void> {
    const server = this.server;
    if (!server) return Promise.resolve();
    return new Promise((resolve) => server.close(() => resolve()));
  }
}
