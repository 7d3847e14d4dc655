import { DiscoveryService, MetadataScanner, Reflector } from '@nestjs/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PUBLIC_KEY, ROLES_KEY } from '../src/common/decorators/auth.decorators';
import { createTestApp, type TestApp } from './support/test-app';

let testApp: TestApp;

beforeAll(async () => {
  testApp = await createTestApp();
});
afterAll(async () => {
  await testApp.close();
});

// The public routes, by name. Anything else must name the roles it allows.
const PUBLIC_ROUTES = [
  'AuthController.signup',
  'AuthController.login',
  'AuthController.refresh',
  'AuthController.logout',
  'AuthController.previewInvite',
  'AuthController.acceptInvite',
  'HealthController.check',
  'HealthController.live',
  // The homeowner's quote: the link's token is the credential.
  'PublicQuotesController.view',
  'PublicQuotesController.accept',
  'PublicQuotesController.decline',
  'PublicQuotesController.checkout',
  'PublicQuotesController.pdf',
  'PublicQuotesController.logo',
  // The payment provider: its signature over the body is the credential.
  'PaymentsWebhookController.receive',
].sort();

describe('every route', () => {
  it('is either one of the known public routes or declares the roles it allows', () => {
    const discovery = testApp.app.get(DiscoveryService);
    const scanner = testApp.app.get(MetadataScanner);
    const reflector = testApp.app.get(Reflector);
    const publicRoutes: string[] = [];
    const unguarded: string[] = [];
    let routeCount = 0;

    for (const wrapper of discovery.getControllers()) {
      const controller = wrapper.metatype as { new (...args: never[]): object; name: string };
      const prototype = controller.prototype as Record<string, unknown>;
      for (const method of scanner.getAllMethodNames(prototype)) {
        const handler = prototype[method] as (...args: unknown[]) => unknown;
        if (Reflect.getMetadata('path', handler) === undefined) continue;
        routeCount++;
        const name = `${controller.name}.${method}`;
        if (reflector.getAllAndOverride<boolean>(PUBLIC_KEY, [handler, controller]))
          publicRoutes.push(name);
        else if (!reflector.getAllAndOverride<string[]>(ROLES_KEY, [handler, controller])?.length)
          unguarded.push(name);
      }
    }

    expect(routeCount).toBeGreaterThan(10);
    expect(unguarded).toEqual([]);
    expect(publicRoutes.sort()).toEqual(PUBLIC_ROUTES);
  });
});
