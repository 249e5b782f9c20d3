// `pnpm --filter @catline/api db:migrate`: applies pending migrations.
import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { createDataSource } from './data-source.js';

const logger = new Logger('Migrate');
const dataSource = await createDataSource().initialize();
try {
  const applied = await dataSource.runMigrations({ transaction: 'each' });
  logger.log(applied.length ? `Applied ${applied.map((m) => m.name).join(', ')}` : 'No pending migration');
} finally {
  await dataSource.destroy();
}
