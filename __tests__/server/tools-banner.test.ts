import { formatBanner } from '@/server/tools/banner';
import { summaryLine } from '@/server/tools/jest-summary';
import { parseAccounts, parseReadyUrl } from '../e2e/support/start-output';

const accounts = [
  {
    role: 'owner',
    email: 'olive.marsh@example.test',
    password: 'Owner-demo-1',
    name: 'Olive Marsh',
  },
  {
    role: 'inspector',
    email: 'ira.vance@example.test',
    password: 'pass with spaces',
    name: 'Ira Vance',
  },
  { role: 'client', email: 'c@example.test', password: 'x/y', name: 'C' },
];

describe('npm start banner', () => {
  const banner = formatBanner({
    url: 'http://127.0.0.1:41234',
    accounts,
    mailDir: '/tmp/d/mail',
    dataDir: '/tmp/d',
    dbPort: 3307,
    smtpPort: 2525,
    outbox: true,
  });

  it('prints the exact ready line the smoke test reads', () => {
    expect(banner.split('\n')).toContain('Soundframe is ready at http://127.0.0.1:41234');
    expect(parseReadyUrl(banner)).toEqual({ url: 'http://127.0.0.1:41234', port: 41234 });
    expect(parseReadyUrl('Soundframe is ready at http://0.0.0.0:1')).toBeNull();
  });

  it('prints one parseable line per demo account, in order', () => {
    expect(parseAccounts(banner)).toEqual(
      accounts.map(({ role, email, password }) => ({ role, email, password })),
    );
  });

  it('says where mail goes and how to stop', () => {
    expect(banner).toContain('http://127.0.0.1:41234/outbox');
    expect(banner).toContain('/tmp/d/mail');
    expect(banner).toMatch(/Ctrl-C/);
    const production = formatBanner({
      url: 'http://127.0.0.1:1',
      accounts: [],
      mailDir: '/m',
      dataDir: '/d',
      dbPort: 1,
      smtpPort: 2,
      outbox: false,
    });
    expect(production).not.toContain('/outbox');
  });
});

describe('test run summary line', () => {
  it('counts a crashed suite as a failure and pending plus todo as skipped', () => {
    expect(
      summaryLine({
        numPassedTests: 12,
        numFailedTests: 1,
        numPendingTests: 2,
        numTodoTests: 1,
        numRuntimeErrorTestSuites: 1,
      }),
    ).toBe('jest: 12 passed, 2 failed, 3 skipped');
    expect(
      summaryLine({
        numPassedTests: 5,
        numFailedTests: 0,
        numPendingTests: 0,
        numTodoTests: 0,
        numRuntimeErrorTestSuites: 0,
      }),
    ).toMatch(/^\w+: \d+ passed, \d+ failed(, \d+ skipped)?$/);
  });
});
