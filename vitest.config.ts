import { defineConfig, mergeConfig } from 'vitest/config'
import viteConfig from './vite.config.ts'

export default mergeConfig(
  viteConfig,
  defineConfig({
    test: {
      projects: [
        {
          extends: true,
          test: {
            name: 'unit',
            include: [
              'tests/dynamics/**/*.test.ts',
              'tests/measurements/**/*.test.ts',
              'tests/unit/**/*.test.ts',
              'tests/fakes/**/*.test.ts',
            ],
            environment: 'node',
          },
        },
        {
          extends: true,
          test: {
            name: 'client',
            include: ['tests/client/**/*.test.ts'],
            environment: 'jsdom',
            server: { deps: { inline: ['primevue'] } },
          },
        },
        {
          extends: true,
          test: {
            name: 'api',
            include: ['tests/api/**/*.test.ts'],
            environment: 'node',
            globalSetup: ['tests/helpers/global-setup.ts'],
            fileParallelism: false,
            // A hang detector, not a speed check (speed lives in `npm run bench`): on a loaded
            // 2-core CI machine a test that builds a quote with its PDF takes 15–20 s.
            testTimeout: 60000,
            hookTimeout: 60000,
          },
        },
        {
          extends: true,
          test: {
            name: 'e2e',
            include: ['tests/e2e/**/*.test.ts'],
            environment: 'node',
            globalSetup: ['tests/helpers/global-setup.ts'],
            setupFiles: ['tests/helpers/e2e-setup.ts'],
            fileParallelism: false,
            // A browser test that fails once is run once more: on the shared 2-core CI machine a
            // wait has twice run past 30 s in a full run (a different test each time, never
            // alone). The failed attempt still prints where its pages stood (e2e-setup.ts) and
            // `npm test` repeats those reports at its end, so a flake is seen, not hidden; a test
            // that fails twice fails the run.
            retry: 1,
            testTimeout: 120000,
            hookTimeout: 120000,
          },
        },
      ],
    },
  }),
)
