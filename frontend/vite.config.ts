import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vite';

const srcDir = fileURLToPath(new URL('./src/', import.meta.url));
// The client builds the shared package from source, so a change there needs no separate build step.
const sharedEntry = fileURLToPath(new URL('../shared/src/index.ts', import.meta.url));

const apiProxy = {
  '/api': { target: 'http://localhost:3000', changeOrigin: true },
};

/**
 * Vendor chunks. Vite 8 bundles with Rolldown, whose `output.codeSplitting.groups` is the
 * successor of Rollup's `manualChunks`. React and the router change rarely, so they get a
 * long-cached chunk of their own. Only the antd modules the first screen needs (`$initial`)
 * are grouped; the components that only lazy pages use (Table, Select, …) stay with those
 * pages, so they do not weigh on the first load.
 */
const vendorChunks = [
  {
    name: 'react',
    test: /[\\/]node_modules[\\/](react|react-dom|scheduler|react-router|react-router-dom|cookie|set-cookie-parser)[\\/]/,
    priority: 30,
  },
  { name: 'query', test: /[\\/]node_modules[\\/]@tanstack[\\/]/, priority: 25 },
  {
    name: 'antd',
    test: /[\\/]node_modules[\\/](antd|@ant-design|@rc-component|@babel[\\/]runtime|clsx|dayjs|throttle-debounce|scroll-into-view-if-needed|compute-scroll-into-view|@emotion|stylis)[\\/]/,
    tags: ['$initial' as const],
    priority: 20,
  },
  { name: 'charts', test: /[\\/]node_modules[\\/](recharts|d3-[a-z-]+|victory-vendor|internmap|decimal\.js-light|es-toolkit|@reduxjs|redux|immer|reselect)[\\/]/, priority: 10 },
];

/**
 * `@causeway/shared` is pure code behind one index, and parts of it lean on CommonJS maths
 * packages. Declaring both free of side effects lets the bundler drop whatever a page does
 * not use, instead of shipping, say, the beta-quantile maths with the sign-in page.
 */
const sharedSource = fileURLToPath(new URL('../shared/src/', import.meta.url));
function moduleSideEffects(id: string): boolean | undefined {
  if (id.startsWith(sharedSource) || /[\\/]node_modules[\\/]@stdlib[\\/]/.test(id)) return false;
  return undefined;
}

export default defineConfig({
  plugins: [react()],
  resolve: {
    alias: [
      { find: /^@causeway\/shared$/, replacement: sharedEntry },
      { find: /^@\//, replacement: srcDir },
    ],
  },
  server: { port: 5173, proxy: apiProxy },
  preview: { port: 4173, proxy: apiProxy },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
    rolldownOptions: {
      treeshake: { moduleSideEffects },
      output: {
        codeSplitting: { groups: vendorChunks },
      },
    },
  },
});
