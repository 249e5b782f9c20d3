import type { INestApplication } from '@nestjs/common';
import type { OpenAPIObject } from '@nestjs/swagger';
import request from 'supertest';
import { startTestApp } from './support/test-app.js';

describe('the API document and the paths it names', () => {
  let app: INestApplication;
  let document: OpenAPIObject;

  beforeAll(async () => {
    ({ app } = await startTestApp());
    document = (await request(app.getHttpServer()).get('/api/docs-json').expect(200)).body as OpenAPIObject;
  });

  afterAll(async () => {
    await app.close();
  });

  it('answers 405 with Allow for a method a known path does not take', async () => {
    const response = await request(app.getHttpServer()).delete('/api/cycles');
    expect(response.status).toBe(405);
    expect(response.headers.allow).toBe('GET, POST, HEAD');
    expect(response.body).toEqual({
      statusCode: 405,
      code: 'method_not_allowed',
      message: '/api/cycles takes GET, POST, HEAD, not DELETE.',
    });
  });

  it('answers 405 on a path with an id, before asking for a token', async () => {
    const response = await request(app.getHttpServer()).put('/api/cycles/1/report');
    expect(response.status).toBe(405);
    expect(response.headers.allow).toBe('GET, HEAD');
  });

  it('still answers 404 for a path no route has', async () => {
    const response = await request(app.getHttpServer()).get('/api/cycles/1/nothing-here');
    expect(response.status).toBe(404);
    expect(response.body).toMatchObject({ statusCode: 404, code: 'not_found' });
  });

  it('names the parameter after a collection the same in every path', () => {
    const namesAfter = new Map<string, Set<string>>();
    for (const path of Object.keys(document.paths)) {
      const segments = path.split('/');
      segments.forEach((segment, index) => {
        const parameter = /^\{(\w+)\}$/.exec(segment)?.[1];
        if (!parameter) return;
        const collection = segments.slice(0, index).join('/');
        namesAfter.set(collection, (namesAfter.get(collection) ?? new Set()).add(parameter));
      });
    }
    const mixed = [...namesAfter].filter(([, names]) => names.size > 1).map(([at, names]) => `${at}: ${[...names]}`);
    expect(mixed).toEqual([]);
    expect(namesAfter.get('/api/cycles')).toEqual(new Set(['cycleId']));
  });
});
