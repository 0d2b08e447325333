/** @type {import('jest').Config} */
module.exports = {
  testEnvironment: 'node',
  rootDir: '.',
  roots: ['<rootDir>/src', '<rootDir>/test'],
  testRegex: '.*\\.(spec|e2e-spec)\\.ts$',
  transform: { '^.+\\.ts$': ['ts-jest', { tsconfig: '<rootDir>/tsconfig.json', isolatedModules: true }] },
  // The shared package is compiled from source in tests, so no build step is needed first.
  moduleNameMapper: { '^@causeway/shared$': '<rootDir>/../shared/src/index.ts' },
  testTimeout: 30000,
};
