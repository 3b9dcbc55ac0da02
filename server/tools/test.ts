/**
 * `npm test [jest args]`: installs what the tests need, starts a throw-away MariaDB (never the
 * demo's), builds the web export when stale, runs every jest project, and always shuts the
 * database down, so a run leaves no process behind.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ensureAptPackages } from './apt';
import {
  ensureDatabase,
  findMariadbBinaries,
  startPrivateMariadb,
  stopStrayInstances,
  type PrivateMariadb,
} from './mariadb';
import { summaryLine, type JestSummary } from './jest-summary';
import { failAndExit, freePort, generateSecret, REPO_ROOT, ToolError } from './shell';
import { ensureWebExport } from './web-export';

const TEST_DATABASE = 'soundframe_test';
/** Test files create their own databases named soundframe_t_<name>_<random> (see __tests__/e2e/support). */
const TEST_DATABASE_PATTERN = 'soundframe\\_t%';

let interrupted: NodeJS.Signals | null = null;
let jest: ChildProcess | null = null;

function checkInterrupted(): void {
  if (interrupted) throw new ToolError(`Interrupted (${interrupted}).`);
}

function runJest(args: string[], env: NodeJS.ProcessEnv): Promise<number> {
  return new Promise((resolve, reject) => {
    const child = spawn(
      process.execPath,
      [
        path.join(REPO_ROOT, 'node_modules', 'jest', 'bin', 'jest.js'),
        '--ci',
        '--maxWorkers=2',
        ...args,
      ],
      { cwd: REPO_ROOT, env, stdio: 'inherit' },
    );
    jest = child;
    child.on('error', reject);
    child.on('exit', (code, signal) => {
      jest = null;
      resolve(code ?? (signal ? 1 : 0));
    });
  });
}

/** Type check and lint, on a full run only (a targeted `npm test -- <file>` skips them). */
function runStaticChecks(): Promise<number> {
  const steps: [string, string[]][] = [
    [
      'Type check (tsc --noEmit)',
      [path.join(REPO_ROOT, 'node_modules', 'typescript', 'bin', 'tsc'), '--noEmit'],
    ],
    ['Lint (eslint .)', [path.join(REPO_ROOT, 'node_modules', 'eslint', 'bin', 'eslint.js'), '.']],
    [
      'Format (prettier --check .)',
      [
        path.join(REPO_ROOT, 'node_modules', 'prettier', 'bin', 'prettier.cjs'),
        '--check',
        '--log-level=warn',
        '.',
      ],
    ],
  ];
  return steps.reduce<Promise<number>>(async (previous, [title, argv]) => {
    const failed = await previous;
    console.log(`${title}…`);
    const code = await new Promise<number>((resolve, reject) => {
      const child = spawn(process.execPath, argv, { cwd: REPO_ROOT, stdio: 'inherit' });
      child.on('error', reject);
      child.on('exit', (c) => resolve(c ?? 1));
    });
    if (code !== 0) console.log(`${title} failed.`);
    return failed || code;
  }, Promise.resolve(0));
}

/** Folders of earlier runs whose test runner is gone (crashed or killed): stop their MariaDB, delete them. */
async function removeAbandonedRuns(runsDir: string): Promise<void> {
  if (fs.existsSync(path.join(runsDir, 'mysql'))) {
    // The folder itself is a data folder from before runs had folders of their own.
    await stopStrayInstances(runsDir);
    fs.rmSync(runsDir, { recursive: true, force: true });
  }
  if (!fs.existsSync(runsDir)) return;
  for (const name of fs.readdirSync(runsDir)) {
    const pid = Number(/^run-(\d+)$/.exec(name)?.[1]);
    if (!pid || isAlive(pid)) continue;
    const dir = path.join(runsDir, name);
    await stopStrayInstances(dir);
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

async function main(): Promise<number> {
  const args = process.argv.slice(2);
  const staticCode = args.length === 0 ? await runStaticChecks() : 0;
  checkInterrupted();
  await ensureAptPackages(['mariadb-server', 'chromium', 'poppler-utils']);
  if (!findMariadbBinaries())
    throw new ToolError('mariadb-server is installed but its programs are missing.');
  checkInterrupted();

  // One folder per run, so two `npm test` runs on one machine never share (or stop) a database.
  const runsDir = path.join(REPO_ROOT, '.data', 'test-mariadb');
  const dataDir = path.join(runsDir, `run-${process.pid}`);
  const artifactsDir = path.join(REPO_ROOT, '.artifacts');
  await removeAbandonedRuns(runsDir);
  fs.rmSync(dataDir, { recursive: true, force: true });
  fs.mkdirSync(artifactsDir, { recursive: true });

  let db: PrivateMariadb | null = null;
  try {
    db = await startPrivateMariadb({ dataDir, port: await freePort() });
    const running = db;
    process.once('exit', () => running.killNow());
    console.log(`Test MariaDB on 127.0.0.1:${db.port} (data in ${db.dataDir}).`);
    const password = generateSecret(18);
    await ensureDatabase({
      socket: db.socket,
      database: TEST_DATABASE,
      user: TEST_DATABASE,
      password,
      grantPattern: TEST_DATABASE_PATTERN,
    });
    checkInterrupted();
    // Only browser tests need the export; a targeted server or client run skips it, so several
    // targeted runs at once never rebuild dist/ under each other.
    if (args.length === 0 || args.some((a) => a.includes('e2e'))) {
      await ensureWebExport({ root: REPO_ROOT });
      checkInterrupted();
    }

    const resultsFile = path.join(
      artifactsDir,
      args.length === 0 ? 'jest-results.json' : `jest-results-${process.pid}.json`,
    );
    fs.rmSync(resultsFile, { force: true });
    const wantsOwnJson = args.some((a) => a === '--json' || a.startsWith('--outputFile'));
    const code = await runJest(
      wantsOwnJson ? args : [...args, '--json', `--outputFile=${resultsFile}`],
      {
        ...process.env,
        NODE_ENV: 'test',
        DB_HOST: '127.0.0.1',
        DB_PORT: String(db.port),
        DB_NAME: TEST_DATABASE,
        DB_USER: TEST_DATABASE,
        DB_PASSWORD: password,
        DB_ROOT_SOCKET: db.socket,
        ARTIFACTS_DIR: artifactsDir,
      },
    );
    if (!wantsOwnJson && fs.existsSync(resultsFile)) {
      console.log(summaryLine(JSON.parse(fs.readFileSync(resultsFile, 'utf8')) as JestSummary));
      if (args.length > 0) fs.rmSync(resultsFile, { force: true });
    }
    return interrupted ? 130 : code || staticCode;
  } finally {
    if (db) {
      await db.stop();
      console.log('Test MariaDB shut down.');
    }
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    if (interrupted) return;
    interrupted = signal;
    console.log(`\n${signal}: stopping the tests, then the test database…`);
    // From a terminal jest got the signal too; from a supervisor only we did.
    jest?.kill(signal);
  });
}

main().then((code) => process.exit(code), failAndExit);
