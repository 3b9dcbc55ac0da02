/**
 * `npm start`: one command from a fresh clone to a running Soundframe. Installs and starts a
 * private MariaDB, prepares the database, starts the mail sink, builds the web export when the
 * sources changed, migrates, seeds the demo and serves everything from one Express process.
 */
import fs from 'node:fs';
import path from 'node:path';
import { loadConfig } from '@/server/config';
import { createSequelize } from '@/server/db';
import { startServer } from '@/server/index';
import { startMailSink } from '@/server/mail/sink';
import { runMigrations } from '@/server/migrate';
import { DEMO_ACCOUNTS, seedDemoIfEmpty } from '@/server/seeders/demo';
import { formatBanner } from './banner';
import { ensureDatabase, ensureMariadbInstalled, startPrivateMariadb } from './mariadb';
import { failAndExit, generateSecret, parsePort, REPO_ROOT, ToolError } from './shell';
import { ensureWebExport } from './web-export';

interface Secrets {
  dbPassword: string;
  jwtSecret: string;
}

/** Generated once per data folder and kept beside it, readable only by this user. */
function loadOrCreateSecrets(file: string): Secrets {
  try {
    const stored = JSON.parse(fs.readFileSync(file, 'utf8')) as Partial<Secrets>;
    if (typeof stored.dbPassword === 'string' && typeof stored.jwtSecret === 'string') {
      fs.chmodSync(file, 0o600);
      return { dbPassword: stored.dbPassword, jwtSecret: stored.jwtSecret };
    }
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') {
      throw new ToolError(
        `Cannot read ${file} (${(error as Error).message}); delete it to generate new secrets.`,
      );
    }
  }
  const secrets = { dbPassword: generateSecret(24), jwtSecret: generateSecret(48) };
  fs.mkdirSync(path.dirname(file), { recursive: true });
  fs.writeFileSync(file, `${JSON.stringify(secrets, null, 2)}\n`, { mode: 0o600 });
  return secrets;
}

/** Undo steps, run newest first. */
const cleanups: { label: string; run: () => Promise<void> }[] = [];

async function runCleanups(): Promise<boolean> {
  let ok = true;
  while (cleanups.length > 0) {
    const step = cleanups.pop()!;
    try {
      await step.run();
    } catch (error) {
      ok = false;
      console.error(`Could not stop the ${step.label}: ${(error as Error).message}`);
    }
  }
  return ok;
}

async function start(): Promise<void> {
  const env = process.env;
  const dataDir = path.resolve(env.SF_DATA_DIR ?? path.join(REPO_ROOT, '.data'));
  const port = parsePort(env.PORT, 8080, 'PORT', true);
  const dbPort = parsePort(env.DB_PORT, 3307, 'DB_PORT');
  const smtpPort = parsePort(env.SMTP_PORT, 2525, 'SMTP_PORT');
  const database = env.DB_NAME || 'soundframe';
  const user = env.DB_USER || 'soundframe';

  await ensureMariadbInstalled();
  fs.mkdirSync(dataDir, { recursive: true });
  const secrets = loadOrCreateSecrets(path.join(dataDir, 'secrets.json'));
  const password = env.DB_PASSWORD || secrets.dbPassword;

  const db = await startPrivateMariadb({ dataDir: path.join(dataDir, 'mariadb'), port: dbPort });
  cleanups.push({ label: 'database', run: () => db.stop() });
  process.once('exit', () => db.killNow());
  console.log(`MariaDB is running on 127.0.0.1:${db.port} (data in ${db.dataDir}).`);
  await ensureDatabase({ socket: db.socket, database, user, password });

  const mailDir = path.resolve(env.MAIL_SINK_DIR ?? path.join(dataDir, 'mail'));
  const sink = await startMailSink({ host: '127.0.0.1', port: smtpPort, dir: mailDir });
  cleanups.push({ label: 'mail sink', run: () => sink.close() });

  const webDist = path.resolve(REPO_ROOT, env.WEB_DIST ?? 'dist');
  await ensureWebExport({ root: REPO_ROOT, outDir: webDist });

  const config = loadConfig({
    ...env,
    NODE_ENV: env.NODE_ENV || 'development',
    HOST: env.HOST || '127.0.0.1',
    PORT: String(port),
    DB_HOST: '127.0.0.1',
    DB_PORT: String(db.port),
    DB_NAME: database,
    DB_USER: user,
    DB_PASSWORD: password,
    JWT_SECRET: env.JWT_SECRET || secrets.jwtSecret,
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(sink.port),
    MAIL_SINK_DIR: mailDir,
    STORAGE_DIR: path.resolve(env.STORAGE_DIR ?? path.join(dataDir, 'storage')),
    WEB_DIST: webDist,
  });
  const sequelize = createSequelize(config);
  cleanups.push({ label: 'database connections', run: () => sequelize.close() });
  await runMigrations(sequelize);
  const { seeded } = await seedDemoIfEmpty(sequelize, config);
  if (seeded) console.log('Seeded the demo workshop.');
  if (stopping) return;

  const server = await startServer(config, { sequelize });
  cleanups.push({ label: 'web server', run: () => server.close() });

  // Reachable on loopback even when HOST is a wildcard address.
  const shownHost = ['0.0.0.0', '::', ''].includes(config.host) ? '127.0.0.1' : config.host;
  console.log(
    formatBanner({
      url: `http://${shownHost}:${server.port}`,
      accounts: DEMO_ACCOUNTS,
      mailDir,
      dataDir,
      dbPort: db.port,
      smtpPort: sink.port,
      outbox: config.outboxEnabled,
    }),
  );
}

let stopping = false;
let stoppingSince = 0;
let startup: Promise<void> = Promise.resolve();

async function shutdown(signal: NodeJS.Signals): Promise<void> {
  if (stopping) {
    // Under tsx a terminal Ctrl-C arrives twice (the group's and tsx's relay): only a later press is news.
    if (Date.now() - stoppingSince > 1000) {
      console.log(`(${signal} again: still shutting down so that MariaDB loses nothing)`);
    }
    return;
  }
  stopping = true;
  stoppingSince = Date.now();
  console.log(`\n${signal}: shutting down…`);
  // A step in flight (an install, an export) finishes first, so its resources are on the list.
  await startup.catch(() => undefined);
  const ok = await runCleanups();
  console.log(
    ok
      ? 'Soundframe stopped; MariaDB shut down cleanly.'
      : 'Soundframe stopped with errors (above).',
  );
  process.exit(ok ? 0 : 1);
}

process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));

startup = start();
startup.catch(async (error: unknown) => {
  if (stopping) return;
  stopping = true;
  await runCleanups();
  failAndExit(error);
});
