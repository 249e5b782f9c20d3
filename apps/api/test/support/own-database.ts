import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parseEnv } from 'node:util';
import { type Environment, validateEnvironment } from '../../src/config/environment.js';
import { recreateDatabase } from '../../src/database/recreate-database.js';
import { testDatabaseName } from './test-database-name.mjs';

const ENV_FILE = fileURLToPath(new URL('../../../../.env', import.meta.url));

/** The workspace .env under the process environment (Jest's process.env is a copy, so it is read here). */
export function testEnvironment(): Environment {
  const file = existsSync(ENV_FILE) ? parseEnv(readFileSync(ENV_FILE, 'utf8')) : {};
  return validateEnvironment({ ...file, ...process.env });
}

/**
 * A fresh database for one spec that must not touch the shared demo rows (`<DB_NAME>_test_<name>`,
 * migrated and seeded), on the database server `DB_PORT` names unless told otherwise.
 */
export async function recreateOwnDatabase(name: string, overrides: { DB_PORT?: number } = {}): Promise<Environment> {
  const environment = testEnvironment();
  const base = environment.DB_NAME.replace(/_test$/, '');
  const database = { ...environment, ...overrides, DB_NAME: `${testDatabaseName(base)}_${name}` };
  await recreateDatabase(database);
  return database;
}
