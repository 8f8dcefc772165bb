import {defineConfig} from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    // Frames in UI tests must be free of colour codes whatever the outer shell sets.
    env: {FORCE_COLOR: '0', NO_COLOR: '', TAPWRIGHT_TEST: '1'},
    testTimeout: 20000,
    hookTimeout: 30000,
    pool: 'forks',
  },
});
