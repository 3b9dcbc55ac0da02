import { spawn } from 'node:child_process';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '..', '..');
const HOW = 'run the tests with npm test, which starts MariaDB';

/**
 * Migrates the test database once before the server tests. The migration runs in a tsx child
 * because jest loads this file outside its module system, where the `@/` alias is unknown.
 */
export default async function globalSetup(): Promise<void> {
  if (process.env.SF_SKIP_DB_SETUP === '1') {
    console.log(
      '\nSF_SKIP_DB_SETUP=1: database migrations skipped; tests that need MariaDB will fail.',
    );
    return;
  }
  const missing = ['DB_HOST', 'DB_PORT', 'DB_NAME', 'DB_USER', 'DB_PASSWORD'].filter(
    (name) => !process.env[name],
  );
  if (missing.length > 0) {
    throw new Error(`No test database (${missing.join(', ')} not set): ${HOW}.`);
  }
  const tsx = path.join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs');
  const result = await new Promise<{ code: number | null; output: string }>((resolve, reject) => {
    const child = spawn(
      process.execPath,
      [tsx, path.join(ROOT, 'server', 'tools', 'migrate-db.ts')],
      {
        cwd: ROOT,
        env: process.env,
        stdio: ['ignore', 'pipe', 'pipe'],
      },
    );
    let output = '';
    child.stdout.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.on('error', reject);
    child.on('close', (code) => resolve({ code, output }));
  });
  if (result.code === 2) throw new Error(`${result.output.trim()}\n(${HOW})`);
  if (result.code !== 0)
    throw new Error(`Migrating the test database failed:\n${result.output.trim()}`);
}
