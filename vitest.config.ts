import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['model/**/*.test.ts', 'schedules/**/*.test.ts', 'cli/**/*.test.ts', 'main/**/*.test.ts', 'renderer/**/*.test.ts', 'renderer/**/*.test.tsx', 'tests/**/*.test.ts'],
    testTimeout: 60_000,
    pool: 'forks',
  },
  resolve: {
    alias: [],
  },
});
