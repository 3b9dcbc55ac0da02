import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import {
  ensureDatabase,
  ensureDatabaseStatements,
  findMariadbBinaries,
  instanceFiles,
  mariadbdArgs,
  runningInstances,
  startPrivateMariadb,
  type PrivateMariadb,
} from '@/server/tools/mariadb';
import { freePort, processesWithArgument } from '@/server/tools/shell';

describe('private MariaDB: arguments and SQL', () => {
  it('keeps the socket inside the data folder unless the path is too long for a unix socket', () => {
    expect(instanceFiles('/tmp/x/mariadb').socket).toBe('/tmp/x/mariadb/mariadbd.sock');
    const deep = `/tmp/${'d'.repeat(120)}/mariadb`;
    const files = instanceFiles(deep);
    expect(Buffer.byteLength(files.socket)).toBeLessThan(100);
    expect(files.socket).toBe(instanceFiles(deep).socket);
    expect(files.pidFile).toBe(`${deep}/mariadbd.pid`);
  });

  it('starts mariadbd without the system config, on loopback, as root only when we are root', () => {
    const files = instanceFiles('/tmp/x/mariadb');
    const asRoot = mariadbdArgs(files, 3307, '127.0.0.1', true);
    expect(asRoot[0]).toBe('--no-defaults');
    expect(asRoot).toEqual(
      expect.arrayContaining([
        '--port=3307',
        '--bind-address=127.0.0.1',
        '--user=root',
        '--skip-name-resolve',
        '--innodb-log-file-size=16M',
      ]),
    );
    expect(mariadbdArgs(files, 3307, '127.0.0.1', false)).not.toContain('--user=root');
  });

  it('creates the app user on both loopback hosts and grants the test pattern only when asked', () => {
    const plain = ensureDatabaseStatements({
      database: 'soundframe',
      user: 'soundframe',
      password: 'p',
    });
    const sql = plain.map(([s]) => s);
    expect(sql[0]).toMatch(/^CREATE DATABASE IF NOT EXISTS `soundframe` CHARACTER SET utf8mb4/);
    expect(plain.filter(([s]) => s.startsWith('CREATE USER')).map(([, v]) => v[1])).toEqual([
      '127.0.0.1',
      'localhost',
    ]);
    expect(sql.some((s) => s.includes('soundframe\\_t%'))).toBe(false);

    const withPattern = ensureDatabaseStatements({
      database: 'soundframe_test',
      user: 'u',
      password: 'p',
      grantPattern: 'soundframe\\_t%',
    });
    expect(withPattern.filter(([s]) => s.includes('`soundframe\\_t%`.*'))).toHaveLength(2);
    // The password only ever travels as a placeholder value.
    expect(withPattern.every(([s]) => !s.includes("'p'"))).toBe(true);
  });

  it('refuses names that would need quoting', () => {
    expect(() =>
      ensureDatabaseStatements({ database: 'x`; DROP', user: 'u', password: 'p' }),
    ).toThrow(/Unsafe database name/);
    expect(() => ensureDatabaseStatements({ database: 'x', user: "u'@'%", password: 'p' })).toThrow(
      /Unsafe database user/,
    );
    expect(() =>
      ensureDatabaseStatements({ database: 'x', user: 'u', password: 'p', grantPattern: '*' }),
    ).toThrow(/Unsafe grant/);
  });
});

// Real mariadbd processes: `npm test` installs mariadb-server before jest starts.
const describeReal = findMariadbBinaries() ? describe : describe.skip;

describeReal('private MariaDB: a real instance', () => {
  let base: string;
  const started: PrivateMariadb[] = [];

  beforeAll(() => {
    base = fs.mkdtempSync(path.join(os.tmpdir(), 'sf-mariadb-test-'));
  });
  afterAll(async () => {
    for (const db of started) await db.stop().catch(() => db.killNow());
    fs.rmSync(base, { recursive: true, force: true });
  });

  it('initialises, serves an app user over TCP only, recovers from a stray instance and shuts down cleanly', async () => {
    const dataDir = path.join(base, 'mariadb');
    const first = await startPrivateMariadb({
      dataDir,
      port: await freePort(),
      log: () => undefined,
    });
    started.push(first);
    expect(runningInstances(dataDir)).toEqual([first.pid]);
    expect(fs.statSync(dataDir).mode & 0o777).toBe(0o700);

    await ensureDatabase({
      socket: first.socket,
      database: 'sf_tool_check',
      user: 'sf_tool',
      password: 'pw-1',
      grantPattern: 'sf\\_tool\\_%',
    });
    // Running it again with a new password keeps the account usable (the secret was regenerated).
    await ensureDatabase({
      socket: first.socket,
      database: 'sf_tool_check',
      user: 'sf_tool',
      password: 'pw-2',
    });
    const app = await mariadb.createConnection({
      host: '127.0.0.1',
      port: first.port,
      user: 'sf_tool',
      password: 'pw-2',
      database: 'sf_tool_check',
    });
    const [charset] = await app.query('SELECT @@character_set_database AS cs');
    expect(charset.cs).toBe('utf8mb4');
    await app.query('CREATE DATABASE sf_tool_extra');
    await expect(app.query('CREATE DATABASE other_db')).rejects.toThrow(/denied/);
    await app.end();
    // mariadb-install-db's password-less root@127.0.0.1 is gone: root only over the socket.
    await expect(
      mariadb.createConnection({ host: '127.0.0.1', port: first.port, user: 'root' }),
    ).rejects.toThrow(/denied/);

    // A second start on the same folder (the first run "crashed" without stopping) takes over.
    const second = await startPrivateMariadb({
      dataDir,
      port: await freePort(),
      log: () => undefined,
    });
    started.push(second);
    expect(runningInstances(dataDir)).toEqual([second.pid]);
    const again = await mariadb.createConnection({
      host: '127.0.0.1',
      port: second.port,
      user: 'sf_tool',
      password: 'pw-2',
      database: 'sf_tool_check',
    });
    await again.end();

    await second.stop();
    expect(runningInstances(dataDir)).toEqual([]);
    expect(processesWithArgument(`--datadir=${dataDir}`)).toEqual([]);
    expect(fs.existsSync(first.socket)).toBe(false);
  }, 90_000);

  it('refuses a port that another program holds, naming the variable to change', async () => {
    const holder = net.createServer();
    await new Promise<void>((resolve) => holder.listen(0, '127.0.0.1', resolve));
    const port = (holder.address() as net.AddressInfo).port;
    try {
      await expect(
        startPrivateMariadb({ dataDir: path.join(base, 'busy'), port, log: () => undefined }),
      ).rejects.toThrow(
        new RegExp(`Port ${port} on 127.0.0.1 is already in use.*DB_PORT=\\d+`, 's'),
      );
      expect(runningInstances(path.join(base, 'busy'))).toEqual([]);
    } finally {
      holder.close();
    }
  });
});
