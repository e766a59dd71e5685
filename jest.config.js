// Five suites: pure units, the API against the real MariaDB, faults (its own MariaDB and server,
// stopped and killed on purpose), client hooks/components with msw, and browser flows. `npm test` runs them in that order; `npx jest --selectProjects unit` runs one.
const esmPackages = [
  'd3-[a-z-]+', 'internmap', 'ml-[a-z-]+', 'is-any-array', 'msw', '@mswjs', '@bundled-es-modules', 'rettime', 'until-async', '@open-draft',
  'headers-polyfill', 'outvariant', 'strict-event-emitter', 'is-node-process', 'fast-check', 'pure-rand',
  '((jest-)?react-native|@react-native(-community)?)', 'expo(nent)?', '@expo(nent)?/.*', 'expo-router',
  'react-navigation', '@react-navigation', '@shopify/react-native-skia', 'swr', 'standard-navigation', 'ml-', 'is-any-array',
].join('|');

const webPreset = require('jest-expo/web/jest-preset');
// watchPlugins is a top-level option only; the preset's display name is replaced below.
const { watchPlugins: _watch, displayName: _name, ...webPresetProject } = webPreset;

const transform = { '^.+\\.(js|jsx|ts|tsx|mjs|cjs)$': 'babel-jest' };
const transformIgnorePatterns = [`node_modules/(?!(${esmPackages}))`];

const node = {
  testEnvironment: 'node',
  transform,
  transformIgnorePatterns,
  moduleFileExtensions: ['ts', 'tsx', 'js', 'mjs', 'cjs', 'json'],
};

module.exports = {
  projects: [
    {
      ...node,
      displayName: 'unit',
      testMatch: ['<rootDir>/shared/**/*.test.ts', '<rootDir>/server/**/*.test.ts', '<rootDir>/db/**/*.test.ts', '<rootDir>/features/**/*.test.ts'],
    },
    {
      ...node,
      displayName: 'api',
      // tests/ops drives the start script and the backup scripts against real MariaDB instances.
      testMatch: ['<rootDir>/tests/api/**/*.test.ts', '<rootDir>/tests/ops/**/*.test.ts'],
      globalSetup: '<rootDir>/tests/support/global-setup.ts',
      maxWorkers: 1,
    },
    {
      ...node,
      displayName: 'fault',
      testMatch: ['<rootDir>/tests/fault/**/*.test.ts'],
      globalSetup: '<rootDir>/tests/fault/support/global-setup.ts',
      globalTeardown: '<rootDir>/tests/fault/support/global-teardown.ts',
      maxWorkers: 1,
    },
    {
      ...webPresetProject,
      displayName: 'client',
      transform: { '^.+\\.mjs$': 'babel-jest', ...webPreset.transform },
      testMatch: ['<rootDir>/features/**/*.test.tsx'],
      transformIgnorePatterns,
      testEnvironment: '<rootDir>/tests/support/client-environment.js',
      // The web preset resolves the "browser" export condition; msw's node entry needs its node builds.
      moduleNameMapper: {
        ...webPreset.moduleNameMapper,
        '^msw/node$': '<rootDir>/node_modules/msw/lib/node/index.js',
        '^@mswjs/interceptors/ClientRequest$': '<rootDir>/node_modules/@mswjs/interceptors/lib/node/interceptors/ClientRequest/index.cjs',
        '^@mswjs/interceptors/XMLHttpRequest$': '<rootDir>/node_modules/@mswjs/interceptors/lib/node/interceptors/XMLHttpRequest/index.cjs',
        '^@mswjs/interceptors/fetch$': '<rootDir>/node_modules/@mswjs/interceptors/lib/node/interceptors/fetch/index.cjs',
        '^@mswjs/interceptors$': '<rootDir>/node_modules/@mswjs/interceptors/lib/node/index.cjs',
      },
    },
    {
      ...node,
      displayName: 'e2e',
      testMatch: ['<rootDir>/e2e/**/*.e2e.ts'],
      globalSetup: '<rootDir>/e2e/support/global-setup.ts',
      globalTeardown: '<rootDir>/e2e/support/global-teardown.ts',
      maxWorkers: 1,
    },
  ],
};
