// The data source the TypeORM command line loads (`pnpm migration:generate`); built to dist first.
import 'reflect-metadata';
import { createDataSource } from './data-source.js';

export default createDataSource();
