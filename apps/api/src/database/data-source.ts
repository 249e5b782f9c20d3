import { existsSync } from 'node:fs';
import { DataSource, type DataSourceOptions } from 'typeorm';
import { ENV_FILE_PATHS, type Environment, validateEnvironment } from '../config/environment.js';
import { entities } from './entities.js';
import { migrations } from './migrations/index.js';

type DatabaseSettings = Pick<Environment, 'DB_HOST' | 'DB_PORT' | 'DB_NAME' | 'DB_USER' | 'DB_PASSWORD'> &
  Partial<Pick<Environment, 'DB_REPLICA_HOST' | 'DB_REPLICA_PORT'>>;

/**
 * The server(s) to connect to. With a replica, TypeORM keeps a pool on each, and `defaultMode: 'master'`
 * sends every query to the primary unless a query runner is asked for on the replica (`ReplicaReads`):
 * a read that must see the latest commit cannot land on the replica by default.
 */
function servers(settings: DatabaseSettings) {
  const primary = {
    host: settings.DB_HOST,
    port: settings.DB_PORT,
    database: settings.DB_NAME,
    username: settings.DB_USER,
    password: settings.DB_PASSWORD,
  };
  if (!settings.DB_REPLICA_HOST) return primary;
  const replica = { ...primary, host: settings.DB_REPLICA_HOST, port: settings.DB_REPLICA_PORT ?? settings.DB_PORT };
  return { replication: { master: primary, slaves: [replica], defaultMode: 'master' as const } };
}

/** One definition of the connection for the app, the command-line tools and the tests. */
export function dataSourceOptions(settings: DatabaseSettings): DataSourceOptions {
  return {
    type: 'mariadb',
    ...servers(settings),
    entities,
    migrations,
    migrationsTransactionMode: 'each',
    synchronize: false,
    timezone: 'Z',
    charset: 'utf8mb4_unicode_ci',
    poolSize: 20,
    // Fail fast while MariaDB is down, so health and commands answer 503 instead of hanging.
    connectTimeout: 2_000,
  };
}

/** Reads the workspace .env (if any) and the process environment, for the command-line tools. */
export function environmentFromProcess(): Environment {
  for (const file of ENV_FILE_PATHS) {
    if (existsSync(file)) {
      process.loadEnvFile(file);
      break;
    }
  }
  return validateEnvironment(process.env);
}

export function createDataSource(settings: DatabaseSettings = environmentFromProcess()): DataSource {
  return new DataSource(dataSourceOptions(settings));
}
