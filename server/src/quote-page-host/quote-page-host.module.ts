import { Logger, Module, type OnModuleInit } from '@nestjs/common';
import { HttpAdapterHost } from '@nestjs/core';
import type { Express, NextFunction, Request, Response } from 'express';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { AppConfig } from '../config/app-config';

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
 * prefix, and like the static files this needs no sign-in, so no guard sees it. The token is read by
 * the page, which asks `GET /api/quotes/:token`; nothing here looks at it.
 */
@Module({})
export class QuotePageHostModule implements OnModuleInit {
  private readonly logger = new Logger(QuotePageHostModule.name);

  constructor(
    private readonly adapterHost: HttpAdapterHost,
    private readonly config: AppConfig,
  ) {}

  onModuleInit(): void {
    const file = join(clientDistDir(this.config), QUOTE_PAGE_FILE);
    // Tests and `npm run dev` run without a built client (Vite serves the page then).
    if (!existsSync(file)) return;
    const app = this.adapterHost.httpAdapter.getInstance<Express>();
    app.get(QUOTE_PAGE_ROUTE, (_request: Request, response: Response, next: NextFunction) => {
      // A quote is private to whoever holds the link: never indexed, never cached by a proxy.
      response.setHeader('Cache-Control', 'no-store');
      response.setHeader('X-Robots-Tag', 'noindex, nofollow');
      response.sendFile(file, (error) => {
        if (!error) return;
        this.logger.error(`Could not send ${file}: ${error.message}`);
        if (!response.headersSent) next(error);
      });
    });
  }
}
