module.exports = {
  testEnvironment: 'node',
  rootDir: '.',
  roots: ['<rootDir>/tests'],
  testRegex: '.*\\.e2e\\.ts$',
  transform: require('../jest.swc.js'),
  testTimeout: 120000,
};
