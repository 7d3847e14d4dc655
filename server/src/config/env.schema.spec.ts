import { describe, expect, it } from 'vitest';
import { validateEnv } from './env.schema';

const strongSecret = 'k7Qp2vX9mR4tL8wZ1nB6cF3hJ5dS0gYa';

describe('validateEnv', () => {
  it('lists every missing or invalid setting at once', () => {
    const message = captureError(() => validateEnv({ PORT: 'not-a-port' }));
    const named = message
      .split('\n')
      .filter((line) => line.startsWith('  - '))
      .map((line) => line.slice(4).split(':')[0]);
    expect(named.sort()).toEqual(['DB_PASSWORD', 'JWT_SECRET', 'PORT']);
  });

  it('refuses an HS256 key shorter than 256 bits (RFC 7518 §3.2) and a repetitive one', () => {
    expect(() => validateEnv({ DB_PASSWORD: 'x', JWT_SECRET: 'short-secret' })).toThrowError(
      /at least 32 bytes/,
    );
    expect(() => validateEnv({ DB_PASSWORD: 'x', JWT_SECRET: 'a'.repeat(40) })).toThrowError(
      /looks weak/,
    );
  });

  it('caps the access-token lifetime at 15 minutes', () => {
    expect(() =>
      validateEnv({ DB_PASSWORD: 'x', JWT_SECRET: strongSecret, JWT_ACCESS_TTL_SECONDS: '3600' }),
    ).toThrowError(/JWT_ACCESS_TTL_SECONDS/);
  });

  it('fills the defaults: loopback, port 3000, the private database port', () => {
    const env = validateEnv({ DB_PASSWORD: 'x', JWT_SECRET: strongSecret });
    expect(env).toMatchObject({
      HOST: '127.0.0.1',
      PORT: 3000,
      DB_PORT: 54329,
      JWT_ACCESS_TTL_SECONDS: 900,
    });
  });
});

function captureError(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    return (error as Error).message;
  }
  throw new Error('expected an error');
}

describe('production settings', () => {
  const base = {
    DB_PASSWORD: 'x',
    JWT_SECRET: 'k7Qp2vX9mR4tL8wZ1nB6cF3hJ5dS0gYa',
    NODE_ENV: 'production',
  };

  it('refuses the local fakes’ payment and mail settings and a missing public address', () => {
    let message = '';
    try {
      validateEnv({ ...base, STRIPE_API_URL: 'http://127.0.0.1:12111' });
    } catch (error) {
      message = (error as Error).message;
    }
    for (const name of [
      'STRIPE_SECRET_KEY',
      'STRIPE_WEBHOOK_SECRET',
      'STRIPE_API_URL',
      'PUBLIC_APP_URL',
      'SMTP_HOST',
      'MAIL_FROM',
    ]) {
      expect(message).toContain(name);
    }
  });

  it('accepts real provider settings', () => {
    const env = validateEnv({
      ...base,
      S3_ACCESS_KEY_ID: 'example-access-key',
      S3_SECRET_ACCESS_KEY: 'example-secret-key',
      STRIPE_SECRET_KEY: 'sk_live_example_only',
      STRIPE_WEBHOOK_SECRET: 'whsec_example_only',
      PUBLIC_APP_URL: 'https://ponds.example',
      SMTP_HOST: 'smtp.example',
      MAIL_FROM: 'Heron Moss Ponds <quotes@ponds.example>',
    });
    expect(env.SMTP_HOST).toBe('smtp.example');
    expect(env.STRIPE_API_URL).toBeUndefined();
  });
});
