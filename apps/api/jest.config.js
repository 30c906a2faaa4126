// Jest runs in CommonJS mode: @swc/jest turns our TypeScript and the ESM-only @nestjs packages into
// CommonJS, and `.js` suffixes of relative imports are mapped back to the TypeScript sources.
const swcTransform = [
  '@swc/jest',
  {
    jsc: {
      parser: { syntax: 'typescript', decorators: true },
      transform: { legacyDecorator: true, decoratorMetadata: true },
      target: 'es2022',
    },
    module: { type: 'commonjs' },
    sourceMaps: 'inline',
  },
];

const shared = {
  testEnvironment: 'node',
  // The workspace libs resolve to their TypeScript sources under this condition.
  testEnvironmentOptions: { customExportConditions: ['@linesmith/source', 'node', 'node-addons'] },
  transform: { '^.+\\.(t|j)s$': swcTransform },
  // flatbush (the routing library's spatial index) is ESM-only, like @nestjs.
  transformIgnorePatterns: ['/node_modules/(?!(@nestjs|@linesmith|flatbush|flatqueue)/)'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  moduleFileExtensions: ['ts', 'js', 'json'],
};

export default {
  // One worker: the e2e files share one test database (the same as `--runInBand`).
  maxWorkers: 1,
  projects: [
    { ...shared, displayName: 'unit', testMatch: ['<rootDir>/src/**/*.spec.ts'] },
    {
      ...shared,
      displayName: 'e2e',
      testMatch: ['<rootDir>/test/**/*.e2e-spec.ts'],
      globalSetup: '<rootDir>/test/global-setup.ts',
      setupFiles: ['<rootDir>/test/setup-env.ts'],
      testTimeout: 30000,
    },
  ],
};
