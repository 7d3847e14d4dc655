import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig, type Connect, type Plugin } from 'vite';
import { VitePWA } from 'vite-plugin-pwa';

const fromHere = (path: string) => fileURLToPath(new URL(path, import.meta.url));

/** `@/` is the client's src; the shared package resolves to its source, so no shared build is needed first. */
export const aliases = [
  { find: /^@\//, replacement: `${fromHere('src')}/` },
  { find: /^@pondwright\/shared\/engine$/, replacement: fromHere('../shared/src/engine/index.ts') },
  {
    find: /^@pondwright\/shared\/engine\/polygon-inset$/,
    replacement: fromHere('../shared/src/engine/polygon-inset.ts'),
  },
  {
    find: /^@pondwright\/shared\/drawings$/,
    replacement: fromHere('../shared/src/drawings/index.ts'),
  },
  {
    find: /^@pondwright\/shared\/pricing$/,
    replacement: fromHere('../shared/src/pricing/index.ts'),
  },
  { find: /^@pondwright\/shared$/, replacement: fromHere('../shared/src/index.ts') },
];

/** Source files of the shared package, which the aliases above bundle from source. */
const SHARED_SOURCE = /[\\/]shared[\\/]src[\\/].*\.ts$/;

const apiPort = process.env.PORT ?? '3000';

/** `/q/<token>` is the homeowner's quote page: quote.html, not the staff app's index.html. */
export const QUOTE_PAGE_PATH = /^\/q\/[^/?#]+\/?(?:[?#]|$)/;

const serveQuotePage: Connect.NextHandleFunction = (req, _res, next) => {
  if (req.url && (req.method === 'GET' || req.method === 'HEAD') && QUOTE_PAGE_PATH.test(req.url)) {
    const query = req.url.indexOf('?');
    req.url = `/quote.html${query >= 0 ? req.url.slice(query) : ''}`;
  }
  next();
};

/** The dev and preview servers' stand-in for the server's `/q/*` route (see server/src/quote-page-host). */
function quotePageRewrite(): Plugin {
  return {
    name: 'pondwright:quote-page-rewrite',
    configureServer: (server) => {
      server.middlewares.use(serveQuotePage);
    },
    configurePreviewServer: (server) => {
      server.middlewares.use(serveQuotePage);
    },
  };
}

/**
 * The staff app's service worker (Workbox, generated at build time): it keeps the built app on the
 * device so a crew lead in a backyard with no signal can still open Pondwright and keep the day's log.
 * Only the app itself is cached; API answers are never cached by the worker (the daily log keeps its
 * own copies, per user, in features/daily-log). The homeowner's quote page and the API always go to
 * the network, so a dead link still gets its real 404 or 410.
 */
const offlineAppShell = () =>
  VitePWA({
    strategies: 'generateSW',
    registerType: 'prompt',
    // main.tsx registers it (app/register-service-worker.tsx), so tests never load it.
    injectRegister: false,
    manifest: {
      name: 'Pondwright',
      short_name: 'Pondwright',
      description: 'Estimating and job costing for pond and water-feature builders.',
      start_url: '/',
      scope: '/',
      display: 'standalone',
      background_color: '#f6f5f1',
      theme_color: '#4a5927',
      icons: [{ src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
    },
    workbox: {
      // Inter's Latin faces only: the app's words are English, and the other scripts' faces (Cyrillic,
      // Greek, Vietnamese) would double what a phone keeps. A page that needs one still loads it online.
      globPatterns: ['**/*.{js,css,html,svg}', 'assets/inter-latin-*.woff2'],
      // The quote page is the homeowner's, opened once from an e-mail: no reason to keep it on a crew phone.
      globIgnores: ['quote.html'],
      navigateFallback: '/index.html',
      navigateFallbackDenylist: [/^\/api\//, /^\/q\//],
      cleanupOutdatedCaches: true,
      // The staff app's largest chunk is well under this; the default 2 MiB would silently skip a bigger one.
      maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
    },
  });

/**
 * The PWA plugin links the manifest from every page; the homeowner's quote page is not the staff app
 * and must not offer to install it.
 */
function quotePageWithoutManifest(): Plugin {
  return {
    name: 'pondwright:quote-page-without-manifest',
    enforce: 'post',
    transformIndexHtml: {
      order: 'post',
      handler: (html, context) =>
        context.path.endsWith('/quote.html')
          ? html.replace(/<link rel="manifest"[^>]*>/g, '')
          : html,
    },
  };
}

/**
 * The quote page's two Inter faces (400 and 600), preloaded with its HTML in the build: the quote's
 * heading is then set in Inter the moment it renders, instead of reflowing when the 600 face, asked
 * for only by that first render, arrives a moment later and shifts the page (CLS).
 */
function quotePageFontPreloads(): Plugin {
  return {
    name: 'pondwright:quote-page-font-preloads',
    enforce: 'post',
    transformIndexHtml: {
      order: 'post',
      handler: (_html, context) =>
        context.path.endsWith('/quote.html') && context.bundle
          ? Object.keys(context.bundle)
              .filter((file) => /inter-latin-(400|600)-normal-[\w-]+\.woff2$/.test(file))
              .map((file) => ({
                tag: 'link',
                attrs: {
                  rel: 'preload',
                  href: `/${file}`,
                  as: 'font',
                  type: 'font/woff2',
                  crossorigin: true,
                },
                injectTo: 'head' as const,
              }))
          : undefined,
    },
  };
}

export default defineConfig({
  plugins: [
    react(),
    quotePageRewrite(),
    offlineAppShell(),
    quotePageWithoutManifest(),
    quotePageFontPreloads(),
  ],
  resolve: { alias: aliases },
  server: {
    port: 5173,
    proxy: {
      '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false },
    },
  },
  preview: {
    proxy: {
      '/api': { target: `http://127.0.0.1:${apiPort}`, changeOrigin: false },
    },
  },
  build: {
    outDir: fromHere('dist'),
    emptyOutDir: true,
    sourcemap: true,
    // scripts/quote-bundle-size.mjs reads which files each page loads from the manifest.
    manifest: true,
    rolldownOptions: {
      // The shared package is pure (eslint forbids I/O and frameworks there), so a module of it none of
      // whose exports is used can go: the quote page imports `quoteSelectionTotals` from the package's
      // index without also loading zod and every schema behind it. Other modules keep Rolldown's default.
      treeshake: {
        moduleSideEffects: (id) => (SHARED_SOURCE.test(id) ? false : undefined),
      },
      // Two pages: the staff app, and the homeowner's small public quote page (`/q/<token>`).
      input: {
        main: fromHere('index.html'),
        quote: fromHere('quote.html'),
      },
    },
  },
});
