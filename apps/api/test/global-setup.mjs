// Runs once per integration run, before any spec: a fresh database with migrations and the demo seed.
// It loads the built API (the test:integration script builds first) because Jest loads this file
// outside its ESM transform.
import 'reflect-metadata';
import { environmentFromProcess } from '../dist/database/data-source.js';
import { recreateDatabase } from '../dist/database/recreate-database.js';
import { testDatabaseName } from './support/test-database-name.mjs';

export default async function globalSetup() {
  const environment = environmentFromProcess();
  process.env.DB_NAME = testDatabaseName(environment.DB_NAME);
  // Specs sign in many times; the rate-limit spec sets its own low limit.
  process.env.LOGIN_RATE_LIMIT ??= '1000';
  process.env.PASSWORD_RESET_RATE_LIMIT ??= '1000';
  // Mail stays queued in the outbox; the mail spec turns the sender on against its own mail catcher.
  process.env.MAIL_SENDER ??= 'off';
  await recreateDatabase({ ...environment, DB_NAME: process.env.DB_NAME });
}
