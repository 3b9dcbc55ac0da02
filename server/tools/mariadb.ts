import { spawn } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import { ensureAptPackages, findBinary } from './apt';
import {
  freePort,
  isAlive,
  isPortFree,
  processesWithArgument,
  runCapture,
  settlesWithin,
  sleep,
  tailFile,
  tailLines,
  ToolError,
  waitForExit,
} from './shell';

export { ensureAptPackages } from './apt';

export interface MariadbBinaries {
  mariadbd: string;
  installDb: string;
  admin: string;
}

/** Where the three MariaDB programs are, or null when any is missing. */
export function findMariadbBinaries(): MariadbBinaries | null {
  const mariadbd = findBinary('mariadbd');
  const installDb = findBinary('mariadb-install-db');
  const admin = findBinary('mariadb-admin');
  return mariadbd && installDb && admin ? { mariadbd, installDb, admin } : null;
}

/** Installs Debian's mariadb-server when mariadbd is missing (as root; otherwise prints the command). */
export async function ensureMariadbInstalled(): Promise<MariadbBinaries> {
  await ensureAptPackages(['mariadb-server']);
  const binaries = findMariadbBinaries();
  if (!binaries) {
    throw new ToolError(
      'mariadbd is installed, but mariadb-install-db or mariadb-admin is missing: reinstall the mariadb-server package.',
    );
  }
  return binaries;
}

/** Unix sockets have a ~108-byte path limit; leave room and fall back to a private temp folder. */
const MAX_SOCKET_PATH = 100;

export interface InstanceFiles {
  dataDir: string;
  socket: string;
  pidFile: string;
  errorLog: string;
}

/** The files of an instance: pid file and error log in its data folder, the socket there when it fits. */
export function instanceFiles(dataDir: string): InstanceFiles {
  const dir = path.resolve(dataDir);
  let socket = path.join(dir, 'mariadbd.sock');
  if (Buffer.byteLength(socket) > MAX_SOCKET_PATH) {
    const digest = crypto.createHash('sha1').update(dir).digest('hex').slice(0, 12);
    socket = path.join(os.tmpdir(), `sf-mariadb-${digest}`, 'mariadbd.sock');
  }
  return {
    dataDir: dir,
    socket,
    pidFile: path.join(dir, 'mariadbd.pid'),
    errorLog: path.join(dir, 'mariadbd.err'),
  };
}

export function installDbArgs(files: InstanceFiles, asRoot: boolean): string[] {
  return [
    '--no-defaults',
    `--datadir=${files.dataDir}`,
    ...(asRoot ? ['--user=root'] : []),
    '--auth-root-authentication-method=normal',
    '--skip-test-db',
    '--skip-name-resolve',
  ];
}

/** `--no-defaults` matters: Debian's own config points the socket at a folder that may not exist. */
export function mariadbdArgs(
  files: InstanceFiles,
  port: number,
  host: string,
  asRoot: boolean,
): string[] {
  return [
    '--no-defaults',
    `--datadir=${files.dataDir}`,
    `--socket=${files.socket}`,
    `--port=${port}`,
    `--bind-address=${host}`,
    ...(asRoot ? ['--user=root'] : []),
    '--skip-name-resolve',
    `--pid-file=${files.pidFile}`,
    `--log-error=${files.errorLog}`,
    '--innodb-log-file-size=16M',
  ];
}

function adminArgs(socket: string, ...command: string[]): string[] {
  return ['--no-defaults', `--socket=${socket}`, '--user=root', '--connect-timeout=5', ...command];
}

/** mariadbd processes serving this data folder (one left from a crashed run, typically). */
export function runningInstances(dataDir: string): number[] {
  return processesWithArgument(`--datadir=${path.resolve(dataDir)}`)
    .filter((p) => path.basename(p.argv[0] ?? '').startsWith('mariadbd'))
    .map((p) => p.pid);
}

/**
 * Shuts down a mariadbd left running on this data folder by an earlier run that did not stop it
 * (killed terminal, crash), then removes a stale pid file and socket so the new server can start.
 */
export async function stopStrayInstances(dataDir: string, log = console.log): Promise<void> {
  const files = instanceFiles(dataDir);
  const binaries = findMariadbBinaries();
  for (const pid of runningInstances(dataDir)) {
    log(
      `A MariaDB from an earlier run is still using ${files.dataDir} (pid ${pid}); shutting it down.`,
    );
    if (binaries && fs.existsSync(files.socket)) {
      await runCapture(binaries.admin, adminArgs(files.socket, 'shutdown'), { timeoutMs: 60_000 });
    }
    if (!(await waitForExit(pid, 30_000))) {
      process.kill(pid, 'SIGTERM');
      if (!(await waitForExit(pid, 30_000))) {
        process.kill(pid, 'SIGKILL');
        await waitForExit(pid, 5_000);
      }
    }
  }
  for (const file of [files.pidFile, files.socket, `${files.socket}.lock`]) {
    fs.rmSync(file, { force: true });
  }
}

export interface PrivateMariadb {
  port: number;
  host: string;
  socket: string;
  pid: number;
  dataDir: string;
  errorLog: string;
  /** Clean shutdown (mariadb-admin shutdown over the socket), resolved once the process has exited. */
  stop(): Promise<void>;
  /** Last resort from a synchronous 'exit' handler: SIGTERM, which mariadbd also treats as a clean shutdown. */
  killNow(): void;
}

export interface StartOptions {
  dataDir: string;
  port: number;
  host?: string;
  startTimeoutMs?: number;
  log?: (message: string) => void;
}

/**
 * Starts a private MariaDB on loopback with its data in `dataDir` (created and initialised when
 * new). Root is reachable only over the unix socket; the app gets its own user (ensureDatabase).
 */
export async function startPrivateMariadb(options: StartOptions): Promise<PrivateMariadb> {
  const host = options.host ?? '127.0.0.1';
  const log = options.log ?? console.log;
  const binaries = findMariadbBinaries();
  if (!binaries)
    throw new ToolError('MariaDB is not installed: call ensureMariadbInstalled() first.');
  const asRoot = process.getuid?.() === 0;
  const files = instanceFiles(options.dataDir);

  await stopStrayInstances(files.dataDir, log);
  if (!(await isPortFree(options.port, host))) {
    const suggestion = await freePort(host);
    throw new ToolError(
      `Port ${options.port} on ${host} is already in use by another program, so the private MariaDB ` +
        `cannot listen there. Stop that program or choose another port, for example DB_PORT=${suggestion}.`,
    );
  }

  const fresh = !fs.existsSync(path.join(files.dataDir, 'mysql'));
  if (fresh) {
    fs.mkdirSync(files.dataDir, { recursive: true, mode: 0o700 });
    log(`Creating a new MariaDB data folder in ${files.dataDir}…`);
    const result = await runCapture(binaries.installDb, installDbArgs(files, asRoot), {
      timeoutMs: 120_000,
    });
    if (result.code !== 0) {
      throw new ToolError(
        `mariadb-install-db failed (exit ${result.code}). If ${files.dataDir} holds nothing you need, ` +
          `delete it and try again. Last lines:\n${tailLines(result.output, 15)}`,
      );
    }
  }
  // The socket accepts root without a password, so only this user may reach the folders holding it.
  fs.chmodSync(files.dataDir, 0o700);
  fs.mkdirSync(path.dirname(files.socket), { recursive: true, mode: 0o700 });
  fs.chmodSync(path.dirname(files.socket), 0o700);

  // Detached: a Ctrl-C in the terminal reaches our process group, not the database, so we can
  // shut it down cleanly ourselves after the server has closed.
  const child = spawn(binaries.mariadbd, mariadbdArgs(files, options.port, host, asRoot), {
    detached: true,
    stdio: 'ignore',
  });
  child.unref();
  const pid = child.pid;
  if (pid === undefined) throw new ToolError(`Could not start ${binaries.mariadbd}.`);
  let exited = false;
  let exitCode: number | null = null;
  const exitedPromise = new Promise<void>((resolve) => {
    child.once('exit', (code) => {
      exited = true;
      exitCode = code;
      resolve();
    });
    child.once('error', () => {
      exited = true;
      resolve();
    });
  });

  const failure = (why: string) =>
    new ToolError(
      `MariaDB ${why}. Last lines of ${files.errorLog}:\n${tailFile(files.errorLog, 20)}`,
    );

  const deadline = Date.now() + (options.startTimeoutMs ?? 60_000);
  for (;;) {
    if (exited) throw failure(`exited during start-up (exit ${exitCode})`);
    const ping = await runCapture(binaries.admin, adminArgs(files.socket, 'ping'), {
      timeoutMs: 10_000,
    });
    if (ping.code === 0) break;
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw failure(
        `did not answer on ${files.socket} within ${options.startTimeoutMs ?? 60_000} ms`,
      );
    }
    await sleep(150);
  }

  if (fresh) await dropRemoteRoot(files.socket);

  let stopping: Promise<void> | undefined;
  const stop = () => {
    stopping ??= (async () => {
      if (exited) return;
      await runCapture(binaries.admin, adminArgs(files.socket, 'shutdown'), { timeoutMs: 60_000 });
      if (!(await settlesWithin(exitedPromise, 60_000)) && isAlive(pid)) {
        child.kill('SIGTERM');
        await settlesWithin(exitedPromise, 30_000);
      }
      if (!exited && isAlive(pid)) throw failure('did not shut down within 90 s');
    })();
    return stopping;
  };
  const killNow = () => {
    if (!exited && isAlive(pid)) child.kill('SIGTERM');
  };

  return {
    port: options.port,
    host,
    socket: files.socket,
    pid,
    dataDir: files.dataDir,
    errorLog: files.errorLog,
    stop,
    killNow,
  };
}

/** mariadb-install-db also creates password-less root accounts reachable over TCP: remove them. */
async function dropRemoteRoot(socket: string): Promise<void> {
  const conn = await mariadb.createConnection({ socketPath: socket, user: 'root' });
  try {
    const rows: { Host: string }[] = await conn.query(
      "SELECT Host FROM mysql.global_priv WHERE User = 'root' AND Host <> 'localhost'",
    );
    for (const row of rows) await conn.query('DROP USER ?@?', ['root', row.Host]);
  } finally {
    await conn.end();
  }
}

const IDENTIFIER = /^[A-Za-z0-9_]{1,64}$/;
/** A database name in a GRANT, where `\_` is a literal underscore and `%` a wildcard. */
const GRANT_PATTERN = /^[A-Za-z0-9_\\%]{1,64}$/;

export interface EnsureDatabaseOptions {
  socket: string;
  database: string;
  user: string;
  password: string;
  /** Also grant on databases matching this pattern (tests create their own), e.g. `soundframe\_t%`. */
  grantPattern?: string;
}

/** The statements ensureDatabase runs as root, with `?` placeholders and their values. */
export function ensureDatabaseStatements(
  options: Omit<EnsureDatabaseOptions, 'socket'>,
): [string, string[]][] {
  const { database, user, password, grantPattern } = options;
  if (!IDENTIFIER.test(database)) throw new ToolError(`Unsafe database name: ${database}`);
  if (!IDENTIFIER.test(user)) throw new ToolError(`Unsafe database user name: ${user}`);
  if (grantPattern !== undefined && !GRANT_PATTERN.test(grantPattern)) {
    throw new ToolError(`Unsafe grant pattern: ${grantPattern}`);
  }
  const statements: [string, string[]][] = [
    [
      `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      [],
    ],
  ];
  // TCP from 127.0.0.1 matches the first account (names are not resolved); the socket matches the second.
  for (const host of ['127.0.0.1', 'localhost']) {
    statements.push(['CREATE USER IF NOT EXISTS ?@? IDENTIFIED BY ?', [user, host, password]]);
    // Keeps an existing account in step with a password that was generated again.
    statements.push(['ALTER USER ?@? IDENTIFIED BY ?', [user, host, password]]);
    statements.push([`GRANT ALL PRIVILEGES ON \`${database}\`.* TO ?@?`, [user, host]]);
    if (grantPattern)
      statements.push([`GRANT ALL PRIVILEGES ON \`${grantPattern}\`.* TO ?@?`, [user, host]]);
  }
  return statements;
}

/** As root over the unix socket: the database (utf8mb4) and an application user limited to it. */
export async function ensureDatabase(options: EnsureDatabaseOptions): Promise<void> {
  const statements = ensureDatabaseStatements(options);
  const conn = await mariadb.createConnection({ socketPath: options.socket, user: 'root' });
  try {
    for (const [sql, values] of statements) await conn.query(sql, values);
  } finally {
    await conn.end();
  }
}
