import { ValidationPipe, type INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { NestExpressApplication, NestExpressBodyParserOptionsFor } from '@nestjs/platform-express';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { withRequestContext } from './common/request-context.js';
import { ApiExceptionFilter } from './common/filters/api-exception.filter.js';
import { serveApiDocument } from './common/openapi/api-document.js';
import { refuseDeepJson } from './common/validation/json-depth.js';
import { StrictIdPipe } from './common/validation/strict-id.pipe.js';
import { type Environment, servedOverHttps, trustedProxies, webOrigins } from './config/environment.js';
import { compressResponses } from './web-app/web-app.js';

/**
 * Helmet's defaults, except that plain HTTP stays plain: `upgrade-insecure-requests` would make the
 * browser fetch every script and style over HTTPS, which a ship's internal network may not serve (a
 * blank page), and HSTS would pin the host to HTTPS.
 */
function securityHeaders(https: boolean): Parameters<typeof helmet>[0] {
  return {
    contentSecurityPolicy: { directives: { upgradeInsecureRequests: https ? [] : null } },
    strictTransportSecurity: https,
  };
}

/** Everything main.ts sets on the app, shared with the integration tests so they test the same thing. */
export function configureApp(app: INestApplication): void {
  const config = app.get<ConfigService<Environment, true>>(ConfigService);
  app.setGlobalPrefix('api');
  app
    .getHttpAdapter()
    .getInstance()
    .set('trust proxy', trustedProxies({ TRUST_PROXY: config.get('TRUST_PROXY') }));
  app.use(helmet(securityHeaders(servedOverHttps({ APP_URL: config.get('APP_URL') }))));
  compressResponses(app);
  app.use(cookieParser());
  app.use(withRequestContext);
  // Replaces Nest's default JSON parser (same limits), adding the depth check before parsing. Nest's type
  // leaves out `verify` because Nest sets it itself for the `rawBody` option, which this app does not use.
  (app as NestExpressApplication).useBodyParser('json', {
    verify: refuseDeepJson,
  } as NestExpressBodyParserOptionsFor<'json'>);
  app.enableCors({ origin: webOrigins({ WEB_ORIGINS: config.get('WEB_ORIGINS') }), credentials: true });
  app.useGlobalPipes(
    new StrictIdPipe(),
    new ValidationPipe({ whitelist: true, forbidNonWhitelisted: true, transform: true }),
  );
  app.useGlobalFilters(new ApiExceptionFilter());
  app.enableShutdownHooks();
  serveApiDocument(app, config.get('APP_URL'));
}
