import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, type OpenAPIObject, SwaggerModule } from '@nestjs/swagger';
import { API_TAGS } from './api-tags.js';
import { refuseUnsupportedMethods } from './method-not-allowed.js';
import { completeRouteDocs } from './route-docs.js';

const DESCRIPTION = [
  "Catline's HTTP API: the fleet, people, launch cycles and their live lineup, imports and reports.",
  'Every route but sign-in, password links and health needs `Authorization: Bearer <access token>` from',
  '`POST /api/auth/login`; the operation says which roles may call it. Every refusal answers the one',
  'ApiError body, `{statusCode, code, message, details?}`, whose `code` is stable; each operation lists the',
  'codes it answers. Live changes to a lineup are also broadcast over socket.io (see the contracts package).',
].join(' ');

/**
 * The OpenAPI document of every route, served at /api/docs (UI) and /api/docs-json; its paths also
 * tell a wrong method (405) from an unknown path (404).
 */
export function serveApiDocument(app: INestApplication, appUrl: string): OpenAPIObject {
  completeRouteDocs(app);
  const builder = new DocumentBuilder()
    .setTitle('Catline API')
    .setDescription(DESCRIPTION)
    .setVersion('1')
    .addServer(new URL(appUrl).origin, 'This Catline server')
    .addBearerAuth();
  for (const [name, description] of Object.entries(API_TAGS)) builder.addTag(name, description);
  const document = SwaggerModule.createDocument(app, builder.build());
  SwaggerModule.setup('api/docs', app, document);
  refuseUnsupportedMethods(app, document);
  return document;
}
