import { existsSync } from 'node:fs';
import type { ServerResponse } from 'node:http';
import { basename, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { INestApplication } from '@nestjs/common';
import compression from 'compression';
import expressStaticGzip from 'express-static-gzip';

/** The built web app, served from the same process when it exists (after `npm start`'s build). */
export const webDist = fileURLToPath(new URL('../../../web/dist', import.meta.url));

export const webAppBuilt = (): boolean => existsSync(webDist);

/**
 * Headers of the web app's own files (not the hashed assets, served below). The page and the service
 * worker are checked again at every visit, so a new version reaches an installed tablet at once.
 */
export function webAppHeaders(response: ServerResponse, path: string): void {
  const name = basename(path);
  if (name === 'index.html' || name === 'sw.js') response.setHeader('Cache-Control', 'no-cache');
}

/**
 * Every text response compressed. The web app's assets were compressed at build (brotli and gzip
 * beside each file, apps/web/vite.config.ts): they are sent as stored with their Content-Encoding,
 * and, their names carrying a content hash, cached for a year. Everything else (JSON, index.html)
 * goes through the compression middleware, which leaves alone what is already encoded.
 */
export function compressResponses(app: INestApplication): void {
  app.use(compression());
  if (webAppBuilt()) {
    app.use(
      '/assets',
      expressStaticGzip(join(webDist, 'assets'), {
        enableBrotli: true,
        orderPreference: ['br', 'gzip'],
        index: false,
        serveStatic: { immutable: true, maxAge: '1y' },
      }),
    );
  }
}
