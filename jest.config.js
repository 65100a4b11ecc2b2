/** Unit, server and screen tests. End-to-end tests live in jest.e2e.config.js. */
const nodeProject = (displayName, roots) => ({
  displayName,
  testEnvironment: 'node',
  testMatch: roots.map((r) => `<rootDir>/__tests__/${r}/**/*.test.ts`),
  transform: { '^.+\\.[jt]sx?$': 'babel-jest' },
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/src/$1' },
});

module.exports = {
  projects: [
    nodeProject('core', ['core', 'cli', 'validation']),
    { ...nodeProject('server', ['server']), maxWorkers: 1 },
    {
      displayName: 'screens',
      preset: 'jest-expo',
      testMatch: ['<rootDir>/__tests__/screens/**/*.test.tsx'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/src/$1' },
    },
  ],
};
