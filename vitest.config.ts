import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    // CLI tests spawn the built program; give them room on a loaded 2-core machine.
    testTimeout: 30000,
  },
});
