import type { ApiError } from '@catline/contracts';
import { HttpStatus, type INestApplication } from '@nestjs/common';
import type { OpenAPIObject } from '@nestjs/swagger';
import type { NextFunction, Request, Response } from 'express';

const METHODS = ['get', 'put', 'post', 'patch', 'delete'] as const;

interface KnownPath {
  pattern: RegExp;
  allow: string[];
}

/** `/api/cycles/{cycleId}/slots.csv` → a pattern matching one path segment per parameter. */
function patternOf(template: string): RegExp {
  const parts = template.split(/\{[^}]+\}/).map((part) => part.replace(/[.*+?^$()|[\]\\]/g, '\\$&'));
  return new RegExp(`^${parts.join('[^/]+')}/?$`);
}

/**
 * A known path asked with a method it does not take answers 405 with `Allow`, not 404: the client
 * learns the address is right and which methods it takes. The paths are the document's, so every
 * route counts the moment it is added.
 */
export function refuseUnsupportedMethods(app: INestApplication, document: OpenAPIObject): void {
  const known: KnownPath[] = Object.entries(document.paths).map(([template, item]) => {
    const allow = METHODS.filter((method) => method in item).map((method) => method.toUpperCase());
    return { pattern: patternOf(template), allow: allow.includes('GET') ? [...allow, 'HEAD'] : allow };
  });
  app.use((request: Request, response: Response, next: NextFunction) => {
    if (request.method === 'OPTIONS' || !request.path.startsWith('/api/')) return next();
    const matching = known.filter(({ pattern }) => pattern.test(request.path));
    if (matching.length === 0) return next();
    const allow = [...new Set(matching.flatMap((path) => path.allow))];
    if (allow.includes(request.method)) return next();
    const body: ApiError = {
      statusCode: HttpStatus.METHOD_NOT_ALLOWED,
      code: 'method_not_allowed',
      message: `${request.path} takes ${allow.join(', ')}, not ${request.method}.`,
    };
    response.setHeader('Allow', allow.join(', '));
    response.status(body.statusCode).json(body);
  });
}
