// Shared Jest set-up for the workspace's ESM TypeScript: @swc/jest with Nest's legacy
// decorators and their metadata, and `.js` suffixes of relative imports mapped back to sources.
export const swcEsmPreset = {
  testEnvironment: 'node',
  extensionsToTreatAsEsm: ['.ts'],
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
  transform: {
    '^.+\\.ts$': [
      '@swc/jest',
      {
        jsc: {
          target: 'es2022',
          parser: { syntax: 'typescript', decorators: true },
          transform: { legacyDecorator: true, decoratorMetadata: true },
          keepClassNames: true,
        },
        module: { type: 'es6' },
      },
    ],
  },
};
