import { spawn } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { REPO_ROOT, ToolError } from './shell';

/** Everything the web bundle is built from (package-lock.json stands for node_modules). */
export const WEB_SOURCES = [
  'app',
  'src',
  'shared',
  'assets',
  'app.json',
  'babel.config.js',
  'metro.config.js',
  'tsconfig.json',
  'package-lock.json',
];

export const HASH_FILE = '.source-hash';

function listFiles(root: string, entry: string, out: string[]): void {
  const full = path.join(root, entry);
  let stat: fs.Stats;
  try {
    stat = fs.statSync(full);
  } catch {
    return;
  }
  if (stat.isFile()) {
    out.push(entry);
    return;
  }
  if (!stat.isDirectory()) return;
  for (const name of fs.readdirSync(full)) {
    // Editor and OS litter (.DS_Store, swap files) does not change the bundle.
    if (name.startsWith('.') || name === 'node_modules') continue;
    listFiles(root, path.posix.join(entry, name), out);
  }
}

/**
 * A content hash of the web sources: relative path, size and bytes of every file, plus the
 * EXPO_PUBLIC_* variables that Metro inlines into the bundle. Content rather than mtimes, so a
 * fresh clone or a `touch` does not force a 30-second rebuild when nothing changed.
 */
export function computeSourceHash(
  root: string = REPO_ROOT,
  entries: string[] = WEB_SOURCES,
  env: Record<string, string | undefined> = process.env,
): string {
  const files: string[] = [];
  for (const entry of entries) listFiles(root, entry, files);
  files.sort();
  const hash = crypto.createHash('sha256');
  for (const file of files) {
    const bytes = fs.readFileSync(path.join(root, file));
    hash.update(`${file}\0${bytes.length}\0`);
    hash.update(bytes);
    hash.update('\n');
  }
  for (const key of Object.keys(env)
    .filter((k) => k.startsWith('EXPO_PUBLIC_'))
    .sort()) {
    hash.update(`env:${key}=${env[key]}\n`);
  }
  return hash.digest('hex');
}

/** Whether `outDir` holds a complete export built from sources with this hash. */
export function isExportCurrent(outDir: string, hash: string): boolean {
  try {
    return (
      fs.existsSync(path.join(outDir, 'index.html')) &&
      fs.readFileSync(path.join(outDir, HASH_FILE), 'utf8').trim() === hash
    );
  } catch {
    return false;
  }
}

/** Runs `expo export` for web, streaming its output; rejects on a non-zero exit. */
export function runExpoExport(root: string, outDir: string): Promise<void> {
  const cli = require.resolve('expo/bin/cli', { paths: [root] });
  const env: Record<string, string | undefined> = { ...process.env, CI: '1' };
  // Expo picks production for an export; an inherited NODE_ENV=test from the test runner would not.
  delete env.NODE_ENV;
  return new Promise((resolve, reject) => {
    const child = spawn(
      process.execPath,
      [cli, 'export', '--platform', 'web', '--output-dir', path.relative(root, outDir) || '.'],
      { cwd: root, env: env as NodeJS.ProcessEnv, stdio: ['ignore', 'inherit', 'inherit'] },
    );
    child.on('error', reject);
    child.on('exit', (code, signal) => {
      if (code === 0) resolve();
      else
        reject(
          new ToolError(`expo export failed (${signal ?? `exit ${code}`}); see the output above.`),
        );
    });
  });
}

export interface EnsureWebExportOptions {
  force?: boolean;
  root?: string;
  /** Defaults to `dist` in the root, which the server serves (WEB_DIST). */
  outDir?: string;
  log?: (message: string) => void;
  runExport?: (root: string, outDir: string) => Promise<void>;
}

/** Builds the web export only when the sources changed since the last one (or when forced). */
export async function ensureWebExport(
  options: EnsureWebExportOptions = {},
): Promise<{ built: boolean; hash: string }> {
  const root = options.root ?? REPO_ROOT;
  const outDir = path.resolve(root, options.outDir ?? 'dist');
  const log = options.log ?? console.log;
  const hash = computeSourceHash(root);
  if (!options.force && isExportCurrent(outDir, hash)) {
    log('Web export up to date.');
    return { built: false, hash };
  }
  log('Building the web export (about 30 s from cold)…');
  const started = Date.now();
  // A half-finished export must not look current next time.
  fs.rmSync(path.join(outDir, HASH_FILE), { force: true });
  await (options.runExport ?? runExpoExport)(root, outDir);
  if (!fs.existsSync(path.join(outDir, 'index.html'))) {
    throw new ToolError(`expo export finished but ${path.join(outDir, 'index.html')} is missing.`);
  }
  fs.writeFileSync(path.join(outDir, HASH_FILE), `${hash}\n`);
  log(`Web export built in ${Math.round((Date.now() - started) / 1000)} s.`);
  return { built: true, hash };
}
