import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { get } from 'node:http';
import { join } from 'node:path';
import { brotliDecompressSync, gunzipSync } from 'node:zlib';
import type { INestApplication } from '@nestjs/common';
import { webDist } from '../src/web-app/web-app.js';
import { demoEmail, signIn } from './support/sign-in.js';
import { startTestApp } from './support/test-app.js';

interface RawResponse {
  status: number;
  headers: Record<string, string | string[] | undefined>;
  body: Buffer;
}

/** A GET whose body is left as sent (Node's http does not decode), so the encoding itself can be checked. */
function rawGet(url: string, headers: Record<string, string>): Promise<RawResponse> {
  return new Promise((resolve, reject) => {
    get(url, { headers }, (response) => {
      const chunks: Buffer[] = [];
      response.on('data', (chunk: Buffer) => chunks.push(chunk));
      response.on('end', () =>
        resolve({ status: response.statusCode ?? 0, headers: response.headers, body: Buffer.concat(chunks) }),
      );
      response.on('error', reject);
    }).on('error', reject);
  });
}

describe('compressed responses', () => {
  let app: INestApplication;
  let url: string;

  beforeAll(async () => {
    ({ app, url } = await startTestApp());
  });

  afterAll(async () => {
    await app.close();
  });

  it('sends JSON gzip-compressed to a client that accepts gzip, and decodes to the same list', async () => {
    const token = await signIn(url, demoEmail('admin'));
    const headers = { Authorization: `Bearer ${token}` };
    const plain = await rawGet(`${url}/api/aircraft`, { ...headers, 'Accept-Encoding': 'identity' });
    const gzipped = await rawGet(`${url}/api/aircraft`, { ...headers, 'Accept-Encoding': 'gzip' });
    expect(plain.status).toBe(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(gzipped.status).toBe(200);
    expect(gzipped.headers['content-encoding']).toBe('gzip');
    expect(gzipped.headers.vary).toMatch(/Accept-Encoding/i);
    expect(gzipped.body.length).toBeLessThan(plain.body.length);
    expect(JSON.parse(gunzipSync(gzipped.body).toString('utf8'))).toEqual(JSON.parse(plain.body.toString('utf8')));
  });

  describe('the web app built with precompressed assets', () => {
    const assets = join(webDist, 'assets');
    const entry = (): string => {
      const script = /src="\/assets\/([^"]+\.js)"/.exec(readFileSync(join(webDist, 'index.html'), 'utf8'))?.[1];
      if (!script) throw new Error('index.html names no entry script');
      return script;
    };

    it('is built, with a brotli and a gzip file beside the entry script (run `pnpm -r build` first)', () => {
      expect(existsSync(join(webDist, 'index.html'))).toBe(true);
      const names = readdirSync(assets);
      expect(names).toEqual(expect.arrayContaining([entry(), `${entry()}.br`, `${entry()}.gz`]));
    });

    it('sends the stored brotli file with Content-Encoding br to a browser that accepts it', async () => {
      const response = await rawGet(`${url}/assets/${entry()}`, { 'Accept-Encoding': 'gzip, deflate, br' });
      expect(response.status).toBe(200);
      expect(response.headers['content-encoding']).toBe('br');
      expect(response.headers['content-type']).toMatch(/javascript/);
      expect(response.headers['cache-control']).toMatch(/immutable/);
      expect(response.body.equals(readFileSync(join(assets, `${entry()}.br`)))).toBe(true);
      expect(brotliDecompressSync(response.body).equals(readFileSync(join(assets, entry())))).toBe(true);
    });

    it('sends the gzip file to a client that accepts only gzip, and the plain file to one that accepts neither', async () => {
      const gzipped = await rawGet(`${url}/assets/${entry()}`, { 'Accept-Encoding': 'gzip' });
      expect(gzipped.headers['content-encoding']).toBe('gzip');
      expect(gunzipSync(gzipped.body).equals(readFileSync(join(assets, entry())))).toBe(true);
      const plain = await rawGet(`${url}/assets/${entry()}`, { 'Accept-Encoding': 'identity' });
      expect(plain.headers['content-encoding']).toBeUndefined();
      expect(plain.body.equals(readFileSync(join(assets, entry())))).toBe(true);
    });
  });
});
