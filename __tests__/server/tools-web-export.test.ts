import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { computeSourceHash, ensureWebExport, HASH_FILE } from '@/server/tools/web-export';

function write(root: string, file: string, content: string) {
  fs.mkdirSync(path.dirname(path.join(root, file)), { recursive: true });
  fs.writeFileSync(path.join(root, file), content);
}

describe('web export cache', () => {
  let root: string;
  const entries = ['app', 'src', 'app.json'];
  const noEnv = {};

  beforeEach(() => {
    root = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-export-'));
    write(root, 'app/index.tsx', 'export default 1;');
    write(root, 'src/theme/index.ts', 'export const a = 1;');
    write(root, 'app.json', '{}');
  });
  afterEach(() => fs.rmSync(root, { recursive: true, force: true }));

  it('changes when a source file changes, is added, or moves', () => {
    const before = computeSourceHash(root, entries, noEnv);
    expect(computeSourceHash(root, entries, noEnv)).toBe(before);

    write(root, 'src/theme/index.ts', 'export const a = 2;');
    const edited = computeSourceHash(root, entries, noEnv);
    expect(edited).not.toBe(before);

    write(root, 'app/new.tsx', 'x');
    const added = computeSourceHash(root, entries, noEnv);
    expect(added).not.toBe(edited);

    fs.renameSync(path.join(root, 'app/new.tsx'), path.join(root, 'app/renamed.tsx'));
    expect(computeSourceHash(root, entries, noEnv)).not.toBe(added);
  });

  it('ignores timestamps, dot files, node_modules and folders that are not sources', () => {
    const before = computeSourceHash(root, entries, noEnv);
    const later = new Date(Date.now() + 60_000);
    fs.utimesSync(path.join(root, 'app/index.tsx'), later, later);
    write(root, 'app/.DS_Store', 'junk');
    write(root, 'src/node_modules/x/index.js', 'junk');
    write(root, 'server/app.ts', 'server code is not in the bundle');
    expect(computeSourceHash(root, entries, noEnv)).toBe(before);
  });

  it('includes the EXPO_PUBLIC_ variables that Metro inlines, and no others', () => {
    const before = computeSourceHash(root, entries, { PATH: '/a' });
    expect(computeSourceHash(root, entries, { PATH: '/b' })).toBe(before);
    expect(computeSourceHash(root, entries, { EXPO_PUBLIC_API_BASE: 'x' })).not.toBe(before);
  });

  it('builds only when the stored hash is missing or stale, or when forced', async () => {
    const outDir = path.join(root, 'dist');
    const builds: string[] = [];
    const runExport = async (_root: string, out: string) => {
      builds.push(out);
      write(out, 'index.html', '<div id="root"></div>');
    };
    const quiet = { root, log: () => undefined, runExport };

    expect((await ensureWebExport(quiet)).built).toBe(true);
    expect(fs.readFileSync(path.join(outDir, HASH_FILE), 'utf8').trim()).toBe(
      computeSourceHash(root),
    );
    expect((await ensureWebExport(quiet)).built).toBe(false);

    write(root, 'app/index.tsx', 'export default 2;');
    expect((await ensureWebExport(quiet)).built).toBe(true);
    expect((await ensureWebExport({ ...quiet, force: true })).built).toBe(true);

    fs.rmSync(path.join(outDir, 'index.html'));
    expect((await ensureWebExport(quiet)).built).toBe(true);
    expect(builds).toEqual([outDir, outDir, outDir, outDir]);
  });

  it('leaves no hash behind when the export fails, so the next run tries again', async () => {
    const ok = async (_root: string, out: string) => write(out, 'index.html', 'ok');
    await ensureWebExport({ root, log: () => undefined, runExport: ok });
    write(root, 'app/index.tsx', 'broken');
    const failing = async () => {
      throw new Error('syntax error');
    };
    await expect(
      ensureWebExport({ root, log: () => undefined, runExport: failing }),
    ).rejects.toThrow('syntax error');
    expect(fs.existsSync(path.join(root, 'dist', HASH_FILE))).toBe(false);
  });
});
