import 'reflect-metadata';
import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { AppModule } from '../../src/app.module.js';
import { configureApp } from '../../src/app.setup.js';
import { shareSocketRoomsWhenConfigured } from '../../src/gateway/redis-io.adapter.js';

/** The whole API (DB_NAME is the test database, set by global-setup.mjs), configured as main.ts does, on the test database and a free loopback port. */
export async function startTestApp(): Promise<{ app: INestApplication; url: string }> {
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication({ logger: ['error', 'warn'] });
  configureApp(app);
  await shareSocketRoomsWhenConfigured(app);
  await app.listen(0, '127.0.0.1');
  return { app, url: await app.getUrl() };
}
