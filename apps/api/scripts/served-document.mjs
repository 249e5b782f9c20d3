// Boots the built API on a free loopback port, reads the OpenAPI document it serves at /api/docs-json
// and writes it to the file named: `lint:api-document` lints that file with Spectral.
import 'reflect-metadata';
import { writeFileSync } from 'node:fs';

const [file] = process.argv.slice(2);
if (!file) throw new Error('usage: served-document.mjs <output file>');
// The document needs the routes, not the mail queue: no sender polling a database that may be empty.
process.env.MAIL_SENDER = 'off';
const { NestFactory } = await import('@nestjs/core');
const { AppModule } = await import('../dist/app.module.js');
const { configureApp } = await import('../dist/app.setup.js');
const app = await NestFactory.create(AppModule, { logger: ['error', 'warn'] });
configureApp(app);
await app.listen(0, '127.0.0.1');
try {
  const response = await fetch(`${await app.getUrl()}/api/docs-json`);
  if (!response.ok) throw new Error(`GET /api/docs-json answered ${response.status}`);
  writeFileSync(file, JSON.stringify(await response.json(), null, 2));
} finally {
  await app.close();
}
