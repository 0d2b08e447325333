import { defineConfig, mergeConfig } from 'vitest/config';
import viteConfig from './vite.config.ts';

export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      environment: 'jsdom',
      setupFiles: ['./src/testing/setup-tests.ts'],
      include: ['src/**/*.test.{ts,tsx}'],
      css: false,
      // The first test of a file loads antd and the lazy routes from a cold transform cache.
      testTimeout: 60_000,
      restoreMocks: true,
      // Files share loaded modules (antd, the lazy routes) instead of loading them again each:
      // about three times faster. Safe because every test starts clean: its own QueryClient,
      // an unmounted tree, an empty localStorage and the real fetch restored (see setup-tests.ts).
      isolate: false,
      unstubGlobals: true,
    },
  }),
);
