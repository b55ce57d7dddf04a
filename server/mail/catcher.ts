import { SMTPServer } from 'smtp-server';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { AddressInfo } from 'node:net';

export interface CaughtMail {
  messageId: string | null;
  from: string;
  to: string[];
  subject: string;
  text: string | null;
  html: string | null;
}

export interface MailCatcher {
  port: number;
  close: () => Promise<void>;
}

/**
 * A local stand-in for a mail relay: an SMTP server on loopback that accepts every
 * message and hands it, parsed, to `store`. The message is acknowledged to the sender
 * only after `store` resolves, so once sendMail() returns the message is in the outbox.
 * STARTTLS is disabled because the package's built-in certificate has expired; loopback only.
 */
export async function startMailCatcher(options: {
  port: number;
  host?: string;
  store: (mail: CaughtMail) => Promise<void>;
  onError?: (error: Error) => void;
}): Promise<MailCatcher> {
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    logger: false,
    banner: 'Gelwright mail catcher',
    size: 5 * 1024 * 1024,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => options.store(toCaughtMail(parsed, session.envelope.rcptTo.map((r) => r.address))))
        .then(() => callback())
        .catch((error: Error) => {
          options.onError?.(error);
          callback(Object.assign(new Error('could not store the message'), { responseCode: 451 }));
        });
    },
  });
  server.on('error', (error) => options.onError?.(error));
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, options.host ?? '127.0.0.1', () => resolve());
  });
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function toCaughtMail(parsed: ParsedMail, envelopeTo: string[]): CaughtMail {
  return {
    messageId: parsed.messageId ?? null,
    from: parsed.from?.text ?? '',
    to: envelopeTo,
    subject: parsed.subject ?? '',
    text: parsed.text ?? null,
    html: typeof parsed.html === 'string' ? parsed.html : null,
  };
}
