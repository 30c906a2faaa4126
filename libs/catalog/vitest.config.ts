import { defineConfig } from 'vitest/config';

export default defineConfig({
  resolve: { conditions: ['@linesmith/source'] },
  ssr: { resolve: { conditions: ['@linesmith/source'] } },
  test: { include: ['src/**/*.test.ts'] },
});
