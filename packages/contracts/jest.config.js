import { swcEsmPreset } from '../../scripts/jest/swc-esm.js';
export default { ...swcEsmPreset, roots: ['<rootDir>/src'] };
