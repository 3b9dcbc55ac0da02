import { spawn } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

/** The repository root (this file lives in server/tools/). */
export const REPO_ROOT = path.resolve(__dirname, '..', '..');

/** A failure whose message already tells a person what to do; the tools print it without a stack. */
export class ToolError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ToolError';
  }
}

export interface RunResult {
  code: number;
  /** stdout and stderr interleaved, as a person would have seen them. */
  output: string;
}

/** Runs a command to completion, capturing its output; never throws for a non-zero exit. */
export function runCapture(
  command: string,
  args: string[],
  options: {
    env?: NodeJS.ProcessEnv;
    cwd?: string;
    timeoutMs?: number;
    onLine?: (line: string) => void;
  } = {},
): Promise<RunResult> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, {
      env: options.env ?? process.env,
      cwd: options.cwd,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let output = '';
    let partial = '';
    const onData = (chunk: Buffer) => {
      const text = chunk.toString('utf8');
      output += text;
      if (!options.onLine) return;
      const lines = (partial + text).split(/\r?\n|\r/);
      partial = lines.pop() ?? '';
      for (const line of lines) if (line.trim()) options.onLine(line);
    };
    child.stdout.on('data', onData);
    child.stderr.on('data', onData);
    const timer =
      options.timeoutMs === undefined
        ? undefined
        : setTimeout(() => child.kill('SIGKILL'), options.timeoutMs);
    child.on('error', (error) => {
      if (timer) clearTimeout(timer);
      reject(error);
    });
    child.on('close', (code, signal) => {
      if (timer) clearTimeout(timer);
      resolve({ code: code ?? 128 + (signal ? os.constants.signals[signal] : 0), output });
    });
  });
}

/** The last `count` non-empty lines of a text, for error messages. */
export function tailLines(text: string, count: number): string {
  return text
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '')
    .slice(-count)
    .join('\n');
}

/** The last lines of a file, or a note that it does not exist. */
export function tailFile(file: string, count: number): string {
  try {
    return tailLines(fs.readFileSync(file, 'utf8'), count);
  } catch {
    return `(no ${file})`;
  }
}

/** A port on `host` that nothing listens on right now (the kernel picks it). */
export function freePort(host = '127.0.0.1'): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, host, () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** Whether a listener could bind `host:port` now (also false when another program holds 0.0.0.0:port). */
export function isPortFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.unref();
    server.once('error', () => resolve(false));
    server.listen(port, host, () => server.close(() => resolve(true)));
  });
}

/** Reads a TCP port from the environment; `0` is allowed only where the caller can use it. */
export function parsePort(
  value: string | undefined,
  fallback: number,
  name: string,
  allowZero = false,
): number {
  if (value === undefined || value.trim() === '') return fallback;
  const port = Number(value);
  const min = allowZero ? 0 : 1;
  if (!Number.isInteger(port) || port < min || port > 65535) {
    throw new ToolError(`${name} must be a port number between ${min} and 65535, not "${value}".`);
  }
  return port;
}

/** A random secret that is safe in URLs, SQL string literals and shell words. */
export function generateSecret(bytes = 24): string {
  return crypto.randomBytes(bytes).toString('base64url');
}

export interface ProcessInfo {
  pid: number;
  argv: string[];
}

/** Running processes whose command line contains `arg` as one whole argument (Linux /proc). */
export function processesWithArgument(arg: string): ProcessInfo[] {
  const found: ProcessInfo[] = [];
  let entries: string[];
  try {
    entries = fs.readdirSync('/proc');
  } catch {
    return found;
  }
  for (const entry of entries) {
    if (!/^\d+$/.test(entry)) continue;
    const pid = Number(entry);
    if (pid === process.pid) continue;
    try {
      const argv = fs.readFileSync(`/proc/${entry}/cmdline`, 'utf8').split('\0').filter(Boolean);
      if (argv.includes(arg) && !isZombie(pid)) found.push({ pid, argv });
    } catch {
      // The process ended while we looked.
    }
  }
  return found;
}

function isZombie(pid: number): boolean {
  try {
    const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2).startsWith('Z');
  } catch {
    return true;
  }
}

/** Whether a process with this id is alive (a zombie counts as gone). */
export function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  return !isZombie(pid);
}

export function sleep(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}

/** Resolves true when `promise` settles within `ms`, false otherwise; leaves no timer behind. */
export function settlesWithin(promise: Promise<unknown>, ms: number): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<boolean>((resolve) => {
    timer = setTimeout(() => resolve(false), ms);
  });
  return Promise.race([promise.then(() => true), timeout]).finally(() => clearTimeout(timer));
}

/** Waits until `pid` has exited, up to `timeoutMs`; true when it has. */
export async function waitForExit(pid: number, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (!isAlive(pid)) return true;
    await sleep(100);
  }
  return !isAlive(pid);
}

/** Prints a ToolError plainly and anything else with its stack, then exits 1. */
export function failAndExit(error: unknown): never {
  if (error instanceof ToolError) console.error(`\n${error.message}`);
  else console.error(error);
  process.exit(1);
}
