import fs from 'node:fs';
import path from 'node:path';
import { runCapture, tailLines, ToolError } from './shell';

/** The binary whose presence shows that a Debian package is installed. */
export const PACKAGE_PROBES: Record<string, string> = {
  'mariadb-server': 'mariadbd',
  chromium: 'chromium',
  'poppler-utils': 'pdftotext',
};

/** Folders searched besides PATH: a non-root PATH often lacks the sbin folders where mariadbd lives. */
const EXTRA_BIN_DIRS = ['/usr/sbin', '/usr/bin', '/sbin', '/bin', '/usr/local/bin'];

/** The full path of an executable found on PATH or in the usual system folders, or null. */
export function findBinary(name: string, envPath = process.env.PATH ?? ''): string | null {
  const dirs = [...envPath.split(path.delimiter).filter(Boolean), ...EXTRA_BIN_DIRS];
  for (const dir of dirs) {
    const candidate = path.join(dir, name);
    try {
      fs.accessSync(candidate, fs.constants.X_OK);
      if (fs.statSync(candidate).isFile()) return candidate;
    } catch {
      // Not in this folder.
    }
  }
  return null;
}

/** The command a person without root should run, word for word. */
export function aptInstallCommand(packages: string[]): string {
  return `sudo apt-get update && sudo DEBIAN_FRONTEND=noninteractive apt-get install -y ${packages.join(' ')}`;
}

export interface AptDeps {
  isRoot(): boolean;
  hasBinary(name: string): boolean;
  /** Runs a command; resolves with its exit code and output. */
  run(
    command: string,
    args: string[],
    env: NodeJS.ProcessEnv,
    onLine: (line: string) => void,
  ): Promise<{ code: number; output: string }>;
  log(message: string): void;
  /** Shows one short, overwritten progress line (or nothing). */
  progress(line: string): void;
}

export type AptInstaller = (packages: string[]) => Promise<{ installed: string[] }>;

/**
 * Installs the Debian packages whose probe binary is missing. As root: `apt-get update` once per
 * process, then one non-interactive `apt-get install -y`. Otherwise: a ToolError that names the
 * exact command, because installing system packages is the person's decision.
 */
export function createAptInstaller(deps: AptDeps): AptInstaller {
  let updated = false;
  const step = async (args: string[], env: NodeJS.ProcessEnv) => {
    const result = await deps.run('apt-get', args, env, (line) => deps.progress(line));
    deps.progress('');
    if (result.code !== 0) {
      throw new ToolError(
        `apt-get ${args.join(' ')} failed (exit ${result.code}). Last lines:\n${tailLines(result.output, 15)}`,
      );
    }
  };
  return async (packages) => {
    const missing = packages.filter((pkg) => !deps.hasBinary(PACKAGE_PROBES[pkg] ?? pkg));
    if (missing.length === 0) return { installed: [] };
    if (!deps.isRoot()) {
      throw new ToolError(
        `Soundframe needs Debian packages that are not installed: ${missing.join(', ')}.\n` +
          `Install them, then run this again:\n\n  ${aptInstallCommand(missing)}\n`,
      );
    }
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    const started = Date.now();
    deps.log(`Installing ${missing.join(', ')} with apt-get (about a minute on a fresh machine)…`);
    if (!updated) {
      await step(['update'], env);
      updated = true;
    }
    await step(['install', '-y', ...missing], env);
    const stillMissing = missing.filter((pkg) => !deps.hasBinary(PACKAGE_PROBES[pkg] ?? pkg));
    if (stillMissing.length > 0) {
      throw new ToolError(
        `apt-get reported success, but these are still missing: ${stillMissing
          .map((pkg) => `${pkg} (no ${PACKAGE_PROBES[pkg] ?? pkg})`)
          .join(', ')}.`,
      );
    }
    deps.log(`Installed ${missing.join(', ')} in ${Math.round((Date.now() - started) / 1000)} s.`);
    return { installed: missing };
  };
}

function makeProgress(): (line: string) => void {
  if (process.stdout.isTTY) {
    return (line) => {
      const width = Math.max(20, (process.stdout.columns ?? 80) - 1);
      process.stdout.write(`\r\x1b[K${line ? `  ${line}`.slice(0, width) : ''}`);
    };
  }
  // In a log (CI), one line every 15 s is enough to show that something is happening.
  let last = 0;
  return (line) => {
    if (!line || Date.now() - last < 15_000) return;
    last = Date.now();
    console.log(`  apt-get: ${line.slice(0, 100)}`);
  };
}

export const defaultAptDeps: AptDeps = {
  isRoot: () => process.getuid?.() === 0,
  hasBinary: (name) => findBinary(name) !== null,
  run: (command, args, env, onLine) => runCapture(command, args, { env, onLine }),
  log: (message) => console.log(message),
  progress: makeProgress(),
};

/** Installs missing Debian packages (see createAptInstaller) with the real apt-get. */
export const ensureAptPackages: AptInstaller = createAptInstaller(defaultAptDeps);
