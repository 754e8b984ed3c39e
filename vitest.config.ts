import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/**/*.test.ts'],
    // Grids and objects compare by their cells, not field by field (see the file).
    setupFiles: ['tests/support/value-equality.ts'],
    testTimeout: 120_000,
    hookTimeout: 120_000,
  },
});
