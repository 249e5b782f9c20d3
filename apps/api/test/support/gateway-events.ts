import type { Role } from '@catline/contracts';
import type { INestApplication } from '@nestjs/common';
import { ModulesContainer } from '@nestjs/core';
import { GATEWAY_METADATA, MESSAGE_MAPPING_METADATA, MESSAGE_METADATA } from '@nestjs/websockets/constants.js';
import { ROLES_KEY } from '../../src/common/decorators/roles.decorator.js';

export interface GatewayEvent {
  gateway: string;
  event: string;
  allowed: Role[] | undefined;
}

/**
 * Every socket event every gateway of the running app answers, with the roles its @Roles() names,
 * read from the app's own modules so that a gateway added later is found without being listed here.
 */
export function gatewayEvents(app: INestApplication): GatewayEvent[] {
  const gateways = [...app.get(ModulesContainer).values()]
    .flatMap((module) => [...module.providers.values()])
    .map((wrapper) => wrapper.metatype)
    .filter(
      (type): type is new () => object => typeof type === 'function' && Reflect.hasMetadata(GATEWAY_METADATA, type),
    );
  return [...new Set(gateways)].flatMap((gateway) =>
    Object.getOwnPropertyNames(gateway.prototype)
      .map((name) => (gateway.prototype as Record<string, unknown>)[name])
      .filter(
        (handler): handler is object =>
          typeof handler === 'function' && Reflect.getMetadata(MESSAGE_MAPPING_METADATA, handler) === true,
      )
      .map((handler) => ({
        gateway: gateway.name,
        event: Reflect.getMetadata(MESSAGE_METADATA, handler) as string,
        allowed: Reflect.getMetadata(ROLES_KEY, handler) as Role[] | undefined,
      })),
  );
}
