module.exports = {
  testEnvironment: 'node',
  rootDir: 'src',
  testRegex: '.*\\.spec\\.ts$',
  transform: require('../jest.swc.js'),
  transformIgnorePatterns: ['/node_modules/(?!(@flatten-js)/)'],
};
