import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import type { Config } from '@/server/config';
import { startServer } from '@/server/index';
import { startMailSink } from '@/server/mail/sink';
import { seedDemoIfEmpty } from '@/server/seeders/demo';
import { createTestDatabase } from './test-db';

export const REPO_ROOT = path.resolve(__dirname, '..', '..', '..');
export const WEB_DIST = path.join(REPO_ROOT, 'dist');

export interface TestAppServer {
  url: string;
  port: number;
  mailDir: string;
  config: Config;
  sequelize: Sequelize;
  close(): Promise<void>;
}

/**
 * The whole app as `npm start` runs it, in miniature: its own database, a mail sink in a temp
 * folder, the demo seed, and one Express server on a free port serving /api and the web export.
 */
export async function startTestApp(
  options: { seed?: boolean; prefix?: string; env?: Record<string, string> } = {},
): Promise<TestAppServer> {
  if (!fs.existsSync(path.join(WEB_DIST, 'index.html'))) {
    throw new Error(
      `No web export in ${WEB_DIST}: run the tests with npm test (it builds one), or npm run web:export.`,
    );
  }
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-e2e-'));
  const mailDir = path.join(tmp, 'mail');
  const sink = await startMailSink({ host: '127.0.0.1', port: 0, dir: mailDir });
  const cleanups: (() => Promise<void>)[] = [
    async () => fs.rmSync(tmp, { recursive: true, force: true }),
    () => sink.close(),
  ];
  const closeAll = async () => {
    const errors: unknown[] = [];
    for (const cleanup of cleanups.reverse())
      await cleanup().catch((error: unknown) => errors.push(error));
    if (errors.length > 0) throw errors[0];
  };
  try {
    const db = await createTestDatabase(options.prefix ?? 'app', {
      HOST: '127.0.0.1',
      PORT: '0',
      JWT_SECRET: crypto.randomBytes(32).toString('hex'),
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(sink.port),
      MAIL_SINK_DIR: mailDir,
      STORAGE_DRIVER: 'local',
      STORAGE_DIR: path.join(tmp, 'storage'),
      WEB_DIST,
      // Browser tests sign in many times from one address.
      SIGN_IN_RATE_LIMIT: '1000',
      ...options.env,
    });
    cleanups.push(() => db.drop());
    if (options.seed ?? true) await seedDemoIfEmpty(db.sequelize, db.config);
    const server = await startServer(db.config, { sequelize: db.sequelize });
    cleanups.push(() => server.close());
    return {
      url: server.url,
      port: server.port,
      mailDir,
      config: db.config,
      sequelize: db.sequelize,
      close: closeAll,
    };
  } catch (error) {
    await closeAll().catch(() => undefined);
    throw error;
  }
}
