import { DEMO_PASSWORD } from '@catline/contracts';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { ensureRedisInstalled, startRedis, stopRedis } from '../../../scripts/lib/redis.mjs';
import { freePort } from './support/mail-catcher.js';

// Two API instances on one Redis, as two processes behind a proxy run; the configuration is read when
// the app's module is first imported, hence the late import.
ensureRedisInstalled();
const redisPort = await freePort();
const redisDir = mkdtempSync(path.join(tmpdir(), 'catline-limits-redis-'));
const redis = await startRedis({ port: redisPort, dir: redisDir });
const previous = { limit: process.env.LOGIN_RATE_LIMIT, redis: process.env.REDIS_URL };
process.env.LOGIN_RATE_LIMIT = '5';
process.env.REDIS_URL = redis.url;
const { startTestApp } = await import('./support/test-app.js');

describe('sign-in limits shared by several API processes through Redis', () => {
  const apps: INestApplication[] = [];
  const urls: string[] = [];

  // Two apps start one after the other; on a loaded machine that has taken over the default minute.
  beforeAll(async () => {
    for (let i = 0; i < 2; i += 1) {
      const { app, url } = await startTestApp();
      apps.push(app);
      urls.push(url);
    }
  }, 180_000);

  afterAll(async () => {
    await Promise.all(apps.map((app) => app.close()));
    stopRedis(redisPort);
    rmSync(redisDir, { recursive: true, force: true });
    for (const [name, value] of [
      ['LOGIN_RATE_LIMIT', previous.limit],
      ['REDIS_URL', previous.redis],
    ] as const) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  });

  it('counts the attempts made through either process together: the sixth is refused wherever it lands', async () => {
    for (let i = 0; i < 5; i += 1) {
      const status = (
        await request(urls[i % 2])
          .post('/api/auth/login')
          .send({ email: 'observer@catline.example', password: 'wrong guess' })
      ).status;
      expect({ attempt: i + 1, status }).toEqual({ attempt: i + 1, status: 401 });
    }
    for (const url of urls) {
      const refused = await request(url)
        .post('/api/auth/login')
        .send({ email: 'observer@catline.example', password: DEMO_PASSWORD });
      expect(refused.status).toBe(429);
    }
  });
});
