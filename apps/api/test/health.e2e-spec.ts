import type { INestApplication } from '@nestjs/common';
import request from 'supertest';
import { startTestApp } from './support/test-app.js';

describe('GET /api/health', () => {
  let app: INestApplication;

  beforeAll(async () => {
    ({ app } = await startTestApp());
  });

  afterAll(async () => {
    await app.close();
  });

  it('reports the database up while MariaDB answers', async () => {
    const response = await request(app.getHttpServer()).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'ok', database: 'up' });
  });

  it('answers without a token', async () => {
    const response = await request(app.getHttpServer()).get('/api/health').set('Authorization', '');
    expect(response.status).toBe(200);
  });
});
