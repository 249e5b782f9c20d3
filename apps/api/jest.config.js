import { swcEsmPreset } from '../../scripts/jest/swc-esm.js';

// Unit specs live beside the code; integration tests (test/) have their own config.
export default { ...swcEsmPreset, roots: ['<rootDir>/src'] };
