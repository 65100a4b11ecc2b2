/** Unit, server and screen tests. End-to-end tests live in jest.e2e.config.js. */
// d3's packages ship ES modules only; jest loads their UMD builds instead.
const d3Umd = { '^(d3-[a-z-]+)$': '<rootDir>/node_modules/$1/dist/$1.js' };
const nodeProject = (displayName, roots) => ({
  displayName,
  testEnvironment: 'node',
  testMatch: roots.map((r) => `<rootDir>/__tests__/${r}/**/*.test.ts`),
  // Plain TypeScript for Node: Expo's preset strips Flow and rejects `declare` class fields.
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
  moduleNameMapper: { '^@/(.*)$': '<rootDir>/src/$1', ...d3Umd },
});

module.exports = {
  projects: [
    nodeProject('core', ['core', 'cli', 'validation', 'charts']),
    { ...nodeProject('server', ['server']), maxWorkers: 1 },
    {
      displayName: 'screens',
      preset: 'jest-expo',
      testMatch: ['<rootDir>/__tests__/screens/**/*.test.tsx'],
      moduleNameMapper: { '^@/(.*)$': '<rootDir>/src/$1', ...d3Umd },
    },
  ],
};
