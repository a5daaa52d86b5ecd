// Unit specs beside the sources. NestJS 12 (and parts of its dependency tree) ship ESM only, which Jest
// cannot require() on Node 20, so @swc/jest compiles TypeScript and those packages to CommonJS.
/** Packages in node_modules that are ESM-only and must be transformed. */
const ESM_PACKAGES = [
  '@nestjs',
  'file-type',
  'strtok3',
  'token-types',
  '@tokenizer',
  'uint8array-extras',
  '@borewit',
  // shared's spectra packages (ESM only) and their ESM dependencies.
  'jcampconverter',
  'convert-to-jcamp',
  'ml-[^/]+',
  'cheminfo-[^/]+',
  'dynamic-typing',
  'is-any-array',
  'ensure-string',
];

const swcOptions = {
  jsc: {
    parser: { syntax: 'typescript', decorators: true },
    transform: { legacyDecorator: true, decoratorMetadata: true },
    target: 'es2022',
    keepClassNames: true,
  },
  module: { type: 'commonjs' },
  sourceMaps: 'inline',
};

/** @type {import('jest').Config} */
module.exports = {
  rootDir: __dirname,
  testEnvironment: 'node',
  roots: ['<rootDir>/src'],
  testRegex: '\\.spec\\.ts$',
  moduleFileExtensions: ['ts', 'js', 'mjs', 'json'],
  transform: { '^.+\\.(t|j|mj)s$': ['@swc/jest', swcOptions] },
  transformIgnorePatterns: [`/node_modules/(?!(${ESM_PACKAGES.join('|')})/)`],
  moduleNameMapper: {
    // Jest cannot require() the ESM build of shared: use its TypeScript sources, without `.js` suffixes.
    '^@siteband/shared$': '<rootDir>/../shared/src/index.ts',
    // ESM sources import './roles.js'; Jest then finds roles.ts (or the package's roles.js).
    '^(\\.{1,2}/.*)\\.js$': '$1',
  },
  clearMocks: true,
};
