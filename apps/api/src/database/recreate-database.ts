import { createConnection } from 'mysql2/promise';
import type { Environment } from '../config/environment.js';
import { createDataSource } from './data-source.js';
import { seedDemo } from './seeds/demo.seed.js';

type Settings = Pick<Environment, 'DB_HOST' | 'DB_PORT' | 'DB_NAME' | 'DB_USER' | 'DB_PASSWORD'>;

/** Drops and recreates a throwaway database, migrates it and seeds the demo (tests, benchmarks). */
export async function recreateDatabase(settings: Settings): Promise<void> {
  if (!/_(test|e2e|bench|cluster)\w*$/.test(settings.DB_NAME)) {
    throw new Error(
      `Only throwaway databases (*_test, *_e2e, *_bench, *_cluster) are recreated, not ${settings.DB_NAME}`,
    );
  }
  const server = await createConnection({
    host: settings.DB_HOST,
    port: settings.DB_PORT,
    user: settings.DB_USER,
    password: settings.DB_PASSWORD,
  });
  try {
    await server.query(`DROP DATABASE IF EXISTS \`${settings.DB_NAME}\``);
    await server.query(`CREATE DATABASE \`${settings.DB_NAME}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  } finally {
    await server.end();
  }
  const dataSource = await createDataSource(settings).initialize();
  try {
    await dataSource.runMigrations({ transaction: 'each' });
    await seedDemo(dataSource);
  } finally {
    await dataSource.destroy();
  }
}
