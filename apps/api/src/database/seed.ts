// `pnpm --filter @catline/api db:seed`: puts the invented demo scenario into an empty database.
import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { createDataSource, environmentFromProcess } from './data-source.js';
import { seedDemo } from './seeds/demo.seed.js';

const logger = new Logger('Seed');
const environment = environmentFromProcess();
if (environment.DEMO_SEED === 'off') {
  logger.log('DEMO_SEED=off: no demo data');
} else {
  const dataSource = await createDataSource(environment).initialize();
  try {
    logger.log((await seedDemo(dataSource)) ? 'Seeded the demo scenario' : 'Demo data already present');
  } finally {
    await dataSource.destroy();
  }
}
