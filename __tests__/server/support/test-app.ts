import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { createApp } from '@/server/app';
import { loadConfig, type Config } from '@/server/config';
import { createSequelize } from '@/server/db';
import type { ReportQueue } from '@/server/jobs/report-queue';
import { startMailSink } from '@/server/mail/sink';
import { createMailer } from '@/server/mail/transport';
import { createStorage } from '@/server/storage';

/**
 * One app per test file against the test database prepared by global-setup (migrations ran once).
 * Mail goes to `mailPort` when a test starts its own sink; storage is a temp folder.
 */
export function testConfig(overrides: Record<string, string> = {}): Config {
  return loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    BCRYPT_COST: '10',
    SIGN_IN_RATE_LIMIT: '1000',
    STORAGE_DIR: fs.mkdtempSync(path.join(os.tmpdir(), 'sf-storage-')),
    WEB_DIST: path.join(os.tmpdir(), 'sf-no-dist'),
    ...overrides,
  });
}

export type TestApp = {
  app: ReturnType<typeof createApp>;
  config: Config;
  sequelize: Sequelize;
  close(): Promise<void>;
};

export function buildTestApp(overrides: Record<string, string> = {}): TestApp {
  const config = testConfig(overrides);
  const sequelize = createSequelize(config);
  const storage = createStorage(config.storage);
  const mailer = createMailer({
    host: config.mail.host,
    port: config.mail.port,
    from: config.mail.from,
  });
  const app = createApp({ config, storage, mailer });
  return {
    app,
    config,
    sequelize,
    async close() {
      await (app.locals.reportQueue as ReportQueue).stop();
      mailer.close();
      await sequelize.close();
      if (config.storage.driver === 'local')
        fs.rmSync(config.storage.dir, { recursive: true, force: true });
    },
  };
}

export type TestAppWithMail = TestApp & { mailDir: string };

/** A test app whose mail goes to a sink of its own, in a temp folder that close() removes. */
export async function buildTestAppWithMail(
  overrides: Record<string, string> = {},
): Promise<TestAppWithMail> {
  const mailDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-mail-'));
  const sink = await startMailSink({ port: 0, dir: mailDir });
  const t = buildTestApp({ SMTP_PORT: String(sink.port), MAIL_SINK_DIR: mailDir, ...overrides });
  return {
    ...t,
    mailDir,
    async close() {
      await t.close();
      await sink.close();
      fs.rmSync(mailDir, { recursive: true, force: true });
    },
  };
}
