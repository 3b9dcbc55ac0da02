import { aptInstallCommand, createAptInstaller, type AptDeps } from '@/server/tools/apt';
import { ToolError } from '@/server/tools/shell';

/** A fake machine: which binaries exist, whether we are root, and what apt-get would do. */
function fakeMachine(options: {
  root: boolean;
  binaries: string[];
  installs?: Record<string, string>;
  failOn?: string;
}) {
  const present = new Set(options.binaries);
  const calls: { args: string[]; env: NodeJS.ProcessEnv }[] = [];
  const deps: AptDeps = {
    isRoot: () => options.root,
    hasBinary: (name) => present.has(name),
    async run(command, args, env) {
      expect(command).toBe('apt-get');
      calls.push({ args, env });
      if (options.failOn && args[0] === options.failOn)
        return { code: 100, output: 'E: Unable to locate package\n' };
      if (args[0] === 'install') {
        for (const pkg of args.slice(2)) {
          const binary = options.installs?.[pkg];
          if (binary) present.add(binary);
        }
      }
      return { code: 0, output: '' };
    },
    log: () => undefined,
    progress: () => undefined,
  };
  return { deps, calls, present };
}

describe('ensureAptPackages', () => {
  it('does nothing when every probe binary is present', async () => {
    const machine = fakeMachine({ root: true, binaries: ['mariadbd', 'chromium', 'pdftotext'] });
    const result = await createAptInstaller(machine.deps)([
      'mariadb-server',
      'chromium',
      'poppler-utils',
    ]);
    expect(result.installed).toEqual([]);
    expect(machine.calls).toEqual([]);
  });

  it('as root, updates once and installs only the missing packages non-interactively', async () => {
    const machine = fakeMachine({
      root: true,
      binaries: ['mariadbd'],
      installs: { chromium: 'chromium', 'poppler-utils': 'pdftotext' },
    });
    const ensure = createAptInstaller(machine.deps);
    const result = await ensure(['mariadb-server', 'chromium', 'poppler-utils']);
    expect(result.installed).toEqual(['chromium', 'poppler-utils']);
    expect(machine.calls.map((c) => c.args)).toEqual([
      ['update'],
      ['install', '-y', 'chromium', 'poppler-utils'],
    ]);
    expect(machine.calls.every((c) => c.env.DEBIAN_FRONTEND === 'noninteractive')).toBe(true);
  });

  it('fails when apt-get succeeds but the binary is still missing', async () => {
    const machine = fakeMachine({ root: true, binaries: [], installs: {} });
    await expect(createAptInstaller(machine.deps)(['mariadb-server'])).rejects.toThrow(
      /still missing: mariadb-server \(no mariadbd\)/,
    );
  });

  it('runs apt-get update only once per installer', async () => {
    const machine = fakeMachine({
      root: true,
      binaries: [],
      installs: { 'mariadb-server': 'mariadbd', chromium: 'chromium' },
    });
    const ensure = createAptInstaller(machine.deps);
    await ensure(['mariadb-server']);
    await ensure(['chromium']);
    expect(machine.calls.map((c) => c.args[0])).toEqual(['update', 'install', 'install']);
  });

  it('without root, names the exact command and installs nothing', async () => {
    const machine = fakeMachine({ root: false, binaries: ['chromium'] });
    const attempt = createAptInstaller(machine.deps)([
      'mariadb-server',
      'chromium',
      'poppler-utils',
    ]);
    await expect(attempt).rejects.toBeInstanceOf(ToolError);
    await expect(attempt).rejects.toThrow(aptInstallCommand(['mariadb-server', 'poppler-utils']));
    expect(machine.calls).toEqual([]);
    expect(aptInstallCommand(['mariadb-server'])).toBe(
      'sudo apt-get update && sudo DEBIAN_FRONTEND=noninteractive apt-get install -y mariadb-server',
    );
  });

  it('reports a failing apt-get with its last lines', async () => {
    const machine = fakeMachine({ root: true, binaries: [], failOn: 'install' });
    await expect(createAptInstaller(machine.deps)(['mariadb-server'])).rejects.toThrow(
      /apt-get install -y mariadb-server failed \(exit 100\)[\s\S]*Unable to locate package/,
    );
  });
});
