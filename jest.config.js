// Four projects: pure shared code, the API against a real MariaDB, client components, and
// browser tests against the production web export. `npm test` (server/tools/test.ts) starts
// the services they need; see DEVELOPERS.md.
const path = require('path');

// Every test runs west of Greenwich, where midnight UTC is the evening before: a day-only date
// shown through the local clock, or a Date written in local time, fails instead of passing by
// luck in UTC. Set here (before jest starts its workers) so `npx jest` behaves like `npm test`.
process.env.TZ = 'America/New_York';

const cacheDirectory = path.join(__dirname, '.jest-cache');
const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1' };
const tsJest = [
  'ts-jest',
  {
    tsconfig: { jsx: 'react-jsx', esModuleInterop: true, isolatedModules: true },
    diagnostics: false,
  },
];

module.exports = {
  testTimeout: 30000,
  projects: [
    {
      displayName: 'shared',
      testEnvironment: 'node',
      cacheDirectory,
      moduleNameMapper,
      transform: { '^.+\\.tsx?$': tsJest },
      testMatch: ['<rootDir>/__tests__/shared/**/*.test.ts'],
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      cacheDirectory,
      moduleNameMapper,
      transform: { '^.+\\.tsx?$': tsJest },
      testMatch: ['<rootDir>/__tests__/server/**/*.test.ts'],
      globalSetup: '<rootDir>/__tests__/server/global-setup.ts',
    },
    {
      displayName: 'client',
      preset: 'jest-expo',
      cacheDirectory,
      moduleNameMapper,
      testMatch: ['<rootDir>/__tests__/client/**/*.test.tsx'],
    },
    {
      displayName: 'e2e',
      testEnvironment: 'node',
      cacheDirectory,
      moduleNameMapper,
      transform: { '^.+\\.tsx?$': tsJest },
      testMatch: ['<rootDir>/__tests__/e2e/**/*.test.ts'],
    },
  ],
};
