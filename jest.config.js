// Nest 12 ships ESM only; swc rewrites it (and our TS) to CommonJS for jest.
const swc = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true },
      keepClassNames: true,
      target: 'es2022',
    },
    module: { type: 'commonjs' },
  },
];

const shared = {
  rootDir: __dirname,
  testEnvironment: 'node',
  transform: { '^.+\\.(t|j)s$': swc },
  transformIgnorePatterns: ['/node_modules/(?!(@nestjs|file-type|strtok3|token-types|uint8array-extras|@tokenizer|load-esm)/)'],
  setupFiles: ['<rootDir>/test/setup-env.js'],
};

module.exports = {
  projects: [
    { ...shared, displayName: 'unit', testMatch: ['<rootDir>/src-server/**/*.spec.ts', '<rootDir>/test/reference/**/*.spec.ts'] },
    { ...shared, displayName: 'e2e', testMatch: ['<rootDir>/test/e2e/**/*.e2e-spec.ts'], setupFilesAfterEnv: ['<rootDir>/test/e2e-timeout.js'] },
  ],
};
