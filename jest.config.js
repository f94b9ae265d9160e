// One `npm test`, several jest projects: ui (jest-expo), unit (pure lib and shared code in node),
// server (supertest against a real Postgres database made fresh for the run), browser (Chromium).
const alias = { '^@/(.*)$': '<rootDir>/$1' };
const esmOnly = ['/node_modules/(?!(lucia|oslo|@oslojs|@lucia-auth)/)'];

module.exports = {
  testTimeout: 30000,
  projects: [
    {
      displayName: 'ui',
      preset: 'jest-expo',
      testMatch: ['<rootDir>/__tests__/ui/**/*.test.ts?(x)'],
      moduleNameMapper: alias,
    },
    {
      displayName: 'unit',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/__tests__/unit/**/*.test.ts?(x)'],
      moduleNameMapper: alias,
    },
    {
      displayName: 'server',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/__tests__/server/**/*.test.ts'],
      moduleNameMapper: alias,
      transformIgnorePatterns: esmOnly,
      globalSetup: '<rootDir>/__tests__/server/global-setup.ts',
      globalTeardown: '<rootDir>/__tests__/server/global-teardown.ts',
    },
    {
      displayName: 'browser',
      testEnvironment: 'node',
      testMatch: ['<rootDir>/__tests__/browser/**/*.test.ts'],
      moduleNameMapper: alias,
      transformIgnorePatterns: esmOnly,
      globalSetup: '<rootDir>/__tests__/browser/global-setup.ts',
      globalTeardown: '<rootDir>/__tests__/browser/global-teardown.ts',
    },
  ],
};
