import type { Server } from 'node:http';
import { loadConfig, type Config } from './config';
import { createApp } from './app';
import { createSequelize } from './db';
import { startMailCatcher, type MailCatcher } from './mail/catcher';
import { catcherCredentials } from './mail/catcher-credentials';
import { createMailer, storeCaughtMail } from './mail/mailer';
import { migrateUp } from './migrator';
import { warmHeavyJobWorker } from './services/heavy-jobs';
import { rederiveOutdatedPredictions } from './services/physics-upgrade';
import { modeCouplingGlassLine } from '../shared/physics';

export interface RunningGelwright {
  url: string;
  config: Config;
  stop: () => Promise<void>;
}

/**
 * Starts everything the server process owns: the database pool, the migrations, the
 * local mail catcher (when configured) and the HTTP server. stop() closes them in order.
 */
export async function startGelwright(config: Config, options: { clientDir?: string; migrate?: boolean } = {}): Promise<RunningGelwright> {
  const sequelize = createSequelize(config);
  await sequelize.authenticate();
  if (options.migrate ?? true) {
    await migrateUp(sequelize);
    await rederiveOutdatedPredictions(sequelize);
  }
  let catcher: MailCatcher | null = null;
  if (config.MAIL_CATCHER) {
    catcher = await startMailCatcher({
      port: config.SMTP_PORT,
      host: '127.0.0.1',
      store: storeCaughtMail,
      onError: (error) => console.warn(`mail catcher: ${error.message}`),
      credentials: catcherCredentials(config),
    });
  }
  const mailer = createMailer(config);
  warmHeavyJobWorker();
  // Every state map draws the mode-coupling glass line, ~0.3 s of CPU the first time in a
  // process: done before listening, so the first map anyone asks for does not stall the others.
  modeCouplingGlassLine();
  const app = createApp({ config, sequelize, mailer }, { clientDir: options.clientDir });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.PORT, config.HOST, () => resolve(s));
    s.once('error', reject);
  });
  server.keepAliveTimeout = 5000;
  return {
    url: config.PUBLIC_URL,
    config,
    async stop() {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
      mailer.close();
      await catcher?.close();
      await sequelize.close();
    },
  };
}

// Run directly (tsx server/index.ts): read the environment, start, stop on a signal.
if (import.meta.url === `file://${process.argv[1]}`) {
  const config = loadConfig();
  const running = await startGelwright(config);
  console.log(`Gelwright listening on ${running.url}`);
  const stop = async () => {
    await running.stop();
    process.exit(0);
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
