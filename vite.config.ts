import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { fileURLToPath } from 'node:url';

const apiPort = Number(process.env.PORT ?? 3000);

export default defineConfig(({ command }) => ({
  plugins: [
    react(),
    tailwindcss(),
    // .br and .gz beside each script and style sheet at the strongest settings, served as they are
    // (server/app.ts), so no request pays for compressing them
    {
      ...compression({ include: /\.(js|css)$/, threshold: 1024, algorithms: ['gzip', 'brotliCompress'], logLevel: 'silent' }),
      applyToEnvironment: (environment) => environment.name === 'client',
    },
  ],
  resolve: {
    alias: {
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
      '@': fileURLToPath(new URL('./src', import.meta.url)),
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  // the manifest lets the server preload each page's chunks (server/lib/client-shell.ts)
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    manifest: true,
    // One style sheet for the whole app (Tailwind), written into every page's HTML
    // (server/lib/client-shell.ts): no lazy page lists it as a dependency, so none adds it again as a
    // <link> (a second fetch, and the whole page restyled after it hydrated).
    cssCodeSplit: false,
  },
  // `vite build` builds both: the browser's client above and the server-render bundle
  // (src/entry-server.tsx → dist/render/entry-server.js, loaded by server/render/)
  builder: {},
  environments: {
    // React and the libraries on it are bundled in, as their production builds: the server draws pages
    // with production React whatever NODE_ENV it runs with (`npm start` and the benchmarks leave it
    // unset, and React's development build took about twice as long to draw a signed-in page)
    // (the build only: Vitest runs the server's code through this environment, with its packages external)
    ssr: {
      ...(command === 'build' ? { define: { 'process.env.NODE_ENV': JSON.stringify('production') }, resolve: { noExternal: true } } : {}),
      build: { outDir: 'dist/render', emptyOutDir: true, manifest: false, rollupOptions: { input: { 'entry-server': 'src/entry-server.tsx' } } },
    },
  },
  test: {
    projects: [
      {
        extends: true,
        // Budgets only (no timing is asserted): a loaded CI machine can take seconds to build the catalogue.
        test: { name: 'unit', include: ['tests/unit/**/*.test.ts'], environment: 'node', testTimeout: 30_000, hookTimeout: 120_000 },
      },
      {
        extends: true,
        test: {
          name: 'component',
          include: ['tests/component/**/*.test.tsx'],
          environment: 'happy-dom',
          setupFiles: ['tests/setup/component.ts'],
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/global-database.ts'],
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/global-database.ts'],
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
}));
