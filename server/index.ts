import type { Server } from 'node:http';
import type { Sequelize } from 'sequelize';
import { createApp } from './app';
import { loadConfig, type Config } from './config';
import { createSequelize } from './db';
import { startReminderJob } from './jobs/reminder-job';
import { createReportQueue, REPORT_STALE_AFTER_MS } from './jobs/report-queue';
import { createMailer } from './mail/transport';
import { createStorage } from './storage';

/**
 * Starts the API + web server on config.host:config.port (0 = any free port).
 * The caller owns the database and migrations; `close()` stops listening and releases resources.
 */
export async function startServer(config: Config, opts: { sequelize?: Sequelize } = {}) {
  const sequelize = opts.sequelize ?? createSequelize(config);
  await sequelize.authenticate();
  const storage = createStorage(config.storage);
  const mailer = createMailer({
    host: config.mail.host,
    port: config.mail.port,
    from: config.mail.from,
  });
  // The address reports print for checking them: the public URL, else where this server listens.
  let baseUrl = config.publicUrl ?? null;
  const reportQueue = createReportQueue({
    storage,
    concurrency: config.reports.concurrency,
    instanceId: config.instanceId,
    verifyUrl: () => (baseUrl ? `${baseUrl}/verify` : null),
  });
  const app = createApp({ config, storage, mailer, reportQueue });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.port, config.host, () => resolve(s));
    s.once('error', reject);
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : config.port;
  const url = `http://${config.host}:${port}`;
  baseUrl ??= url;
  // Reports a stopped process left queued or rendering are made now (their inputs are stored),
  // and again while running, in case another process sharing the database stops mid-render.
  await reportQueue.recover();
  const sweep = setInterval(() => {
    reportQueue.recover().catch((e) => console.error('Report recovery failed:', e));
  }, REPORT_STALE_AFTER_MS / 2);
  sweep.unref();
  const reminders = config.reminders.enabled
    ? startReminderJob({ config, sequelize, mailer, publicUrl: config.publicUrl ?? url })
    : null;
  return {
    port,
    url,
    app,
    async close() {
      // Let a digest being sent finish (and be recorded) before its connections go.
      await reminders?.stop();
      clearInterval(sweep);
      // A PDF being rendered is stored before the database goes; waiting ones stay queued.
      await reportQueue.stop();
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await closed;
      mailer.close();
      if (!opts.sequelize) await sequelize.close();
    },
  };
}

/** `tsx server/index.ts`: run against an already prepared database (npm start does the preparing). */
if (require.main === module) {
  const config = loadConfig();
  startServer(config)
    .then((s) => {
      console.log(`Soundframe API listening on ${s.url}`);
      const stop = () => s.close().then(() => process.exit(0));
      process.once('SIGINT', stop);
      process.once('SIGTERM', stop);
    })
    .catch((e) => {
      console.error(e);
      process.exit(1);
    });
}
