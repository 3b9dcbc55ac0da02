import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { sessionResponse } from '@/shared/schemas/auth';
import { parseAccounts, parseReadyUrl } from './support/start-output';

const ROOT = path.resolve(__dirname, '..', '..');
const TSX = path.join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

/** mariadbd processes whose --datadir is inside `dir`, read straight from /proc. */
function mariadbdUnder(dir: string): number[] {
  return fs
    .readdirSync('/proc')
    .filter((entry) => /^\d+$/.test(entry))
    .filter((entry) => {
      try {
        const argv = fs.readFileSync(`/proc/${entry}/cmdline`, 'utf8').split('\0');
        const stat = fs.readFileSync(`/proc/${entry}/stat`, 'utf8');
        const zombie = stat.slice(stat.lastIndexOf(')') + 2).startsWith('Z');
        return !zombie && argv.some((a) => a.startsWith(`--datadir=${dir}`));
      } catch {
        return false;
      }
    })
    .map(Number);
}

describe('npm start, as a person runs it', () => {
  let dataDir: string;
  let child: ChildProcess | null = null;
  let output = '';
  let exit: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;

  beforeAll(() => {
    dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-smoke-'));
  });

  afterAll(async () => {
    // Only after a failed assertion is anything left: do not leave it running.
    if (child && child.exitCode === null && child.signalCode === null) {
      child.kill('SIGKILL');
    }
    for (const pid of mariadbdUnder(dataDir)) process.kill(pid, 'SIGKILL');
    fs.rmSync(dataDir, { recursive: true, force: true });
  });

  it('starts on free ports, serves the app, signs in a printed demo account and stops cleanly on Ctrl-C', async () => {
    const env: NodeJS.ProcessEnv = { ...process.env };
    // The test runner's database settings must not leak in: npm start manages its own.
    for (const key of Object.keys(env)) {
      if (
        /^(DB_|SMTP_|MAIL_|STORAGE_|JWT_|S3_)/.test(key) ||
        ['NODE_ENV', 'HOST', 'WEB_DIST', 'PUBLIC_URL'].includes(key)
      ) {
        delete env[key];
      }
    }
    Object.assign(env, {
      SF_DATA_DIR: dataDir,
      PORT: '0',
      DB_PORT: String(await freePort()),
      SMTP_PORT: String(await freePort()),
    });

    const started = spawn(process.execPath, [TSX, path.join(ROOT, 'server', 'tools', 'start.ts')], {
      cwd: ROOT,
      env,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child = started;
    exit = new Promise((resolve) =>
      started.on('exit', (code, signal) => resolve({ code, signal })),
    );
    started.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
    started.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));

    const ready = await new Promise<{ url: string; port: number }>((resolve, reject) => {
      const timer = setTimeout(
        () => reject(new Error(`no ready line within 150 s:\n${output}`)),
        150_000,
      );
      const check = () => {
        const parsed = parseReadyUrl(output);
        if (parsed) {
          clearTimeout(timer);
          resolve(parsed);
        }
      };
      started.stdout!.on('data', check);
      exit.then(({ code, signal }) => {
        clearTimeout(timer);
        reject(new Error(`npm start exited early (${signal ?? code}):\n${output}`));
      });
    });
    expect(ready.port).toBeGreaterThan(0);
    expect(mariadbdUnder(dataDir)).toHaveLength(1);

    const accounts = parseAccounts(output);
    expect(accounts.map((a) => a.role)).toEqual(
      expect.arrayContaining(['owner', 'inspector', 'applicator', 'client']),
    );
    const inspector = accounts.find((a) => a.role === 'inspector')!;

    const signIn = await fetch(`${ready.url}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Accept: 'application/json' },
      body: JSON.stringify({ email: inspector.email, password: inspector.password }),
    });
    expect(signIn.status).toBe(200);
    const session = sessionResponse.parse(await signIn.json());
    expect(session.user.email).toBe(inspector.email);
    expect(session.memberships.map((m) => m.role)).toContain('inspector');
    expect(signIn.headers.get('set-cookie')).toMatch(/sf_session=/);

    const wrong = await fetch(`${ready.url}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: inspector.email, password: `${inspector.password}-not` }),
    });
    expect(wrong.status).toBe(401);

    const page = await fetch(`${ready.url}/`, { headers: { Accept: 'text/html' } });
    expect(page.status).toBe(200);
    expect(page.headers.get('content-type')).toMatch(/text\/html/);
    const html = await page.text();
    expect(html).toMatch(/<div id="root">/);
    const bundle = /<script src="([^"]+\.js)"/.exec(html);
    expect(bundle).not.toBeNull();
    const script = await fetch(`${ready.url}${bundle![1]}`);
    expect(script.status).toBe(200);

    started.kill('SIGINT');
    let stopTimer: NodeJS.Timeout | undefined;
    const { code, signal } = await Promise.race([
      exit,
      new Promise<never>((_, reject) => {
        stopTimer = setTimeout(() => reject(new Error(`no exit after SIGINT:\n${output}`)), 90_000);
      }),
    ]).finally(() => clearTimeout(stopTimer));
    expect({ code, signal }).toEqual({ code: 0, signal: null });
    expect(output).toMatch(/MariaDB shut down cleanly/);
    expect(mariadbdUnder(dataDir)).toEqual([]);
    // A clean shutdown removes the pid file; a crash would leave it.
    expect(fs.existsSync(path.join(dataDir, 'mariadb', 'mariadbd.pid'))).toBe(false);
  }, 240_000);
});
