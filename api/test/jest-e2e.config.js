// End-to-end tests against the real MariaDB: each file gets its own throwaway database.
const unit = require('../jest.config');

/** @type {import('jest').Config} */
module.exports = {
  ...unit,
  roots: ['<rootDir>/test'],
  testRegex: '\\.e2e-spec\\.ts$',
  testTimeout: 60000,
};
