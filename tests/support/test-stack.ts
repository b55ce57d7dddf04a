import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { resolve } from 'node:path';
import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { createSequelize } from '../../server/db';
import { startMailCatcher, type MailCatcher } from '../../server/mail/catcher';
import { createMailer, storeCaughtMail, type Mailer } from '../../server/mail/mailer';
import { catcherCredentials } from '../../server/mail/catcher-credentials';

export interface TestStack {
  app: Express;
  config: Config;
  sequelize: Sequelize;
  mailer: Mailer;
  /** The address a browser opens (only meaningful with { listen: true }). */
  url: string;
  /** Another app on the same database and mail catcher, with some settings changed. */
  appWith: (env: Record<string, string>) => Express;
  close: () => Promise<void>;
}

/**
 * The real server pieces against this worker's MariaDB database: the app, the SMTP catcher
 * on a free loopback port filing into the outbox, and a mailer sending to it. API tests
 * hand `app` to supertest; browser tests ask for { listen: true } and open `url`.
 * One stack per test file: the models bind to one Sequelize instance per process.
 */
export async function startTestStack(options: { listen?: boolean; env?: Record<string, string> } = {}): Promise<TestStack> {
  let server: Server | null = null;
  let url = 'http://127.0.0.1:4199';
  if (options.listen) {
    // Bind first, so the configuration (e-mailed links, the same-origin check) names the real port.
    server = createServer();
    await new Promise<void>((done) => server!.listen(0, '127.0.0.1', () => done()));
    url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  }
  const catcher: MailCatcher = await startMailCatcher({
    port: 0,
    store: storeCaughtMail,
    onError: (e) => console.warn(`catcher: ${e.message}`),
    credentials: catcherCredentials(loadConfig({ ...process.env, PUBLIC_URL: url, ...options.env })),
  });
  const config = loadConfig({ ...process.env, PUBLIC_URL: url, SMTP_PORT: String(catcher.port), ...options.env });
  const sequelize = createSequelize(config);
  const mailer = createMailer(config);
  const app = createApp({ config, sequelize, mailer }, { clientDir: resolve('dist') });
  server?.on('request', app);
  return {
    app,
    config,
    sequelize,
    mailer,
    url,
    appWith: (env) => createApp({ config: loadConfig({ ...process.env, PUBLIC_URL: url, SMTP_PORT: String(catcher.port), ...options.env, ...env }), sequelize, mailer }, { clientDir: resolve('dist') }),
    async close() {
      if (server) {
        server.closeAllConnections();
        await new Promise<void>((done) => server!.close(() => done()));
      }
      mailer.close();
      await catcher.close();
      await sequelize.close();
    },
  };
}
