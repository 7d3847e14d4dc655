import type { ServeStaticModuleOptions } from '@nestjs/serve-static';
import type { ServerResponse } from 'node:http';
import { relative, sep } from 'node:path';
import { QUOTE_PAGE_ROUTE } from './quote-page-host.module';

/**
 * The built client as ServeStaticModule serves it: the staff app's index.html for page paths, with
 * `/api` left to the API and `/q/*` to QuotePageHostModule.
 */
export function clientStaticFiles(rootPath: string): ServeStaticModuleOptions {
  return {
    rootPath,
    exclude: ['/api/{*rest}', QUOTE_PAGE_ROUTE],
    serveStaticOptions: { setHeaders: cacheHeadersUnder(rootPath) },
  };
}

/**
 * Vite names every file under `assets/` after a hash of its content, so a browser may keep those for
 * a year without asking again. Everything else (index.html, the service worker, the manifest) names
 * the current hashed files and must be checked on every load, or a release would reach no one.
 */
function cacheHeadersUnder(rootPath: string) {
  return (response: ServerResponse, path: string): void => {
    const hashed = relative(rootPath, path).split(sep)[0] === 'assets';
    response.setHeader(
      'Cache-Control',
      hashed ? 'public, max-age=31536000, immutable' : 'no-cache',
    );
  };
}
