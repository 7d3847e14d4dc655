import { Logger, Module, type OnModuleInit } from '@nestjs/common';
import { HttpAdapterHost, ModuleRef } from '@nestjs/core';
import type { Express, NextFunction, Request, Response } from 'express';
import { existsSync } from 'node:fs';
import { readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { AppConfig } from '../config/app-config';
import { PublicQuotesService } from '../quotes/public-quotes.service';
import { WrongTokenThrottle } from '../quotes/wrong-token-throttle.service';

/** The homeowner's quote page, `/q/<token>`; `/q/` alone gets the page too, which says "not found". */
export const QUOTE_PAGE_ROUTE = '/q/{*token}';

/** The quote page's own HTML in the built client (client/quote.html, a separate small bundle). */
export const QUOTE_PAGE_FILE = 'quote.html';

/** The built client: CLIENT_DIST_DIR, else client/dist beside the server. */
export function clientDistDir(config: AppConfig): string {
  // From server/dist/quote-page-host (built) or server/src/quote-page-host (tests) alike.
  return config.clientDistDir ?? resolve(__dirname, '../../../client/dist');
}

/**
 * Serves the quote page's HTML for `GET /q/<token>` (the staff app's index.html serves every other
 * page path; see ServeStaticModule in app.module, which leaves `/q/*` to this). A plain Express route
 * registered beside the static files rather than a controller: controllers sit under the `/api`
 * prefix, and like the static files this needs no sign-in, so no guard sees it. The page reads the
 * token and asks `GET /api/quotes/:token`; here the token only sets the page's own status (404 or
 * 410 for a dead link, with the same friendly page).
 */
@Module({})
export class QuotePageHostModule implements OnModuleInit {
  private readonly logger = new Logger(QuotePageHostModule.name);

  constructor(
    private readonly adapterHost: HttpAdapterHost,
    private readonly config: AppConfig,
    private readonly moduleRef: ModuleRef,
  ) {}

  onModuleInit(): void {
    const file = join(clientDistDir(this.config), QUOTE_PAGE_FILE);
    // Tests and `npm run dev` run without a built client (Vite serves the page then).
    if (!existsSync(file)) return;
    const app = this.adapterHost.httpAdapter.getInstance<Express>();
    // Found wherever the quotes module provides it, without importing that module here.
    const quotes = this.moduleRef.get(PublicQuotesService, { strict: false });
    const throttle = this.moduleRef.get(WrongTokenThrottle, { strict: false });
    app.get(QUOTE_PAGE_ROUTE, (request: Request, response: Response, next: NextFunction) => {
      // Express 5 hands a wildcard over as its path segments; the token is the first.
      const segments = request.params.token as unknown as string[] | string | undefined;
      const token = (Array.isArray(segments) ? segments[0] : segments) ?? '';
      const ip = request.ip ?? 'unknown';
      // The page counts wrong tokens like the API does (PublicLinkInterceptor), so neither is a free oracle.
      const status = async (): Promise<number> => {
        if (await throttle.isBlocked(ip)) return 429;
        const found = await quotes.pageStatus(token);
        if (found === 404) await throttle.recordFailure(ip);
        return found;
      };
      status().then(
        (status) => this.sendPage(file, status, status === 200 ? token : null, response, next),
        (error: unknown) => next(error),
      );
    });
  }

  private sendPage(
    file: string,
    status: number,
    liveToken: string | null,
    response: Response,
    next: NextFunction,
  ): void {
    // A quote is private to whoever holds the link: never indexed, never cached by a proxy.
    response.status(status);
    response.setHeader('Cache-Control', 'no-store');
    response.setHeader('X-Robots-Tag', 'noindex, nofollow');
    readFile(file, 'utf8').then(
      (html) => response.type('html').send(withQuotePreload(html, liveToken)),
      (error: Error) => {
        this.logger.error(`Could not send ${file}: ${error.message}`);
        next(error);
      },
    );
  }
}

/** What a quote token may look like in a link we made (base64url, with its prefix). */
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{1,200}$/;

/**
 * The page of a live link asks the browser for the quote's data while it parses the HTML, not once
 * the scripts have arrived and run: on a phone's connection that is one round trip less before the
 * quote shows (the page's own first request, in the same mode, takes the preloaded answer). Only for
 * a link that exists, so a wrong token is never asked for twice.
 */
export function withQuotePreload(html: string, liveToken: string | null): string {
  if (liveToken === null || !TOKEN_SHAPE.test(liveToken)) return html;
  const preload = `<link rel="preload" href="/api/quotes/${liveToken}" as="fetch" crossorigin="anonymous" />`;
  return html.replace('</head>', `    ${preload}\n  </head>`);
}
