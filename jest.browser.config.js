const base = require('./jest.config.js').projects[0];

module.exports = {
  ...base,
  displayName: 'browser',
  testMatch: ['<rootDir>/test/browser/**/*.browser-spec.ts'],
  testTimeout: 120000,
};
