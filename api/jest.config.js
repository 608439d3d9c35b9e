module.exports = {
  testEnvironment: 'node',
  rootDir: '.',
  roots: ['<rootDir>/src', '<rootDir>/test'],
  testRegex: '.*\\.(spec|e2e-spec)\\.ts$',
  transform: require('../jest.swc.js'),
  testTimeout: 30000,
  // Drops every table of DB_NAME and runs the migrations once per jest run.
  globalSetup: '<rootDir>/test/global-setup.ts',
};
