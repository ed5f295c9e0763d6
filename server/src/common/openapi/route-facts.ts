import type { INestApplication } from '@nestjs/common';
import { HTTP_CODE_METADATA } from '@nestjs/common/constants.js';
import { MetadataScanner, ModulesContainer, Reflector } from '@nestjs/core';
import type { Role } from '@lockstep/shared';
import { IS_PUBLIC_KEY } from '../../auth/decorators/public.decorator.js';
import { ROLES_KEY } from '../../auth/decorators/roles.decorator.js';

/** Who may call a route, read from the same metadata the global guards read. */
export type RouteAccess = { public: true } | { public: false; roles: readonly Role[] | null };

/** What the document needs to know about a handler that swagger does not put in it. */
export type RouteFacts = { access: RouteAccess; httpCode: number | undefined };

/** The OpenAPI operationId of a handler; the document is built with this factory too. */
export const operationIdOf = (controller: string, method: string): string => `${controller}_${method}`;

/** Every controller method of the app, by operationId. */
export function readRouteFacts(app: INestApplication): Map<string, RouteFacts> {
  const reflector = app.get(Reflector);
  const scanner = new MetadataScanner();
  const facts = new Map<string, RouteFacts>();
  for (const module of app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as (new (...args: never[]) => object) | null;
      if (!controller) continue;
      for (const method of scanner.getAllMethodNames(controller.prototype)) {
        const handler = (controller.prototype as Record<string, () => unknown>)[method];
        const targets = [handler, controller];
        const isPublic = reflector.getAllAndOverride<boolean | undefined>(IS_PUBLIC_KEY, targets) === true;
        const roles = reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
        facts.set(operationIdOf(controller.name, method), {
          access: isPublic ? { public: true } : { public: false, roles: roles?.length ? roles : null },
          httpCode: reflector.get<number | undefined>(HTTP_CODE_METADATA, handler),
        });
      }
    }
  }
  return facts;
}
