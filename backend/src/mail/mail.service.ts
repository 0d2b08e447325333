import { Inject, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import { mailConfig, type MailConfig } from '../config/configuration';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

export type SendResult = { sent: true; messageId: string } | { sent: false; reason: string };

/** How long to wait on an SMTP server before calling a send failed; a dead server must not hang a request. */
const SMTP_TIMEOUT_MS = 10_000;

/**
 * Sends mail over SMTP with nodemailer. Host and port come from the `mail` config
 * (SMTP_HOST, SMTP_PORT; a local catcher in development and tests), so production mail is
 * a configuration change. A failure is reported, never thrown: callers keep what they saved.
 */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;

  constructor(@Inject(mailConfig.KEY) private readonly config: MailConfig) {
    this.transport = createTransport({
      host: config.host,
      port: config.port,
      secure: config.secure,
      auth: config.user ? { user: config.user, pass: config.pass ?? '' } : undefined,
      connectionTimeout: SMTP_TIMEOUT_MS,
      greetingTimeout: SMTP_TIMEOUT_MS,
      socketTimeout: SMTP_TIMEOUT_MS,
    });
  }

  get from(): string {
    return this.config.from;
  }

  async send(message: MailMessage): Promise<SendResult> {
    try {
      const info = (await this.transport.sendMail({ from: this.config.from, ...message })) as { messageId?: string };
      return { sent: true, messageId: info.messageId ?? '' };
    } catch (err) {
      const reason = describeSmtpError(err, this.config.host, this.config.port);
      this.logger.warn(`Mail to ${message.to} not sent: ${reason}`);
      return { sent: false, reason };
    }
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}

/** A reason a shop owner can act on, without stack traces or credentials. */
export function describeSmtpError(err: unknown, host: string, port: number): string {
  const e = err as { code?: string; responseCode?: number; response?: string; message?: string } | null;
  const where = `the mail server at ${host}:${port}`;
  // nodemailer wraps socket errors (ESOCKET, ECONNECTION); the system code is in the message.
  const system = /\b(ECONNREFUSED|ETIMEDOUT|ENOTFOUND|ECONNRESET|EHOSTUNREACH)\b/.exec(e?.message ?? '')?.[1];
  switch (system ?? e?.code) {
    case 'ECONNREFUSED':
      return `${where} refused the connection (is it running?)`;
    case 'ECONNRESET':
      return `${where} closed the connection`;
    case 'EHOSTUNREACH':
    case 'ETIMEDOUT':
    case 'ETIMEOUT':
      return `${where} did not answer in time`;
    case 'ENOTFOUND':
    case 'EDNS':
      return `${where} could not be found`;
    case 'EAUTH':
      return `${where} did not accept the sign-in`;
    case 'EENVELOPE':
      return `the recipient address was not accepted${e?.response ? `: ${e.response}` : ''}`;
    default:
      if (e?.responseCode) return `${where} answered ${e.responseCode}${e.response ? `: ${e.response}` : ''}`;
      return `${where} could not be reached${e?.message ? `: ${e.message}` : ''}`;
  }
}
