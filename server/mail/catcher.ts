import { SMTPServer } from 'smtp-server';
import { simpleParser, type ParsedMail } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { timingSafeEqual } from 'node:crypto';

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

const same = (a: string, b: string) => {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
};

/**
 * A local stand-in for a mail relay: an SMTP server on loopback that accepts messages only
 * from a client that signs in with `credentials` (the app's own), and hands each, parsed, to `store`. The message is acknowledged to the sender
 * only after `store` resolves, so once sendMail() returns the message is in the outbox.
 * STARTTLS is disabled because the package's built-in certificate has expired; loopback only.
 */
export async function startMailCatcher(options: {
  port: number;
  host?: string;
  store: (mail: CaughtMail) => Promise<void>;
  onError?: (error: Error) => void;
  credentials: { user: string; pass: string };
}): Promise<MailCatcher> {
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS'],
    authOptional: false,
    authMethods: ['PLAIN', 'LOGIN'],
    // Plain-text sign-in without TLS: the catcher listens on loopback only.
    allowInsecureAuth: true,
    onAuth(auth, _session, callback) {
      const ok = same(auth.username ?? '', options.credentials.user) && same(auth.password ?? '', options.credentials.pass);
      if (!ok) return callback(Object.assign(new Error('Wrong mail catcher credentials'), { responseCode: 535 }));
      callback(null, { user: auth.username });
    },
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
