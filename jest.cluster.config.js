const base = require('./jest.config.js').projects[0];

// Run by scripts/test-cluster.sh against the cluster that npm run cluster starts (never alone).
module.exports = {
  ...base,
  displayName: 'cluster',
  testMatch: ['<rootDir>/test/cluster/**/*.cluster-spec.ts'],
  testTimeout: 600000,
};
