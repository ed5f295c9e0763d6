import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import nodemailer, { type Transporter } from 'nodemailer';
import type { Env } from '../config/env.validation.js';
import { MailCatcherService } from './mail-catcher.service.js';

export type OutgoingMail = { to: string; subject: string; text: string };

const RETRY_DELAYS_MS = [500, 2000, 5000];

/**
 * Sends notices over SMTP. Sending happens after the clinical action has committed, is retried,
 * and a final failure is only logged: e-mail never blocks or undoes care.
 */
@Injectable()
export class MailService {
  private readonly logger = new Logger('Mail');
  private transporter: Promise<Transporter> | null = null;
  private readonly pending = new Set<Promise<void>>();

  constructor(
    private readonly config: ConfigService<Env, true>,
    private readonly catcher: MailCatcherService,
  ) {}

  /** Queues the message and returns at once. */
  send(mail: OutgoingMail): void {
    if (!mail.to.trim()) {
      this.logger.warn(`No address for "${mail.subject}": not sent (set the ward's e-mail addresses)`);
      return;
    }
    const delivery = this.deliver(mail).finally(() => this.pending.delete(delivery));
    this.pending.add(delivery);
  }

  /** For tests and shutdown: resolves when every queued message has been sent or given up on. */
  async drain(): Promise<void> {
    await Promise.all([...this.pending]);
  }

  private async deliver(mail: OutgoingMail): Promise<void> {
    for (let attempt = 0; attempt <= RETRY_DELAYS_MS.length; attempt++) {
      try {
        const transporter = await this.transport();
        await transporter.sendMail({ from: this.config.get('MAIL_FROM', { infer: true }), ...mail });
        return;
      } catch (error) {
        const last = attempt === RETRY_DELAYS_MS.length;
        this.logger.warn(
          `Sending "${mail.subject}" to ${mail.to} failed (attempt ${attempt + 1})${last ? '; giving up' : ''}: ${(error as Error).message}`,
        );
        if (last) return;
        await new Promise((resolve) => setTimeout(resolve, RETRY_DELAYS_MS[attempt]));
      }
    }
  }

  private transport(): Promise<Transporter> {
    this.transporter ??= (async () => {
      const configured = this.config.get('SMTP_URL', { infer: true });
      if (configured) return nodemailer.createTransport(configured);
      // The local catcher speaks plain SMTP on loopback only.
      const port = await this.catcher.port();
      return nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
    })();
    return this.transporter;
  }
}
