/** Two projects: `node` for shared/ and server/ (real MariaDB), `client` for screens and components. */
const expoPreset = require('jest-expo/jest-preset');

const moduleNameMapper = { '^@/(.*)$': '<rootDir>/$1' };
// Append to jest-expo's own allow-list rather than replacing it.
const clientIgnore = (expoPreset.transformIgnorePatterns || []).map((pattern) => pattern.replace('(?!(', '(?!(victory|d3-geo|d3-array|'));

module.exports = {
  testTimeout: 30000,
  cacheDirectory: '<rootDir>/.cache/jest',
  projects: [
    {
      displayName: 'node',
      testEnvironment: 'node',
      roots: ['<rootDir>/tests/shared', '<rootDir>/tests/server', '<rootDir>/tests/lint'],
      testMatch: ['**/*.test.ts'],
      moduleNameMapper,
      transform: {
        '^.+\\.tsx?$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.test.json', diagnostics: false }],
      },
    },
    {
      displayName: 'client',
      preset: 'jest-expo/web',
      roots: ['<rootDir>/tests/components', '<rootDir>/tests/app'],
      testMatch: ['**/*.test.tsx'],
      moduleNameMapper,
      transformIgnorePatterns: clientIgnore,
      // d3-geo and d3-array ship ES modules as .mjs only; jest-expo's transform does not cover that extension
      transform: { '^.+\\.mjs$': 'babel-jest' },
    },
  ],
};
