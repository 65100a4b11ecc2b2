/**
 * End-to-end tests: the real server (`npm start`) on a free port with a temporary
 * database, driven through headless Chromium. Run with `npm run test:e2e`.
 */
module.exports = {
  displayName: 'e2e',
  testEnvironment: 'node',
  testMatch: ['<rootDir>/__tests__/e2e/**/*.test.ts'],
  transform: {
    '^.+\\.[jt]sx?$': [
      'babel-jest',
      {
        babelrc: false,
        configFile: false,
        presets: [['@babel/preset-typescript', { allowDeclareFields: true }]],
        plugins: ['@babel/plugin-transform-modules-commonjs'],
      },
    ],
  },
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/src/$1' },
  globalSetup: '<rootDir>/__tests__/e2e/support/global-setup.ts',
  globalTeardown: '<rootDir>/__tests__/e2e/support/global-teardown.ts',
  // A browser step waits on the network and on rendering; the server start is in globalSetup.
  testTimeout: 120_000,
};
