// Jest 30 cannot load Nest 12's ESM-only packages as they are: @swc/jest compiles our TypeScript and
// those packages to CommonJS (legacy decorators + metadata, which TypeORM and Nest need).
// ESM-only packages in node_modules that must be transformed; follow the dependencies when they change.
const esmOnly = [
  '@nestjs/(?!throttler)[^/]+',
  'file-type',
  'strtok3',
  'token-types',
  '@tokenizer/inflate',
  'uint8array-extras',
  '@borewit/text-codec',
  'load-esm',
];

const swc = {
  jsc: {
    parser: { syntax: 'typescript', decorators: true, importAttributes: true },
    transform: { legacyDecorator: true, decoratorMetadata: true },
    target: 'es2023',
    keepClassNames: true,
  },
  module: { type: 'commonjs' },
  sourceMaps: 'inline',
};

/** @type {import('jest').Config} */
module.exports = {
  // Relative to this file's folder: the server package.
  rootDir: '..',
  testEnvironment: 'node',
  testRegex: 'test/.*\\.e2e-spec\\.ts$|src/.*\\.spec\\.ts$',
  moduleFileExtensions: ['ts', 'js', 'mjs', 'cjs', 'json'],
  transform: {
    '^.+\\.(t|j|mj)s$': ['@swc/jest', swc],
  },
  transformIgnorePatterns: [`/node_modules/(?!(${esmOnly.join('|')})/)`],
  moduleNameMapper: {
    '^@yardcall/shared$': '<rootDir>/../shared/src/index.ts',
    '^@yardcall/shared/testing$': '<rootDir>/../shared/src/testing.ts',
    // The shared sources (and the ESM packages) import with `.js` suffixes; Jest resolves sources.
    '^(\\.{1,2}/.*)\\.js$': '$1',
  },
  setupFiles: ['<rootDir>/test/env.ts'],
  globalSetup: '<rootDir>/test/global-setup.ts',
  testTimeout: 20000,
};
