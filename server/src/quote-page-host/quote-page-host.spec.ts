import { Global, Module } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { ServeStaticModule } from '@nestjs/serve-static';
import { NestFactory } from '@nestjs/core';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppConfig } from '../config/app-config';
import { PublicQuotesService } from '../quotes/public-quotes.service';
import { WrongTokenThrottle } from '../quotes/wrong-token-throttle.service';
import { compressAnswers } from '../common/http/compress-answers';
import { clientStaticFiles } from './client-static-files';
import { QuotePageHostModule, withQuotePreload } from './quote-page-host.module';

// A built client of two pages, served as app.module serves it: the staff app's index.html for page
// paths, quote.html for `/q/<token>`, and `/api` left to the API.
const dist = mkdtempSync(join(tmpdir(), 'pondwright-dist-'));
writeFileSync(join(dist, 'index.html'), '<!doctype html><title>staff app</title>');
writeFileSync(
  join(dist, 'quote.html'),
  '<!doctype html><html><head><title>quote page</title></head><body></body></html>',
);
// A built script, large enough to be worth compressing (the middleware leaves answers under 1 KB).
const SCRIPT = Array.from({ length: 400 }, (_, i) => `export const line${i} = ${i};`).join('\n');
mkdirSync(join(dist, 'assets'));
writeFileSync(join(dist, 'assets', 'quote-3f9c2a1b.js'), SCRIPT);

// The wrong-token count, in memory: the real one (PostgreSQL) is tested in quote-link-hardening.
const WRONG_TOKENS_ALLOWED = 3;
const wrongTokensFrom: string[] = [];
const throttle = {
  isBlocked: (ip: string) =>
    Promise.resolve(wrongTokensFrom.filter((from) => from === ip).length >= WRONG_TOKENS_ALLOWED),
  recordFailure: (ip: string) => {
    wrongTokensFrom.push(ip);
    return Promise.resolve();
  },
};

@Global()
@Module({
  providers: [
    { provide: AppConfig, useValue: { clientDistDir: dist } },
    // The link's state, as the quotes module would answer it for these made-up tokens.
    {
      provide: PublicQuotesService,
      useValue: {
        pageStatus: (token: string) =>
          Promise.resolve(token === 'qt_expired' ? 410 : token === 'qt_unknown' ? 404 : 200),
      },
    },
    { provide: WrongTokenThrottle, useValue: throttle },
  ],
  exports: [AppConfig, PublicQuotesService, WrongTokenThrottle],
})
class ConfigStub {}

// As in app.module. Built with NestFactory as main.ts does: ServeStaticModule picks its Express loader
// when the module is created, so a testing module (created before its HTTP adapter) would serve nothing.
@Module({
  imports: [ConfigStub, ServeStaticModule.forRoot(clientStaticFiles(dist)), QuotePageHostModule],
})
class HostedClient {}

let app: NestExpressApplication;

beforeAll(async () => {
  app = await NestFactory.create<NestExpressApplication>(HostedClient, { logger: false });
  app.setGlobalPrefix('api');
  app.use(compressAnswers());
  await app.init();
});

afterAll(async () => {
  await app?.close();
  rmSync(dist, { recursive: true, force: true });
});

describe('the quote page host', () => {
  it('serves quote.html for /q/<token>, with or without a payment return, never cached', async () => {
    for (const path of ['/q/qt_7hGm2pXc9RkLw4Vn', '/q/qt_7hGm2pXc9RkLw4Vn?payment=success']) {
      const response = await request(app.getHttpServer()).get(path).expect(200);
      expect(response.text).toContain('quote page');
      expect(response.headers['content-type']).toMatch(/text\/html/);
      expect(response.headers['cache-control']).toBe('no-store');
      expect(response.headers['x-robots-tag']).toBe('noindex, nofollow');
    }
  });

  it('serves the same friendly page with 404 or 410 for a dead link', async () => {
    const unknown = await request(app.getHttpServer()).get('/q/qt_unknown').expect(404);
    expect(unknown.text).toContain('quote page');
    const expired = await request(app.getHttpServer()).get('/q/qt_expired').expect(410);
    expect(expired.text).toContain('quote page');
  });

  it('counts unknown links per address and answers 429 once too many were tried', async () => {
    wrongTokensFrom.length = 0;
    // A dead link is a real link, not a guess: it is not counted.
    await request(app.getHttpServer()).get('/q/qt_expired').expect(410);
    expect(wrongTokensFrom).toHaveLength(0);
    for (let attempt = 0; attempt < WRONG_TOKENS_ALLOWED; attempt++) {
      await request(app.getHttpServer()).get('/q/qt_unknown').expect(404);
    }
    expect(wrongTokensFrom).toHaveLength(WRONG_TOKENS_ALLOWED);
    const blocked = await request(app.getHttpServer()).get('/q/qt_7hGm2pXc9RkLw4Vn').expect(429);
    expect(blocked.text).toContain('quote page');
    wrongTokensFrom.length = 0;
  });

  it('leaves the staff app’s pages and the API alone', async () => {
    const staff = await request(app.getHttpServer()).get('/estimates/42').expect(200);
    expect(staff.text).toContain('staff app');
    const api = await request(app.getHttpServer()).get('/api/quotes/qt_unknown').expect(404);
    expect(api.text).not.toContain('quote page');
  });

  it('sends hashed scripts compressed and cacheable for a year, and index.html checked on every load', async () => {
    const script = await request(app.getHttpServer())
      .get('/assets/quote-3f9c2a1b.js')
      .set('Accept-Encoding', 'gzip')
      .expect(200);
    expect(script.headers['content-encoding']).toBe('gzip');
    expect(script.text).toBe(SCRIPT);
    expect(script.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const plain = await request(app.getHttpServer())
      .get('/assets/quote-3f9c2a1b.js')
      .set('Accept-Encoding', 'identity')
      .expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    const index = await request(app.getHttpServer()).get('/').expect(200);
    expect(index.headers['cache-control']).toBe('no-cache');
  });

  it('asks the browser for a live link’s quote with the HTML, and for no other', async () => {
    const preload =
      '<link rel="preload" href="/api/quotes/qt_7hGm2pXc9RkLw4Vn" as="fetch" crossorigin="anonymous" />';
    const live = await request(app.getHttpServer()).get('/q/qt_7hGm2pXc9RkLw4Vn').expect(200);
    expect(live.text).toContain(preload);
    expect(live.text.indexOf(preload)).toBeLessThan(live.text.indexOf('</head>'));
    for (const [path, status] of [
      ['/q/qt_unknown', 404],
      ['/q/qt_expired', 410],
    ] as const) {
      const dead = await request(app.getHttpServer()).get(path).expect(status);
      expect(dead.text).not.toContain('rel="preload"');
    }
    wrongTokensFrom.length = 0;
  });
});

describe('withQuotePreload', () => {
  it('adds nothing for a token that is not the shape of one we make', () => {
    const html = '<html><head></head></html>';
    for (const token of ['a"b', 'x/../y', '<script>', '', 'é']) {
      expect(withQuotePreload(html, token)).toBe(html);
    }
    expect(withQuotePreload(html, null)).toBe(html);
  });
});
