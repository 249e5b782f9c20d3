// Types of redis.mjs for the API's TypeScript tests.
export function ensureRedisInstalled(): void;
export function startRedis(options: { port: number; dir: string }): Promise<{ url: string; started: boolean }>;
export function stopRedis(port: number): void;
