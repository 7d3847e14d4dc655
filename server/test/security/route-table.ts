import { RequestMethod, type INestApplication } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import type { Role } from '@pondwright/shared';
import type { Application } from 'express';
import { PUBLIC_KEY, ROLES_KEY } from '../../src/common/decorators/auth.decorators';

/** `configureApp` mounts every controller under this prefix; the router cross-check proves it. */
export const GLOBAL_PREFIX = 'api';

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** One path parameter, named by the literal segment before it: `jobs/:id`, `logs/:logId`. */
export type PathParam = { name: string; key: string };

export type Route = {
  /** `Controller.handler`, the name a failure reports. */
  name: string;
  method: HttpMethod;
  /** The full path as Express matches it, e.g. `/api/jobs/:id/logs/:logId`. */
  path: string;
  isPublic: boolean;
  /** The roles `@Roles(...)` allows (handler over controller, as the guard reads them). */
  roles: Role[];
  params: PathParam[];
  /** Why no request can be built for this route (a parameter the tests cannot name), if any. */
  unbuildable: string | null;
};

const HTTP_METHODS = new Set<string>(['GET', 'POST', 'PUT', 'PATCH', 'DELETE']);

const asArray = (value: string | string[]): string[] => (Array.isArray(value) ? value : [value]);

function joinPath(...parts: string[]): string {
  return `/${parts
    .flatMap((part) => part.split('/'))
    .filter(Boolean)
    .join('/')}`;
}

/** Each `:param` with the literal segment before it; anything else Express could match is unbuildable. */
function parseParams(path: string): { params: PathParam[]; unbuildable: string | null } {
  const params: PathParam[] = [];
  const segments = path.split('/').filter(Boolean);
  for (const [index, segment] of segments.entries()) {
    if (/[*{}()?+]/.test(segment)) {
      return { params, unbuildable: `segment "${segment}" is not a plain :param` };
    }
    if (!segment.includes(':')) continue;
    const match = /^:([A-Za-z_]\w*)$/.exec(segment);
    const previous = segments[index - 1];
    if (!match || !previous || previous.includes(':')) {
      return {
        params,
        unbuildable: `segment "${segment}" is not a :param after a literal segment`,
      };
    }
    params.push({ name: match[1]!, key: `${previous}/:${match[1]}` });
  }
  return { params, unbuildable: null };
}

/**
 * Every route the application serves, read from Nest's own metadata the way the router builds it:
 * controllers from the DiscoveryService, handlers from the MetadataScanner, paths and methods from the
 * routing decorators, `@Public()` and `@Roles()` through the Reflector with the guards' precedence.
 */
export function discoverRoutes(app: INestApplication): Route[] {
  const discovery = app.get(DiscoveryService);
  const scanner = app.get(MetadataScanner);
  const reflector = app.get(Reflector);
  const routes: Route[] = [];

  for (const wrapper of discovery.getControllers()) {
    const controller = wrapper.metatype as { new (...args: never[]): object; name: string } | null;
    if (!controller) continue;
    const controllerPaths = asArray(
      (Reflect.getMetadata(PATH_METADATA, controller) as string | string[] | undefined) ?? '/',
    );
    const prototype = controller.prototype as Record<string, unknown>;
    for (const handlerName of scanner.getAllMethodNames(prototype)) {
      const handler = prototype[handlerName] as (...args: unknown[]) => unknown;
      const handlerPath = Reflect.getMetadata(PATH_METADATA, handler) as
        string | string[] | undefined;
      if (handlerPath === undefined) continue;
      const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod];
      const name = `${controller.name}.${handlerName}`;
      const targets = [handler, controller];
      const isPublic = reflector.getAllAndOverride<boolean>(PUBLIC_KEY, targets) ?? false;
      const roles = reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets) ?? [];
      for (const controllerPath of controllerPaths) {
        for (const path of asArray(handlerPath)) {
          const fullPath = joinPath(GLOBAL_PREFIX, controllerPath, path);
          const parsed = parseParams(fullPath);
          routes.push({
            name,
            method: method as HttpMethod,
            path: fullPath,
            isPublic,
            roles: isPublic ? [] : roles,
            params: parsed.params,
            unbuildable: HTTP_METHODS.has(method)
              ? parsed.unbuildable
              : `method ${method} is not one the tests send`,
          });
        }
      }
    }
  }
  return routes;
}

/**
 * `METHOD /path` for every route Express itself holds, so the test can prove the paths it builds are
 * the ones mounted (a wrong prefix or a lost controller path would otherwise only show up as 404s).
 */
export function mountedRoutes(app: INestApplication): Set<string> {
  const express = app.getHttpAdapter().getInstance() as Application & {
    router: { stack: Array<{ route?: { path: string; methods: Record<string, boolean> } }> };
  };
  const mounted = new Set<string>();
  for (const layer of express.router.stack) {
    if (!layer.route) continue;
    for (const [method, on] of Object.entries(layer.route.methods)) {
      if (on) mounted.add(`${method.toUpperCase()} ${layer.route.path}`);
    }
  }
  return mounted;
}
