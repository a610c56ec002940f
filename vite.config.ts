import { defineConfig } from 'vite';

// One config for the page (vite) and the tests (vitest). The test tree is split by kind;
// `npm test` runs unit, reference and e2e through tests/tools/run-tests.mjs.
export default defineConfig({
  server: { host: '127.0.0.1', port: 5173, strictPort: false },
  build: {
    target: 'es2022',
    outDir: 'dist',
    // The construction canvas (index.html) and the plain curve viewer.
    rollupOptions: { input: { main: 'index.html', viewer: 'src/ui/viewer/index.html' } },
  },
  worker: { format: 'es' },
  test: {
    include: ['tests/{unit,reference,e2e}/**/*.test.ts'],
    setupFiles: ['tests/tools/vitest-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    pool: 'forks',
  },
});
