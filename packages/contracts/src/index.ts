export * from './auth.js';
export * from './cycles.js';
export * from './fleet.js';
export * from './lineup.js';
export * from './roles.js';
export * from './socket.js';
