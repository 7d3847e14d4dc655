import { HttpStatus } from '@nestjs/common';
import { HTTP_CODE_METADATA, ROUTE_ARGS_METADATA } from '@nestjs/common/constants';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum';
import { DiscoveryService, MetadataScanner } from '@nestjs/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { discoverRoutes, type Route } from './security/route-table';
import { createTestApp, type TestApp } from './support/test-app';

type Schema = {
  $ref?: string;
  type?: string | string[];
  properties?: Record<string, unknown>;
  items?: unknown;
  anyOf?: unknown[];
  oneOf?: unknown[];
  allOf?: unknown[];
};
type Content = Record<string, { schema?: Schema }>;
type Operation = {
  operationId?: string;
  requestBody?: { content?: Content };
  responses?: Record<string, { description?: string; content?: Content }>;
  security?: Array<Record<string, string[]>>;
};
type OpenApiDocument = {
  openapi: string;
  paths: Record<string, Record<string, Operation>>;
  components?: { schemas?: Record<string, Schema>; securitySchemes?: Record<string, unknown> };
};

/**
 * Routes that answer with something other than JSON, and the media type their success answer
 * declares. Every other route that answers with a body answers JSON, and must say so with a schema.
 */
const NON_JSON_ROUTES: Record<string, string> = {
  'CompaniesController.logo': 'image/*',
  'EstimateQuoteController.pdf': 'application/pdf',
  'JobsController.reportCsv': 'text/csv',
  'PhotosController.image': 'image/jpeg',
  'PhotosController.thumbnail': 'image/webp',
  'PriceBookController.exportCsv': 'text/csv',
  'PublicQuotesController.logo': 'image/*',
  'PublicQuotesController.pdf': 'application/pdf',
};

let testApp: TestApp;
let document: OpenApiDocument;
let routes: Route[];
let handlers: Map<string, Handler>;

beforeAll(async () => {
  testApp = await createTestApp();
  const response = await testApp.http().get('/api/docs/openapi.json').expect(200);
  document = response.body as OpenApiDocument;
  routes = discoverRoutes(testApp.app);
  handlers = routeHandlers(testApp);
});
afterAll(async () => {
  await testApp.close();
});

type Handler = {
  controller: object;
  method: string;
  argumentTypes: RouteParamtypes[];
  httpCode: number | undefined;
};

/** Each route's handler, by `Controller.method`, with the kinds of argument it takes from the request. */
function routeHandlers(app: TestApp): Map<string, Handler> {
  const found = new Map<string, Handler>();
  const scanner = app.app.get(MetadataScanner);
  for (const wrapper of app.app.get(DiscoveryService).getControllers()) {
    const controller = wrapper.metatype as { new (...args: never[]): object; name: string } | null;
    if (!controller) continue;
    const prototype = controller.prototype as Record<string, unknown>;
    for (const method of scanner.getAllMethodNames(prototype)) {
      const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, controller, method) ?? {}) as Record<
        string,
        unknown
      >;
      found.set(`${controller.name}.${method}`, {
        controller,
        method,
        // Keys read `<paramtype>:<index>` (custom decorators carry a suffix and are skipped).
        argumentTypes: Object.keys(args)
          .map((key) => Number(key.split(':')[0]))
          .filter((type) => !Number.isNaN(type)),
        httpCode: Reflect.getMetadata(HTTP_CODE_METADATA, prototype[method] as object) as
          number | undefined,
      });
    }
  }
  return found;
}

/** `/api/jobs/:id/logs/:logId` as OpenAPI writes it: `/api/jobs/{id}/logs/{logId}`. */
const openApiPath = (path: string) => path.replace(/:(\w+)/g, '{$1}');

function operationOf(route: Route): Operation | undefined {
  return document.paths[openApiPath(route.path)]?.[route.method.toLowerCase()];
}

function resolve(schema: Schema | undefined): Schema | undefined {
  if (!schema?.$ref) return schema;
  const name = schema.$ref.replace('#/components/schemas/', '');
  return document.components?.schemas?.[name];
}

/** A schema that says something about the shape: typed, or with properties, items or alternatives. */
function describesShape(schema: Schema | undefined): boolean {
  const resolved = resolve(schema);
  if (!resolved) return false;
  return Boolean(
    resolved.type ||
    (resolved.properties && Object.keys(resolved.properties).length) ||
    resolved.items ||
    resolved.anyOf?.length ||
    resolved.oneOf?.length ||
    resolved.allOf?.length,
  );
}

/** A request body's schema names its fields: an object with properties (or alternatives of those). */
function namesFields(schema: Schema | undefined): boolean {
  const resolved = resolve(schema);
  if (!resolved) return false;
  if (resolved.properties && Object.keys(resolved.properties).length) return true;
  const alternatives = [
    ...(resolved.anyOf ?? []),
    ...(resolved.oneOf ?? []),
    ...(resolved.allOf ?? []),
  ];
  return alternatives.length > 0 && alternatives.every((part) => namesFields(part as Schema));
}

function successStatus(route: Route, handler: Handler): number {
  return handler.httpCode ?? (route.method === 'POST' ? HttpStatus.CREATED : HttpStatus.OK);
}

describe('the OpenAPI document at /api/docs/openapi.json', () => {
  it('is OpenAPI 3 with a bearer scheme and a route table to compare with', () => {
    expect(document.openapi).toMatch(/^3\./);
    expect(document.components?.securitySchemes).toHaveProperty('bearer');
    expect(routes.length).toBeGreaterThan(50);
    expect(routes.filter((route) => !handlers.has(route.name))).toEqual([]);
  });

  it('lists every route with its method and path, and nothing else', () => {
    const missing = routes
      .filter((route) => !operationOf(route))
      .map((route) => `${route.method} ${route.path} (${route.name})`);
    expect(missing).toEqual([]);

    const served = new Set(routes.map((route) => `${route.method} ${openApiPath(route.path)}`));
    const documented = Object.entries(document.paths).flatMap(([path, operations]) =>
      Object.keys(operations).map((method) => `${method.toUpperCase()} ${path}`),
    );
    expect(documented.filter((operation) => !served.has(operation))).toEqual([]);
  });

  it('gives every route that reads a JSON body a request schema naming its fields', () => {
    const undocumented = routes
      .filter((route) => handlers.get(route.name)!.argumentTypes.includes(RouteParamtypes.BODY))
      .filter((route) => !handlers.get(route.name)!.argumentTypes.includes(RouteParamtypes.FILE))
      .filter(
        (route) =>
          !namesFields(operationOf(route)?.requestBody?.content?.['application/json']?.schema),
      )
      .map((route) => route.name);
    expect(undocumented).toEqual([]);
  });

  it('describes every upload as multipart/form-data with its file and fields', () => {
    const uploads = routes.filter((route) =>
      handlers.get(route.name)!.argumentTypes.includes(RouteParamtypes.FILE),
    );
    expect(uploads.map((route) => route.name).sort()).toEqual([
      'CompaniesController.setLogo',
      'PhotosController.upload',
    ]);
    const undocumented = uploads
      .filter((route) => {
        const schema = resolve(
          operationOf(route)?.requestBody?.content?.['multipart/form-data']?.schema,
        );
        const fields = Object.values(schema?.properties ?? {}) as Array<{ format?: string }>;
        return !fields.some((field) => field.format === 'binary');
      })
      .map((route) => route.name);
    expect(undocumented).toEqual([]);
  });

  it('gives every success answer a schema: JSON for the API, the media type for files', () => {
    const problems: string[] = [];
    for (const route of routes) {
      const handler = handlers.get(route.name)!;
      const status = successStatus(route, handler);
      const response = operationOf(route)?.responses?.[String(status)];
      if (!response) {
        problems.push(`${route.name}: no ${status} answer`);
        continue;
      }
      if (status === HttpStatus.NO_CONTENT) {
        if (response.content) problems.push(`${route.name}: 204 with content`);
        continue;
      }
      const mediaType = NON_JSON_ROUTES[route.name] ?? 'application/json';
      if (!describesShape(response.content?.[mediaType]?.schema))
        problems.push(`${route.name}: no ${mediaType} schema for ${status}`);
    }
    expect(problems).toEqual([]);
    const unknownNames = Object.keys(NON_JSON_ROUTES).filter((name) => !handlers.has(name));
    expect(unknownNames).toEqual([]);
  });

  it('asks for the bearer token on every route but the public ones', () => {
    const wrong = routes
      .filter((route) => {
        const schemes = (operationOf(route)?.security ?? []).flatMap((entry) => Object.keys(entry));
        return route.isPublic ? schemes.includes('bearer') : !schemes.includes('bearer');
      })
      .map((route) => `${route.name} (${route.isPublic ? 'public' : 'signed in'})`);
    expect(wrong).toEqual([]);
  });
});
