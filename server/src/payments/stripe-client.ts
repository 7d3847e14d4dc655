import Stripe from 'stripe';
import type { AppConfig } from '../config/app-config';

export const STRIPE_CLIENT = Symbol('STRIPE_CLIENT');

/**
 * The provider's official SDK. With STRIPE_API_URL (development and tests) it talks to the local fake
 * over plain HTTP; without it, to the provider itself: switching is configuration alone.
 */
export function createStripeClient(config: AppConfig): Stripe {
  const { secretKey, apiUrl } = config.stripe;
  const target = apiUrl ? new URL(apiUrl) : null;
  return new Stripe(secretKey, {
    maxNetworkRetries: 2,
    timeout: 20_000,
    ...(target
      ? {
          host: target.hostname,
          port: Number(target.port || (target.protocol === 'https:' ? 443 : 80)),
          protocol: target.protocol === 'https:' ? 'https' : 'http',
        }
      : {}),
  });
}
