export * from './auth.js';
export * from './cycles.js';
export * from './fleet.js';
export * from './imports.js';
export * from './lineup.js';
export * from './lineup-patch.js';
export * from './roles.js';
export * from './socket.js';
