import { fileURLToPath } from 'node:url';
import { configDefaults, defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const apiPort = Number(process.env.PORT ?? 3000);

// One config for the client build, the dev server and vitest (a vitest.config.ts would shadow it).
export default defineConfig({
  // index.html lives in src/ (the repository's top level is fixed).
  root: here('./src'),
  publicDir: false,
  plugins: [react(), tailwindcss()],
  resolve: {
    alias: { '@shared': here('./shared'), '@': here('./src') },
  },
  // convert-units 2.x reads Node's `global` in the browser.
  define: { global: 'globalThis' },
  build: { outDir: here('./dist/client'), emptyOutDir: true },
  server: {
    port: Number(process.env.VITE_PORT ?? 5173),
    // /s/:token is a client screen (it reads /api/s/:token); /dev/mail is the server's own page.
    proxy: { '/api': `http://127.0.0.1:${apiPort}`, '/dev/mail': `http://127.0.0.1:${apiPort}` },
  },
  test: {
    root: here('.'),
    // Two projects: everything on SQLite, and the API suite again on PostgreSQL (a throwaway
    // cluster on loopback, tests/pg/global-setup.ts). `--project sqlite` runs only the first;
    // LATCHET_PG_TESTS=0 leaves the second out.
    projects: [
      {
        extends: true,
        test: {
          name: 'sqlite',
          include: ['shared/**/*.test.ts', 'server/**/*.test.ts', 'src/**/*.test.{ts,tsx}', 'tests/**/*.test.{ts,tsx}'],
          exclude: [...configDefaults.exclude, 'tests/pg/**'],
        },
      },
      ...(process.env.LATCHET_PG_TESTS !== '0'
        ? [
            {
              extends: true as const,
              test: { name: 'postgres', include: ['tests/api/**/*.test.ts', 'tests/pg/**/*.test.ts'], globalSetup: ['tests/pg/global-setup.ts'], setupFiles: ['tests/pg/setup.ts'] },
            },
          ]
        : []),
    ],
    environment: 'node',
    // Generous: a timeout here only guards against hangs (2 cores, Chromium and PDF work in
    // parallel forks); speed is measured in `npm run bench`, never in tests.
    testTimeout: 120_000,
    hookTimeout: 180_000,
    // 2 cores: e2e files start Chromium; keep files in separate forks but few at once.
    pool: 'forks',
    maxWorkers: 2,
  },
});
