import { ROLE_LABELS, type RefusalCode, type Role } from '@catline/contracts';
import { type INestApplication, RequestMethod, type Type } from '@nestjs/common';
import { HTTP_CODE_METADATA, METHOD_METADATA, PATH_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants.js';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum.js';
import { ModulesContainer } from '@nestjs/core';
import { ApiBearerAuth, ApiOperation, ApiParam, ApiResponse } from '@nestjs/swagger';
import { IS_PUBLIC } from '../decorators/public.decorator.js';
import { ROLES_KEY } from '../decorators/roles.decorator.js';
import { API_DOC, type ApiDocMetadata, type RefusalStatus } from './api-doc.decorator.js';
import { CREATED_LOCATION } from './created.decorator.js';
import { ApiErrorDto } from './api-error.dto.js';
import { LineupCommandResultDto } from './views/lineup.view.js';

/** What a route's own decorators and parameters say about it. */
interface RouteFacts {
  verb: RequestMethod;
  status: number;
  isPublic: boolean;
  roles: Role[] | undefined;
  hasBody: boolean;
  hasQuery: boolean;
  /** Set by @Created: the route answers 201 with Location. */
  createsAt: boolean;
  /** Path parameters the handler reads as numbers (ids, checked by StrictIdPipe). */
  idParams: string[];
}

const SUCCESS_DESCRIPTION: Record<number, string> = {
  200: 'Done; the body is the answer.',
  201: 'Created; `Location` names the new resource and the body is its view.',
  202: 'Accepted; the effect follows.',
  204: 'Done; no body.',
};

const ERROR_DESCRIPTION: Record<RefusalStatus, string> = {
  400: 'The request is malformed or breaks a rule of its fields.',
  401: 'No valid session: sign in again.',
  403: 'Signed in, but not allowed to do this.',
  404: 'Something the request names does not exist.',
  409: 'The request conflicts with the current state; nothing was changed.',
  413: 'The body or file is too large.',
  415: 'The file is not of a type the route reads.',
  422: 'The stored data cannot answer the request.',
  429: 'Too many attempts: wait `Retry-After` seconds.',
  503: 'The database is out of reach or busy; nothing was changed. Try again.',
};

/**
 * The refusals every route of a kind answers, by the facts the filter and pipes act on: the
 * validation pipe and StrictIdPipe (400), the body parser on every method but GET (400, 413), the auth guard (401,
 * 403, and 404 for a cycle of another ship) and the error filter's database answers (503).
 */
function standardRefusals(route: RouteFacts): Partial<Record<RefusalStatus, RefusalCode[]>> {
  const refusals: Partial<Record<RefusalStatus, RefusalCode[]>> = {};
  // The body parser reads a body sent to any method but GET, whether the handler takes one or not.
  const parsesBody = route.verb !== RequestMethod.GET;
  const bad: RefusalCode[] = [
    ...(route.hasBody || route.hasQuery ? (['validation_failed'] as const) : []),
    ...(parsesBody ? (['json_too_deep', 'bad_request'] as const) : []),
    ...(route.idParams.length ? (['invalid_id'] as const) : []),
  ];
  if (bad.length) refusals[400] = bad;
  if (!route.isPublic) refusals[401] = ['unauthenticated', 'session_invalid', 'session_ended'];
  if (route.roles) refusals[403] = ['forbidden_role'];
  // The auth guard keeps every cycle route to the caller's ship: another ship's cycle is answered as missing.
  if (!route.isPublic && route.idParams.includes('cycleId')) refusals[404] = ['not_found'];
  if (parsesBody) refusals[413] = ['payload_too_large'];
  refusals[503] = ['database_unavailable', 'database_busy'];
  return refusals;
}

/**
 * The refusals every route answering a view answers, by that view: every lineup command goes through
 * CycleChangeService.apply, which turns launch-math refusing the stored data into launch_data_invalid.
 */
function refusalsOfResponse(response: ApiDocMetadata['response']): Partial<Record<RefusalStatus, RefusalCode[]>> {
  return response === LineupCommandResultDto ? { 422: ['launch_data_invalid'] } : {};
}

function mergeRefusals(
  ...all: Partial<Record<RefusalStatus, readonly RefusalCode[]>>[]
): Map<RefusalStatus, RefusalCode[]> {
  const merged = new Map<RefusalStatus, RefusalCode[]>();
  for (const refusals of all) {
    for (const [status, codes] of Object.entries(refusals) as [`${RefusalStatus}`, RefusalCode[]][]) {
      const key = Number(status) as RefusalStatus;
      merged.set(key, [...new Set([...(merged.get(key) ?? []), ...codes])]);
    }
  }
  return new Map([...merged].sort(([a], [b]) => a - b));
}

function whoMayCall(route: RouteFacts): string {
  if (route.isPublic) return 'Anyone may call it, without a token.';
  if (!route.roles) return 'Any signed-in person may call it.';
  return `Only ${route.roles.map((role) => ROLE_LABELS[role]).join(' or ')} may call it.`;
}

function factsOf(controller: Type<unknown>, handler: (...args: unknown[]) => unknown, name: string): RouteFacts {
  const verb = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod;
  const firstOf = <T>(key: string): T | undefined =>
    (Reflect.getMetadata(key, handler) as T | undefined) ?? (Reflect.getMetadata(key, controller) as T | undefined);
  const args = Object.entries(
    (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, name) ?? {}) as Record<
      string,
      { index: number; data?: string }
    >,
  );
  const paramTypes = (Reflect.getMetadata('design:paramtypes', controller.prototype as object, name) ??
    []) as unknown[];
  const ofType = (type: RouteParamtypes) => args.filter(([key]) => key.split(':')[0] === String(type));
  return {
    verb,
    status:
      (Reflect.getMetadata(HTTP_CODE_METADATA, handler) as number | undefined) ??
      (verb === RequestMethod.POST ? 201 : 200),
    isPublic: firstOf<boolean>(IS_PUBLIC) === true,
    roles: firstOf<Role[]>(ROLES_KEY),
    createsAt: Reflect.getMetadata(CREATED_LOCATION, handler) !== undefined,
    hasBody: ofType(RouteParamtypes.BODY).length > 0,
    hasQuery: ofType(RouteParamtypes.QUERY).length > 0,
    idParams: ofType(RouteParamtypes.PARAM)
      .filter(([, arg]) => arg.data && paramTypes[arg.index] === Number)
      .map(([, arg]) => arg.data as string),
  };
}

// Where @nestjs/swagger keeps a handler's responses (its DECORATORS.API_RESPONSE).
const API_RESPONSES = 'swagger/apiResponse';

function decorate(controller: Type<unknown>, name: string, route: RouteFacts, doc: ApiDocMetadata): void {
  const descriptor = Object.getOwnPropertyDescriptor(controller.prototype, name) as PropertyDescriptor;
  // A response the route documents itself (health's own 503 body) stays as it is.
  const own = new Set(Object.keys((Reflect.getMetadata(API_RESPONSES, descriptor.value as object) ?? {}) as object));
  const decorators: MethodDecorator[] = [
    ApiOperation({
      summary: doc.summary,
      description: [doc.description, whoMayCall(route)].filter(Boolean).join(' '),
    }),
    ...route.idParams.map((param) => ApiParam({ name: param, schema: { type: 'integer', minimum: 1 } })),
  ];
  const description = SUCCESS_DESCRIPTION[route.status] ?? 'Done.';
  const headers = route.createsAt
    ? { Location: { description: 'The address of the new resource.', schema: { type: 'string' as const } } }
    : undefined;
  if (doc.response === 'csv') {
    // Only the success is CSV: a refusal of the same route is the JSON error body like any other.
    decorators.push(
      ApiResponse({
        status: route.status,
        description,
        content: { 'text/csv': { schema: { type: 'string', format: 'binary' } } },
      }),
    );
  } else if (doc.response) {
    decorators.push(ApiResponse({ status: route.status, description, headers, type: doc.response }));
  } else {
    decorators.push(ApiResponse({ status: route.status, description }));
  }
  for (const [status, codes] of mergeRefusals(
    standardRefusals(route),
    refusalsOfResponse(doc.response),
    doc.refuses ?? {},
  )) {
    if (own.has(String(status))) continue;
    decorators.push(
      ApiResponse({
        status,
        description: `${ERROR_DESCRIPTION[status]} Codes: ${codes.map((code) => `\`${code}\``).join(', ')}.`,
        type: ApiErrorDto,
      }),
    );
  }
  if (!route.isPublic) decorators.push(ApiBearerAuth());
  for (const decorator of decorators) decorator(controller.prototype as object, name, descriptor);
}

// Decorators add to metadata: each handler is completed once per process, however many apps start.
const completed = new WeakSet<object>();

/**
 * Completes every documented route's OpenAPI metadata from what the route itself declares (see
 * ApiDoc). Runs before the document is built; a route without @ApiDoc is left as it is, and the
 * document check (Spectral, `pnpm --filter @catline/api lint:api-document`) then fails on it.
 */
export function completeRouteDocs(app: INestApplication): void {
  for (const module of app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as Type<unknown> | null;
      if (!controller) continue;
      for (const name of Object.getOwnPropertyNames(controller.prototype)) {
        const handler = (controller.prototype as Record<string, unknown>)[name];
        if (typeof handler !== 'function' || Reflect.getMetadata(PATH_METADATA, handler) === undefined) continue;
        const doc = Reflect.getMetadata(API_DOC, handler) as ApiDocMetadata | undefined;
        if (!doc || completed.has(handler)) continue;
        completed.add(handler);
        decorate(controller, name, factsOf(controller, handler as (...args: unknown[]) => unknown, name), doc);
      }
    }
  }
}
