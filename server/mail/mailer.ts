import nodemailer from 'nodemailer';
import type { Config } from '../config';
import { OutboxMessage } from '../models';
import { catcherCredentials } from './catcher-credentials';

export interface MailMessage {
  to: string[];
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send: (message: MailMessage) => Promise<void>;
  close: () => void;
}

/**
 * nodemailer over SMTP. With the local catcher (MAIL_CATCHER=true) the catcher files each
 * message in the outbox; with a real relay the mailer files it itself after the relay accepts it.
 */
export function createMailer(config: Config): Mailer {
  const transport = nodemailer.createTransport({
    host: config.SMTP_HOST,
    port: config.SMTP_PORT,
    secure: config.SMTP_SECURE,
    ignoreTLS: config.MAIL_CATCHER,
    auth: config.MAIL_CATCHER ? catcherCredentials(config) : config.SMTP_USER ? { user: config.SMTP_USER, pass: config.SMTP_PASSWORD ?? '' } : undefined,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10_000,
  });
  return {
    async send(message) {
      const info = await transport.sendMail({ from: config.MAIL_FROM, ...message });
      if (!config.MAIL_CATCHER) {
        await OutboxMessage.create({
          messageId: info.messageId ?? null,
          sender: config.MAIL_FROM,
          recipients: message.to.join(', '),
          subject: message.subject,
          textBody: message.text,
          htmlBody: message.html ?? null,
          transport: 'relay',
        });
      }
    },
    close: () => transport.close(),
  };
}

/** The catcher's store: one outbox row per message received. */
export async function storeCaughtMail(mail: import('./catcher').CaughtMail) {
  await OutboxMessage.create({
    messageId: mail.messageId,
    sender: mail.from,
    recipients: mail.to.join(', '),
    subject: mail.subject,
    textBody: mail.text,
    htmlBody: mail.html,
    transport: 'catcher',
  });
}
