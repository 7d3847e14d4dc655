import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';
import { aliases } from './vite.config.ts';

export default defineConfig({
  plugins: [react()],
  resolve: { alias: aliases },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.ts', 'src/**/*.test.tsx'],
    setupFiles: ['./src/testing/setup-tests.ts'],
    css: false,
    restoreMocks: true,
    unstubGlobals: true,
    // jsdom with typed input is slow on a loaded 2-core machine (the takeoff workspace took over 20 s
    // at a load average of 7); these tests check behaviour, not speed.
    testTimeout: 40_000,
  },
});
