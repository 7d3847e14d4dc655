import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

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

const apiPort = process.env.PORT ?? '3000';

export default defineConfig({
  plugins: [react()],
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
  },
});
