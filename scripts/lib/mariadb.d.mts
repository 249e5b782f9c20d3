// Types for the TypeScript tests that start and stop a MariaDB server of their own.
export interface MariaDBServer {
  dataDir: string;
  socket: string;
  pidFile: string;
  logFile: string;
}

export interface AppDatabaseUser {
  DB_NAME: string;
  DB_USER: string;
  DB_PASSWORD: string;
}

export function mariadbServer(name?: string): MariaDBServer;
export function isMariaDBRunning(server?: MariaDBServer): boolean;
export function startMariaDB(
  server: MariaDBServer,
  port: number | string,
  options?: { extraArgs?: string[] },
): Promise<void>;
export function sql(server: MariaDBServer, statements: string): void;
export function queryValue(server: MariaDBServer, statement: string): string | null;
export function grantAppUser(server: MariaDBServer, env: AppDatabaseUser): void;
export function stopMariaDB(server: MariaDBServer): void;
export function ensurePrivateMariaDB(env: AppDatabaseUser & { DB_PORT: number | string }): Promise<boolean>;
export function stopPrivateMariaDB(): void;
