// `pnpm --filter @catline/api db:reset`: recreates DB_NAME (a throwaway *_test/_e2e/_bench database),
// migrates and seeds it. The browser tests and the benchmarks use it for a database of their own.
import 'reflect-metadata';
import { environmentFromProcess } from './data-source.js';
import { recreateDatabase } from './recreate-database.js';

await recreateDatabase(environmentFromProcess());
