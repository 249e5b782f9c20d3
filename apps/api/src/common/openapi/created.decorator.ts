import {
  applyDecorators,
  type CallHandler,
  type ExecutionContext,
  HttpCode,
  HttpStatus,
  Injectable,
  type NestInterceptor,
  SetMetadata,
  UseInterceptors,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request, Response } from 'express';
import { map, type Observable } from 'rxjs';

export const CREATED_LOCATION = 'catline:createdLocation';

type LocationOf = (body: never, request: Request) => string;

@Injectable()
export class LocationInterceptor implements NestInterceptor {
  constructor(private readonly reflector: Reflector) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    const locationOf = this.reflector.get<LocationOf>(CREATED_LOCATION, context.getHandler());
    const http = context.switchToHttp();
    const response = http.getResponse<Response>();
    return next.handle().pipe(
      map((body: unknown) => {
        response.location(locationOf(body as never, http.getRequest<Request>()));
        return body;
      }),
    );
  }
}

/**
 * A route that creates a resource: answers 201 with `Location`, the address of what it created,
 * built from the body it answers (e.g. `(cycle: CycleView) => `/api/cycles/${cycle.id}``) and, where
 * the body alone does not say which part is new, the request. A GET of that address answers it.
 */
export const Created = <T>(locationOf: (body: T, request: Request) => string) =>
  applyDecorators(
    HttpCode(HttpStatus.CREATED),
    SetMetadata(CREATED_LOCATION, locationOf),
    UseInterceptors(LocationInterceptor),
  );
